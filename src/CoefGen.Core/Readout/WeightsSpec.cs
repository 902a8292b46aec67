namespace CoefGen.Core.Readout;

/// <summary>Which weights go to the fixed-point stage, and the parameters of the weighted scheme.</summary>
/// <param name="Scheme">Scheme carried into fixed point and emission (all three are always predicted).</param>
/// <param name="Window">Window shape of the weighted scheme.</param>
/// <param name="RampSamples">Ramp length of the trapezoid, in samples.</param>
/// <param name="ExplicitReset">Explicit shape of the reset window (length = reset count), or null.</param>
/// <param name="ExplicitSignal">Explicit shape of the signal window (length = signal count), or null.</param>
/// <param name="RejectDrift">Add the constraint sum h t = 0 (linear drift rejection) to every scheme.</param>
public sealed record WeightsSpec(
    WeightScheme Scheme,
    WindowShape Window,
    int RampSamples,
    IReadOnlyList<double>? ExplicitReset,
    IReadOnlyList<double>? ExplicitSignal,
    bool RejectDrift)
{
    /// <summary>The datapath of the chosen weights: one full table (default) or the two-stage form of repeated reads.</summary>
    public WeightsForm Form { get; init; } = WeightsForm.Full;
}
