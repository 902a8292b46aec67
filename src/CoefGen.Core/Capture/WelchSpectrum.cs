namespace CoefGen.Core.Capture;

/// <summary>
/// A one-sided Welch power spectral density at the ADC input in V²/Hz, bins 1 .. L/2 - 1 of the
/// segment length L (DC and Nyquist left out), with a per-bin two-sided confidence band.
/// </summary>
/// <param name="FrequencyHz">Bin centres k * rate / L.</param>
/// <param name="PsdV2PerHz">Averaged periodogram.</param>
/// <param name="LowerV2PerHz">Lower edge of the confidence band.</param>
/// <param name="UpperV2PerHz">Upper edge of the confidence band.</param>
/// <param name="SegmentLength">L, a power of two.</param>
/// <param name="Segments">Number of averaged segments K.</param>
/// <param name="DegreesOfFreedom">Equivalent chi-square degrees of freedom per bin.</param>
/// <param name="Confidence">Coverage of the band, e.g. 0.95.</param>
/// <param name="RateHz">Sample rate.</param>
public sealed record WelchSpectrum(
    IReadOnlyList<double> FrequencyHz,
    IReadOnlyList<double> PsdV2PerHz,
    IReadOnlyList<double> LowerV2PerHz,
    IReadOnlyList<double> UpperV2PerHz,
    int SegmentLength,
    int Segments,
    double DegreesOfFreedom,
    double Confidence,
    double RateHz)
{
    public double ResolutionHz => RateHz / SegmentLength;
}
