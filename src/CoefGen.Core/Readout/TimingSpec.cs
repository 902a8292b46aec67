namespace CoefGen.Core.Readout;

/// <summary>Where the samples of one pixel cycle sit.</summary>
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
    IReadOnlyList<string> Rounding);
