namespace CoefGen.Core.Weights.TwoStage;

/// <summary>The two-stage form h = a (x) g: one per-read table g and one weight per read a.</summary>
/// <param name="PerReadTable">g, length m (sum g = 0 over each reset class of ReadLayout: every reset level is rejected by the table alone).</param>
/// <param name="ReadWeights">a, length N (sum a_j g^T s_j = 1: unit gain).</param>
/// <param name="H">The full weights a_j g_p in grid order.</param>
/// <param name="VarianceV2">h^T R h.</param>
/// <param name="Iterations">Alternating steps taken.</param>
public sealed record TwoStageResult(double[] PerReadTable, double[] ReadWeights, double[] H, double VarianceV2, int Iterations);
