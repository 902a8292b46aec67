using CoefGen.Core.Noise;

namespace CoefGen.Core.Weights;

/// <summary>
/// Minimises h^T R h subject to sum h = 0, sum h s = 1 (and sum h t = 0 when drift is rejected).
/// Implementations differ only in cost (dense vs structured); all must agree to roundoff.
/// </summary>
public interface IOptimalSolver
{
    /// <exception cref="CovarianceNotPositiveDefiniteException">R is not positive definite on the constraint null space.</exception>
    OptimalSolution Solve(SampleGrid grid, SampledCovariance r, bool rejectDrift);
}
