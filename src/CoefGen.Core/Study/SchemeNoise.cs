using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>Predicted read noise of one scheme at one point.</summary>
public sealed record SchemeNoise(WeightScheme Scheme, string Label, double NoiseElectrons, double NoiseAdu);
