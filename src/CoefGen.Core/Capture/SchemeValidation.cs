namespace CoefGen.Core.Capture;

/// <summary>What one weight set achieves on the held-out cycles, beside what was predicted for it.</summary>
/// <param name="Label">Scheme label.</param>
/// <param name="H">The weights.</param>
/// <param name="MeasuredSigmaV">Sample standard deviation of sum h x over the held-out cycles, V at the ADC.</param>
/// <param name="LowerSigmaV">Lower edge of the chi-square confidence interval of the measured sigma.</param>
/// <param name="UpperSigmaV">Upper edge.</param>
/// <param name="PredictedModelSigmaV">sqrt(h^T T h) with T the fitted stationary model.</param>
/// <param name="PredictedCaptureSigmaV">sqrt(h^T S h) with S the design cycles' sample covariance.</param>
public sealed record SchemeValidation(
    string Label,
    double[] H,
    double MeasuredSigmaV,
    double LowerSigmaV,
    double UpperSigmaV,
    double PredictedModelSigmaV,
    double PredictedCaptureSigmaV);
