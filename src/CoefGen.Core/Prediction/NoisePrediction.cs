using CoefGen.Core.Readout;

namespace CoefGen.Core.Prediction;

/// <summary>Predicted read noise of one weight set.</summary>
/// <param name="Scheme">Scheme of the weights.</param>
/// <param name="Label">Label of the weights.</param>
/// <param name="VarianceV2">h^T R h in V^2 at the ADC input (analog components plus the digital diagonal).</param>
/// <param name="SigmaV">sqrt of the variance, V rms at the ADC input.</param>
/// <param name="SigmaAdu">SigmaV / LSB.</param>
/// <param name="SigmaElectrons">SigmaV / (volts at the ADC per electron).</param>
/// <param name="Budget">Each analog component, then "quantisation", then "ADC noise" (omitted when the ADC adds none).</param>
/// <param name="FrequencyDomainVarianceV2">The frequency-domain integral plus sigma_d^2 sum h^2, or null when not computed.</param>
/// <param name="FrequencyDomainRelativeDifference">|fd - td| / td on the totals, or null when not computed.</param>
public sealed record NoisePrediction(
    WeightScheme Scheme,
    string Label,
    double VarianceV2,
    double SigmaV,
    double SigmaAdu,
    double SigmaElectrons,
    IReadOnlyList<NoiseBudgetEntry> Budget,
    double? FrequencyDomainVarianceV2,
    double? FrequencyDomainRelativeDifference);
