using System.Diagnostics;
using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;
using MathNet.Numerics.LinearAlgebra;

namespace CoefGen.Core.Tests.Weights;

public class OptimalSolverReferenceTests
{
    private static SampleGrid Grid(int nr, int ns, int gap, double? poleHz) =>
        SampleGrid.Create(1e6, new SampleWindow(3, nr), new SampleWindow(3 + nr + gap, ns), (3 + nr - 0.5) / 1e6, poleHz);

    /// <summary>Independent reference: the KKT system [R A; A^T 0][h; l] = [0; b] solved densely by MathNet's LU.</summary>
    private static double[] KktSolve(SampleGrid grid, SampledCovariance r, bool rejectDrift)
    {
        MathNet.Numerics.Control.UseManaged();
        var n = grid.Count;
        var m = rejectDrift ? 3 : 2;
        var k = Matrix<double>.Build.Dense(n + m, n + m);
        var rhs = Vector<double>.Build.Dense(n + m);
        var meanIndex = grid.SampleIndex.Average();
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                k[i, j] = r.At(i, j);
            }

            double[] a = rejectDrift ? [1.0, grid.Step[i], grid.SampleIndex[i] - meanIndex] : [1.0, grid.Step[i]];
            for (var c = 0; c < m; c++)
            {
                k[i, n + c] = a[c];
                k[n + c, i] = a[c];
            }
        }

        rhs[n + 1] = 1.0;
        return [.. k.Solve(rhs).Take(n)];
    }

    public static TheoryData<int, int, int, bool, bool> Cases => new()
    {
        { 1, 1, 0, false, false },
        { 3, 7, 2, true, false },
        { 12, 12, 5, false, true },
        { 9, 4, 0, true, true },
        { 40, 40, 10, true, false },
        { 64, 48, 3, false, true },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Null_space_solve_matches_a_dense_KKT_solve(int nr, int ns, int gap, bool partial, bool drift)
    {
        // Reference: MathNet dense LU on the KKT system (common practice, no source). Tolerance 1e-9 relative.
        var rng = new Random((nr * 1000) + ns + gap);
        for (var trial = 0; trial < 5; trial++)
        {
            var grid = Grid(nr, ns, gap, partial ? 1e6 * (0.05 + rng.NextDouble()) / (2 * Math.PI) : null);
            var r = TestCovariances.Mixture(grid, rng, digital: 1e-3 + rng.NextDouble());
            if (drift && (nr < 2 || ns < 2))
            {
                continue;
            }

            var (w, variance) = OptimalWeights.Compute(grid, r, drift);
            var reference = KktSolve(grid, r, drift);
            Assert.True(TestCovariances.MaxRelativeDifference(w.H, reference) < 1e-9);
            var referenceVariance = r.QuadraticForm(reference);
            Assert.Equal(referenceVariance, variance, referenceVariance * 1e-9);
        }
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void Adding_a_constant_to_every_covariance_entry_leaves_the_optimal_weights_unchanged(bool drift)
    {
        // c 11^T drops out of h^T R h when sum h = 0 (PHYSICS.md §5), c = 1000 C00. Tolerance 1e-10 relative.
        var grid = Grid(30, 30, 4, 1e6 * 0.4 / (2 * Math.PI));
        var lags = TestCovariances.LagCount(grid);
        var pole = TestCovariances.Ar1("pole", lags, 1.0, 0.8);
        var slow = TestCovariances.Ar1("slow", lags, 0.5, 0.995);
        var c00 = pole.Lag[0] + slow.Lag[0] + 0.01;
        var plain = new SampledCovariance(grid.SampleIndex, [pole, slow], 0.01);
        var shifted = new SampledCovariance(grid.SampleIndex, [pole, TestCovariances.Ar1("slow", lags, 0.5, 0.995, 1000 * c00)], 0.01);
        var (a, va) = OptimalWeights.Compute(grid, plain, drift);
        var (b, vb) = OptimalWeights.Compute(grid, shifted, drift);
        Assert.True(TestCovariances.MaxRelativeDifference(b.H, a.H) < 1e-10);
        Assert.Equal(va, vb, va * 1e-10);
    }

    [Fact]
    public void Covariance_without_a_white_floor_that_is_singular_is_reported_as_not_positive_definite()
    {
        // Perfectly correlated samples (rho = 1, no digital noise): Z^T R Z = 0.
        var grid = Grid(4, 4, 1, null);
        var r = TestCovariances.Ar1(grid, 1.0, 1.0);
        Assert.Throws<CovarianceNotPositiveDefiniteException>(() => OptimalWeights.Compute(grid, r, false));
    }

    [Theory]
    [InlineData(256)]
    [InlineData(1024)]
    public void Optimal_solve_of_two_large_windows_is_timed_meets_its_constraints_and_beats_boxcar(int perWindow)
    {
        // Constraints to 1e-12 (the residual measure of ConstraintResiduals); optimum <= boxcar by definition.
        var grid = Grid(perWindow, perWindow, 20, 1e6 * 0.3 / (2 * Math.PI));
        var r = TestCovariances.Mixture(grid, new Random(perWindow), digital: 0.01);
        var clock = Stopwatch.StartNew();
        var (w, variance) = OptimalWeights.Compute(grid, r, true);
        clock.Stop();
        TestContext.Current.TestOutputHelper?.WriteLine($"optimal solve 2x{perWindow}: {clock.Elapsed.TotalMilliseconds:F0} ms");
        var residuals = ConstraintResiduals.Of(grid, w.H);
        Assert.True(residuals.Offset < 1e-12 && residuals.Gain < 1e-12 && residuals.Drift < 1e-12, residuals.ToString());
        Assert.True(variance <= r.QuadraticForm(BoxcarWeights.Compute(grid, true).H));
        if (perWindow <= 256)
        {
            // Reference: MathNet dense LU on the KKT system (common practice, no source). Tolerance 1e-9 relative.
            Assert.True(TestCovariances.MaxRelativeDifference(w.H, KktSolve(grid, r, true)) < 1e-9);
        }
    }
}
