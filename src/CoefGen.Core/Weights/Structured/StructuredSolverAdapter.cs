using CoefGen.Core.Noise;

namespace CoefGen.Core.Weights.Structured;

/// <summary>
/// The structured (Toeplitz/FFT, projected PCG) solver behind <see cref="IOptimalSolver"/>, with the same
/// constraint columns as the dense solver. A run that does not converge is an error, never silent weights.
/// </summary>
public sealed class StructuredSolverAdapter : IOptimalSolver
{
    public OptimalSolution Solve(SampleGrid grid, SampledCovariance r, bool rejectDrift)
    {
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(r);
        var system = ConstraintSystem.FromGrid(grid, rejectDrift);
        var solution = StructuredOptimalSolver.Solve(r, system);
        if (!solution.Converged)
        {
            throw new CovarianceNotPositiveDefiniteException($"structured solver did not converge: {solution.Failure}");
        }

        return new OptimalSolution([.. solution.Weights], solution.VarianceV2);
    }
}
