namespace CoefGen.Core.Weights;

/// <summary>Minimum-variance weights and their variance h^T R h in V^2.</summary>
public sealed record OptimalSolution(double[] H, double VarianceV2);
