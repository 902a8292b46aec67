namespace CoefGen.Core.Study;

/// <summary>
/// The answer of <see cref="ReadCountSearch"/>: the smallest read count meeting the target, or null when no N up to the
/// search limit meets it; every trial (sorted by N), and whether the noise was non-increasing in N over the trials up
/// to the answer (bisection is only sound then).
/// </summary>
public sealed record ReadCountTargetResult(
    double TargetElectrons,
    Readout.WeightScheme Scheme,
    ReadCountAxis Axis,
    int? Reads,
    IReadOnlyList<ReadCountTrial> Trials,
    bool Monotone,
    string Note);
