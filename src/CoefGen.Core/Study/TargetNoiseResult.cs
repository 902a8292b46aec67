namespace CoefGen.Core.Study;

/// <summary>
/// The answer of <see cref="TargetNoiseSearch"/>: the smallest equal window count N meeting the target, or null
/// when no N up to the search limit meets it; every trial (sorted by N), and whether the noise was non-increasing
/// in N over the trials up to the answer (bisection is only sound then).
/// </summary>
public sealed record TargetNoiseResult(
    double TargetElectrons,
    Readout.WeightScheme Scheme,
    int? WindowCount,
    IReadOnlyList<WindowTrial> Trials,
    bool Monotone,
    string Note);
