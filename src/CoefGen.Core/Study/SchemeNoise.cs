using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>Predicted read noise of one scheme at one point.</summary>
/// <param name="Scheme">The scheme.</param>
/// <param name="Label">Its label.</param>
/// <param name="NoiseElectrons">Read noise, e- rms.</param>
/// <param name="NoiseAdu">Read noise, ADU rms.</param>
/// <param name="WorstRegret">With noise scenarios: the largest ratio of this scheme's noise to a scenario's own optimum; else null.</param>
public sealed record SchemeNoise(WeightScheme Scheme, string Label, double NoiseElectrons, double NoiseAdu, double? WorstRegret = null);
