namespace CoefGen.Core.Noise;

/// <summary>One analog noise component sampled on the ADC grid: Lag[k] = C(k / rate) in V^2 (constant possibly removed).</summary>
public sealed record CovarianceComponent(string Name, IReadOnlyList<double> Lag);
