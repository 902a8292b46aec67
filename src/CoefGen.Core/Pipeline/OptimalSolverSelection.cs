using CoefGen.Core.Weights;
using CoefGen.Core.Weights.Structured;

namespace CoefGen.Core.Pipeline;

/// <summary>
/// Picks the optimal-weight solver by problem size: the dense null-space reference for small grids, the
/// structured solver (FFT Toeplitz products, projected preconditioned CG) above the measured crossover.
/// </summary>
public sealed record OptimalSolverSelection(IOptimalSolver Solver, string Name)
{
    public static OptimalSolverSelection For(int count) =>
        OptimalSolverChoice.PreferStructured(count)
            ? new(new StructuredSolverAdapter(), "structured (Toeplitz FFT, projected PCG)")
            : new(new DenseNullSpaceSolver(), "dense null-space");
}
