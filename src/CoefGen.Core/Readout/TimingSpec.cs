namespace CoefGen.Core.Readout;

/// <summary>
/// Where the samples of one pixel cycle sit: always a <see cref="CycleSpec"/> (a classic file's loader builds the
/// two-window cycle, <see cref="TwoWindowCycle.ToCycle()"/>). Two-window consumers ask
/// <see cref="CycleSpec.AsTwoWindow"/>.
/// </summary>
/// <param name="PixelSamples">Samples in one pixel cycle.</param>
/// <param name="TransferTimeS">Charge-transfer instant from the start of the cycle, in seconds.</param>
/// <param name="Cycle">The windows of the cycle, their charge sights and reset groups.</param>
/// <param name="Step">Step-response model used for s_k.</param>
/// <param name="Rounding">One line per quantity given in nanoseconds, saying how it was turned into samples.</param>
public sealed record TimingSpec(
    int PixelSamples,
    double TransferTimeS,
    CycleSpec Cycle,
    StepModel Step,
    IReadOnlyList<string> Rounding)
{
    /// <summary>The timing of a classic file: a reset window, the transfer, a signal window.</summary>
    public TimingSpec(int pixelSamples, double transferTimeS, SampleWindow reset, SampleWindow signal, StepModel step, IReadOnlyList<string> rounding)
        : this(pixelSamples, transferTimeS, new TwoWindowCycle(reset, signal, transferTimeS).ToCycle(), step, rounding)
    {
    }
}
