using CoefGen.Core.Weights;
using CoefGen.Core.Weights.Structured;

namespace CoefGen.Core.Pipeline;

/// <summary>
/// Picks the optimal-weight solver by problem size: the dense null-space reference for small grids, the
/// structured solver (FFT Toeplitz products, projected preconditioned CG) above the measured crossover.
/// </summary>
public sealed record OptimalSolverSelection(IOptimalSolver Solver, string Name)
{
    /// <param name="count">Weighted samples.</param>
    /// <param name="stationary">False when the covariance has a non-stationary part (shot noise of an integrating
    /// charge): the structured solver's Toeplitz products and circulant preconditioner assume stationarity, so the
    /// dense path is taken whatever the size.</param>
    public static OptimalSolverSelection For(int count, bool stationary = true) =>
        stationary && OptimalSolverChoice.PreferStructured(count)
            ? new(new StructuredSolverAdapter(), "structured (Toeplitz FFT, projected PCG)")
            : new(new DenseNullSpaceSolver(), "dense null-space");
}
