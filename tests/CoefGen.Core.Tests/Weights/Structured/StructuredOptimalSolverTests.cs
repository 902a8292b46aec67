using CoefGen.Core.Weights.Structured;

namespace CoefGen.Core.Tests.Weights.Structured;

public sealed class StructuredOptimalSolverTests
{
    public static TheoryData<string, int, bool> Cases()
    {
        var data = new TheoryData<string, int, bool>();
        foreach (var kind in new[] { "white", "ar1", "strong", "oneoverf", "oneoverf+const" })
        {
            foreach (var drift in new[] { false, true })
            {
                data.Add(kind, 64, drift);
                data.Add(kind, 256, drift);
            }
        }

        // Largest size against the dense reference: the hardest kinds, both constraint sets.
        data.Add("strong", 1024, false);
        data.Add("strong", 1024, true);
        data.Add("oneoverf+const", 1024, false);
        data.Add("oneoverf", 1024, true);
        return data;
    }

    [Theory]
    [MemberData(nameof(Cases))]
    public void Structured_solution_agrees_with_the_dense_null_space_solve(string kind, int perWindow, bool drift)
    {
        var grid = StructuredTestCases.Grid(perWindow);
        var r = StructuredTestCases.Covariance(grid, kind);
        var (a, b) = StructuredTestCases.Constraints(grid, drift);

        var s = StructuredOptimalSolver.Solve(r, a, b);
        var (dense, denseVar) = DenseReferenceSolver.Solve(r, a, b);

        Assert.True(s.Converged, s.Failure);
        var h = s.Weights;
        // Tolerances set by the issue: 1e-9 relative in variance, 1e-7 relative (max-norm) in weights.
        Assert.InRange(Math.Abs(s.VarianceV2 - denseVar) / denseVar, 0, 1e-9);
        Assert.InRange(Math.Abs(r.QuadraticForm(h.ToArray()) - denseVar) / denseVar, 0, 1e-9);
        var maxH = dense.Max(Math.Abs);
        var maxDiff = h.Select((x, i) => Math.Abs(x - dense[i])).Max();
        Assert.InRange(maxDiff / maxH, 0, 1e-7);
        AssertConstraintsHold(h, a, b);
    }

    [Fact]
    public void Optimal_weights_equal_boxcar_under_white_noise()
    {
        var grid = StructuredTestCases.Grid(300);
        var r = StructuredTestCases.Covariance(grid, StructuredTestCases.Lag("white"), 0.25);
        var (a, b) = StructuredTestCases.Constraints(grid, drift: false);

        var s = StructuredOptimalSolver.Solve(r, a, b);

        Assert.True(s.Converged, s.Failure);
        for (var i = 0; i < grid.Count; i++)
        {
            var boxcar = (grid.WindowOf(i) == 1) ? 1.0 / grid.Windows[1].Count : -1.0 / grid.Windows[0].Count;
            Assert.Equal(boxcar, s.Weights[i], 1e-14);
        }

        // var = σ²(1/N_R + 1/N_S) with σ² = 1 + 0.25 (PHYSICS.md §4, white independent samples).
        Assert.Equal(1.25 * (2.0 / 300), s.VarianceV2, 1e-14);
    }

    [Fact]
    public void Optimum_under_ar1_noise_matches_the_closed_form()
    {
        // var* = 2σ²/(a₀ + r/(1−r)), a₀ = (N − (N−2)ρ)/(1+ρ), r = ρ^G: derived in PHYSICS.md §4 (checked there to 1e-8).
        const int n = 200;
        var rho = Math.Exp(-2 * Math.PI / 50.0);
        var grid = StructuredTestCases.Grid(n);
        var gapLag = grid.SampleIndex[n] - grid.SampleIndex[n - 1];
        var r = StructuredTestCases.Covariance(grid, k => Math.Pow(rho, k), 0.0);
        var (a, b) = StructuredTestCases.Constraints(grid, drift: false);

        var s = StructuredOptimalSolver.Solve(r, a, b);

        var a0 = (n - ((n - 2) * rho)) / (1 + rho);
        var rg = Math.Pow(rho, gapLag);
        var expected = 2.0 / (a0 + (rg / (1 - rg)));
        Assert.True(s.Converged, s.Failure);
        Assert.InRange(Math.Abs(s.VarianceV2 - expected) / expected, 0, 1e-9);
    }

    [Fact]
    public void Adding_a_large_constant_to_every_lag_leaves_the_weights_unchanged()
    {
        // PHYSICS.md §5: c·11ᵀ drops out when Σh = 0; at c = 1000·C₀₀ the weights move < 3e-13 there (dense).
        var grid = StructuredTestCases.Grid(512);
        var (a, b) = StructuredTestCases.Constraints(grid, drift: true);
        var baseLag = StructuredTestCases.Lag("oneoverf");
        var plain = StructuredOptimalSolver.Solve(StructuredTestCases.Covariance(grid, baseLag, 1e-3), a, b);
        var shifted = StructuredOptimalSolver.Solve(StructuredTestCases.Covariance(grid, k => baseLag(k) + (1e6 * baseLag(0)), 1e-3), a, b);

        Assert.True(plain.Converged, plain.Failure);
        Assert.True(shifted.Converged, shifted.Failure);
        var maxH = plain.Weights.Max(Math.Abs);
        var maxDiff = plain.Weights.Select((x, i) => Math.Abs(x - shifted.Weights[i])).Max();
        Assert.InRange(maxDiff / maxH, 0, 1e-9);
        Assert.InRange(Math.Abs(plain.VarianceV2 - shifted.VarianceV2) / plain.VarianceV2, 0, 1e-9);
    }

    [Fact]
    public void Iteration_cap_is_reported_and_the_weights_are_withheld()
    {
        var grid = StructuredTestCases.Grid(256);
        var r = StructuredTestCases.Covariance(grid, "strong");
        var (a, b) = StructuredTestCases.Constraints(grid, drift: true);

        var s = StructuredOptimalSolver.Solve(r, a, b, relativeTolerance: 1e-13, maxIterations: 2);

        Assert.False(s.Converged);
        Assert.Contains("iteration cap", s.Failure, StringComparison.Ordinal);
        Assert.True(s.RelativeResidual > 1e-13);
        Assert.Throws<InvalidOperationException>(() => s.Weights);
        AssertConstraintsHold(s.LastIterate, a, b);
    }

    [Fact]
    public void Covariance_indefinite_on_the_null_space_is_reported()
    {
        // Lag 1 larger than lag 0: not a covariance; h = e_i − e_{i+1} directions have negative variance.
        var grid = StructuredTestCases.Grid(32);
        var r = StructuredTestCases.Covariance(grid, k => k == 0 ? 1.0 : k == 1 ? 1.5 : 0.0, 0.0);
        var (a, b) = StructuredTestCases.Constraints(grid, drift: false);

        var s = StructuredOptimalSolver.Solve(r, a, b);

        Assert.False(s.Converged);
        Assert.Contains("not positive definite", s.Failure, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(PreconditionerKind.None)]
    [InlineData(PreconditionerKind.StrangCirculant)]
    [InlineData(PreconditionerKind.TChanCirculant)]
    public void Every_preconditioner_reaches_the_same_optimum(PreconditionerKind kind)
    {
        var grid = StructuredTestCases.Grid(128);
        var r = StructuredTestCases.Covariance(grid, "oneoverf");
        var (a, b) = StructuredTestCases.Constraints(grid, drift: true);

        var s = StructuredOptimalSolver.Solve(r, a, b, kind);
        var (_, denseVar) = DenseReferenceSolver.Solve(r, a, b);

        Assert.True(s.Converged, s.Failure);
        Assert.InRange(Math.Abs(s.VarianceV2 - denseVar) / denseVar, 0, 1e-9);
    }

    [Fact]
    public void Dependent_constraint_columns_are_rejected()
    {
        var grid = StructuredTestCases.Grid(16);
        var r = StructuredTestCases.Covariance(grid, "white");
        var ones = Enumerable.Repeat(1.0, grid.Count).ToArray();
        var twos = Enumerable.Repeat(2.0, grid.Count).ToArray();

        Assert.Throws<ArgumentException>(() => StructuredOptimalSolver.Solve(r, [ones, twos], [0.0, 1.0]));
    }

    [Fact]
    public void Crossover_prefers_dense_for_small_and_structured_for_large_counts()
    {
        Assert.False(OptimalSolverChoice.PreferStructured(64));
        Assert.True(OptimalSolverChoice.PreferStructured(2 * 4096));
    }

    /// <summary>|a_jᵀh − b_j| ≤ 1e-12 · Σ|a_ji h_i| (the size of the terms summed, so the bound is round-off scaled).</summary>
    private static void AssertConstraintsHold(IReadOnlyList<double> h, double[][] a, double[] b)
    {
        for (var j = 0; j < a.Length; j++)
        {
            var dot = 0.0;
            var scale = 0.0;
            for (var i = 0; i < h.Count; i++)
            {
                dot += a[j][i] * h[i];
                scale += Math.Abs(a[j][i] * h[i]);
            }

            Assert.InRange(Math.Abs(dot - b[j]), 0, 1e-12 * Math.Max(scale, 1.0));
        }
    }
}
