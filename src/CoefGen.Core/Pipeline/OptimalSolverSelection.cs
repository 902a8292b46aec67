using CoefGen.Core.Weights;

namespace CoefGen.Core.Pipeline;

/// <summary>Picks the optimal-weight solver by problem size: the dense reference for small grids.</summary>
public sealed record OptimalSolverSelection(IOptimalSolver Solver, string Name)
{
    public static OptimalSolverSelection For(int count) =>
        new(new DenseNullSpaceSolver(), "dense null-space");
}
