namespace CoefGen.Core.Readout;

/// <summary>One parametric analog noise source: white floor plus optional 1/f part.</summary>
/// <param name="Name">Label used in the noise budget.</param>
/// <param name="At">Where the density is referred.</param>
/// <param name="WhiteNvPerRtHz">One-sided white amplitude density e in nV/sqrt(Hz) (0 allowed when only 1/f is wanted... but then FlickerCoefficient must be given).</param>
/// <param name="FlickerCornerHz">Frequency where the 1/f part equals the white floor; 0 = no 1/f part.</param>
/// <param name="LowCutoffHz">Lower edge of the 1/f part (S = 0 below); set by observation time, e.g. the frame time.</param>
public sealed record NoiseSourceSpec(
    string Name,
    NoiseReference At,
    double WhiteNvPerRtHz,
    double FlickerCornerHz,
    double LowCutoffHz);
