namespace CoefGen.Core.Readout;

/// <summary>
/// Where the samples of one pixel cycle sit. A classic file gives one reset and one signal window; a general cycle
/// (<see cref="Cycle"/>) gives any list of windows, and then <see cref="Reset"/> and <see cref="Signal"/> are its
/// first and last windows (kept for two-window consumers; general code uses <see cref="CycleWindows"/>).
/// </summary>
/// <param name="PixelSamples">Samples in one pixel cycle.</param>
/// <param name="TransferTimeS">Charge-transfer instant from the start of the cycle, in seconds.</param>
/// <param name="Reset">Reset (reference) window.</param>
/// <param name="Signal">Signal window.</param>
/// <param name="Step">Step-response model used for s_k.</param>
/// <param name="Rounding">One line per quantity given in nanoseconds, saying how it was turned into samples.</param>
public sealed record TimingSpec(
    int PixelSamples,
    double TransferTimeS,
    SampleWindow Reset,
    SampleWindow Signal,
    StepModel Step,
    IReadOnlyList<string> Rounding)
{
    /// <summary>The general cycle when the file lists its windows ([[timing.window]]); null for a classic two-window file.</summary>
    public CycleSpec? Cycle { get; init; }

    /// <summary>True for a classic reset/signal file.</summary>
    public bool IsTwoWindow => Cycle is null;

    /// <summary>Every window of the cycle in time order; a two-window file gives [reset, signal] in one reset group.</summary>
    public IReadOnlyList<CycleWindow> CycleWindows => Cycle?.Windows ??
    [
        new CycleWindow("reset", Reset, ChargeSight.None, 0, 0, 0),
        new CycleWindow("signal", Signal, ChargeSight.Transfer, TransferTimeS, 0, 0),
    ];
}
