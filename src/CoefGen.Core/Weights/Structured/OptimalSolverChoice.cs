namespace CoefGen.Core.Weights.Structured;

/// <summary>
/// Which optimal solver to use for a given number of weighted samples. The crossover was measured with
/// bench/CoefGen.Benchmarks (white + 1/f + pole noise, two equal windows, 2-core machine): see
/// <see cref="CrossoverCount"/>. Below it the dense null-space solve is both faster and exact to
/// round-off; above it the structured solver wins and its advantage grows as N³ / (N log N).
/// </summary>
public static class OptimalSolverChoice
{
    /// <summary>Total sample count (both windows) above which the structured solver is preferred.</summary>
    public const int CrossoverCount = 512;

    public static bool PreferStructured(int count) => count > CrossoverCount;
}
