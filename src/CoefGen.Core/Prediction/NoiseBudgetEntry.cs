namespace CoefGen.Core.Prediction;

/// <summary>One source's contribution to the read noise of a scheme.</summary>
/// <param name="Source">Component name (an analog component, "quantisation" or "ADC noise").</param>
/// <param name="VarianceV2">Its variance at the ADC input in V^2.</param>
/// <param name="Share">Its fraction of the summed budget (shares sum to 1).</param>
public sealed record NoiseBudgetEntry(string Source, double VarianceV2, double Share);
