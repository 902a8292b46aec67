using CoefGen.Core.Noise;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Weights;

/// <summary>Noise-optimal weights: minimum h^T R h under the scheme constraints (generalised least squares).</summary>
public static class OptimalWeights
{
    /// <summary>Computes with the dense null-space solver.</summary>
    public static (WeightSet Weights, double VarianceV2) Compute(SampleGrid grid, SampledCovariance r, bool rejectDrift) =>
        Compute(grid, r, rejectDrift, new DenseNullSpaceSolver());

    /// <summary>Computes with the given solver.</summary>
    public static (WeightSet Weights, double VarianceV2) Compute(SampleGrid grid, SampledCovariance r, bool rejectDrift, IOptimalSolver solver)
    {
        ArgumentNullException.ThrowIfNull(solver);
        var solution = solver.Solve(grid, r, rejectDrift);
        var label = rejectDrift ? "optimal (drift rejected)" : "optimal";
        return (new WeightSet(WeightScheme.Optimal, label, solution.H), solution.VarianceV2);
    }
}
