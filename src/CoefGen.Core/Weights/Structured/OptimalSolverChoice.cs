namespace CoefGen.Core.Weights.Structured;

/// <summary>
/// Which optimal solver to use for a given number of weighted samples (both windows together).
/// Measured with <c>bench/CoefGen.Benchmarks -- crossover</c> (white + 1/f + pole noise, two equal
/// windows, 2-core machine under load, dense = null-space Cholesky reference): structured/dense time was
/// 4.2 at 2×32, 0.68 at 2×64, 0.25 at 2×128, 0.12 at 2×256, 0.03 at 2×512. The break-even is near
/// 2×50 samples; the crossover is set at 256 so a dense solver a few times faster than that reference
/// still loses above it, while small problems keep the exact-to-round-off dense path.
/// </summary>
public static class OptimalSolverChoice
{
    /// <summary>Total sample count above which the structured solver is preferred.</summary>
    public const int CrossoverCount = 256;

    /// <summary>True when <paramref name="count"/> weighted samples are better served by <see cref="StructuredOptimalSolver"/>.</summary>
    public static bool PreferStructured(int count) => count > CrossoverCount;
}
