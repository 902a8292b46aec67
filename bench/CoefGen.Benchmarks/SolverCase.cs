using CoefGen.Core.Noise;
using CoefGen.Core.Tests.Weights.Structured;
using CoefGen.Core.Weights.Structured;

namespace CoefGen.Benchmarks;

/// <summary>One prepared problem: covariance and constraints for 2 × perWindow samples.</summary>
public sealed class SolverCase
{
    /// <param name="perWindow">Samples per window.</param>
    /// <param name="noise">"white+1/f+pole" (the benchmark), or for preconditioner probes "strong-ar1"
    /// (white through a pole at f_s/2000 with a 1e-3 digital floor) and "1/f-dominated" (corner 100x higher).</param>
    public SolverCase(int perWindow, string noise = "white+1/f+pole")
    {
        var grid = BenchmarkNoise.Grid(perWindow);
        Covariance = BenchmarkNoise.Covariance(grid, noise);
        (Columns, Rhs) = BenchmarkNoise.Constraints(grid);
    }

    public SampledCovariance Covariance { get; }

    public double[][] Columns { get; }

    public double[] Rhs { get; }

    public StructuredSolution Structured(PreconditionerKind kind = PreconditionerKind.TChanCirculant)
    {
        var s = StructuredOptimalSolver.Solve(Covariance, Columns, Rhs, kind);
        return s.Converged ? s : throw new InvalidOperationException(s.Failure);
    }

    public double Dense() => DenseReferenceSolver.Solve(Covariance, Columns, Rhs).Variance;
}
