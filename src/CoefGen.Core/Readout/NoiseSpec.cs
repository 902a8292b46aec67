namespace CoefGen.Core.Readout;

/// <summary>The analog noise description. The digital part (quantisation + ADC noise) comes from <see cref="AdcSpec"/>.</summary>
/// <param name="Sources">Parametric sources; each is shaped by the front-end pole and/or the bandwidth limit.</param>
/// <param name="FrontEndPoleHz">Single real pole of the analog chain (also drives <see cref="StepModel.Pole"/>), or null.</param>
/// <param name="BandwidthHz">Ideal brick-wall anti-alias limit, or null. Parametric sources need a pole or a bandwidth.</param>
/// <param name="Table">Measured spectrum used in addition to the sources (already at the ADC input), or null.</param>
/// <param name="CapturePath">Capture of idle samples (resolved path), or null.</param>
public sealed record NoiseSpec(
    IReadOnlyList<NoiseSourceSpec> Sources,
    double? FrontEndPoleHz,
    double? BandwidthHz,
    PsdTable? Table,
    string? CapturePath);
