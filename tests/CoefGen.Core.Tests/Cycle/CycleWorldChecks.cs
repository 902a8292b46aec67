using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Tests.Weights;
using CoefGen.Core.Weights;
using CoefGen.Core.Weights.Structured;
using MathNet.Numerics.LinearAlgebra;

namespace CoefGen.Core.Tests.Cycle;

/// <summary>The general cycle's estimators against closed forms and an independent dense solve.</summary>
public class CycleWorldChecks
{
    private const double Rate = 1e6;

    /// <summary>n pairs (reset window of m samples, charge window of m samples after a transfer), each pair after its own reset when <paramref name="ownReset"/>.</summary>
    private static SampleGrid Pairs(int n, int m, bool ownReset, int gap = 2)
    {
        var period = (2 * m) + (2 * gap);
        var windows = new List<CycleWindow>();
        for (var k = 0; k < n; k++)
        {
            var start = 5 + (k * period);
            var signal = start + m + gap;
            windows.Add(new CycleWindow("p", new SampleWindow(start, m), ChargeSight.None, 0, ownReset ? k : 0, k));
            windows.Add(new CycleWindow("s", new SampleWindow(signal, m), ChargeSight.Transfer, (signal - 0.5) / Rate, ownReset ? k : 0, k));
        }

        return SampleGrid.FromCycle(Rate, new CycleSpec(windows, ownReset ? n : 1, null, null, n), null);
    }

    /// <summary>Ramp windows of <paramref name="m"/> samples each, starts given, one reset group, integrating from <paramref name="startSample"/>.</summary>
    private static SampleGrid Ramp(IReadOnlyList<int> starts, int m, double startSample, double referenceS)
    {
        var windows = starts.Select((s, k) => new CycleWindow("r", new SampleWindow(s, m), ChargeSight.Ramp, startSample / Rate, 0, k)).ToList();
        return SampleGrid.FromCycle(Rate, new CycleSpec(windows, 1, referenceS, null, starts.Count), null);
    }

    private static readonly SensorSpec VoltPerElectron = new(1e6, 1.0); // 1 V per electron: shot rates in V^2/s equal e-/s

    [Theory]
    [InlineData(1, 4)]
    [InlineData(8, 4)]
    [InlineData(50, 2)]
    public void Independent_reads_under_white_noise_average_down_as_one_over_root_n(int n, int m)
    {
        // Tiffenberg et al. 2017 (PRL 119, 131802): averaging N independent reads gives sigma_N = sigma_1 / sqrt(N);
        // with m samples per window and independent samples each pair difference has variance 2 sigma^2 / m (PHYSICS.md §4b).
        var grid = Pairs(n, m, ownReset: true);
        var r = TestCovariances.White(grid, 1.0);
        var boxcar = BoxcarWeights.Compute(grid, rejectDrift: false).H;
        var (optimal, variance) = OptimalWeights.Compute(grid, r, rejectDrift: false);
        Assert.Equal(2.0 / (m * n), variance, 12);
        Assert.Equal(2.0 / (m * n), r.QuadraticForm(boxcar), 12);
        Assert.True(TestCovariances.MaxRelativeDifference(optimal.H, boxcar) < 1e-9);
        Assert.True(ConstraintResiduals.Of(grid, optimal.H).Offset < 1e-13);
        var single = OptimalWeights.Compute(Pairs(1, m, true), TestCovariances.White(Pairs(1, m, true), 1.0), false).VarianceV2;
        Assert.Equal(Math.Sqrt(single) / Math.Sqrt(n), Math.Sqrt(variance), 12);
    }

    [Fact]
    public void Reads_sharing_one_reset_have_one_offset_and_the_same_white_noise_optimum()
    {
        // One group: sum h = 0 over the whole cycle only. Under white noise the optimum is still the equal-weight
        // difference of all charge samples and all reset samples, 2 sigma^2 / (m N) (PHYSICS.md §4, boxcar).
        var grid = Pairs(6, 3, ownReset: false);
        Assert.Equal(1, grid.GroupCount);
        var (_, variance) = OptimalWeights.Compute(grid, TestCovariances.White(grid, 1.0), rejectDrift: false);
        Assert.Equal(2.0 / 18, variance, 12);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(4)]
    [InlineData(16)]
    public void Fowler_n_read_noise_limited_is_two_sigma_squared_over_n(int n)
    {
        // Fowler & Gatley 1990 (ApJ 353, L33): N reads at each end, independent samples: var = 2 sigma^2 / N, with the
        // reference time equal to the separation of the two groups' mean times (so the estimate is the difference).
        var grid = Ramp([10, 500], n, startSample: 10, referenceS: 490 / Rate);
        var r = TestCovariances.White(grid, 1.0);
        var boxcar = BoxcarWeights.Compute(grid, rejectDrift: false).H;
        Assert.Equal(2.0 / n, r.QuadraticForm(boxcar), 12);

        // The optimum also uses the slope inside each group of reads, so it can only do better than Fowler-N
        // (equal for one read per group, where the two estimators coincide).
        var optimal = OptimalWeights.Compute(grid, r, rejectDrift: false).VarianceV2;
        if (n == 1)
        {
            Assert.Equal(2.0, optimal, 12);
        }
        else
        {
            Assert.True(optimal < 2.0 / n);
        }
    }

    [Theory]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(10)]
    [InlineData(50)]
    public void Up_the_ramp_unweighted_slope_matches_the_read_and_shot_noise_closed_forms(int n)
    {
        // PHYSICS.md §4b (derived there, checked numerically): n reads dt apart, unweighted least-squares slope:
        // read-noise limited var = 12 sigma^2 / (n (n^2 - 1) dt^2); shot-noise limited var = 6 (n^2 + 1) F / (5 n (n^2 - 1) dt).
        // The estimate is the charge in T_ref = slope * T_ref, so both scale by T_ref^2.
        const int every = 7;
        var dt = every / Rate;
        var tref = 3 * dt;
        var grid = Ramp([.. Enumerable.Range(0, n).Select(k => 20 + (k * every))], 1, startSample: 20, referenceS: tref);
        var boxcar = BoxcarWeights.Compute(grid, rejectDrift: false).H;
        const double sigma2 = 0.7;
        var read = TestCovariances.White(grid, sigma2).QuadraticForm(boxcar);
        Assert.Equal(12 * sigma2 / (n * ((n * n) - 1.0) * dt * dt) * tref * tref, read, 10);

        const double flux = 2.5e5; // e-/s = V^2/s here
        var shot = ShotNoiseCovariance.For(grid, VoltPerElectron, flux)!.QuadraticForm(boxcar);
        var expected = 6 * ((n * n) + 1.0) * flux / (5 * n * ((n * n) - 1.0) * dt) * tref * tref;
        Assert.Equal(1.0, shot / expected, 12);
    }

    [Fact]
    public void Shot_quadratic_form_equals_the_dense_min_covariance()
    {
        // Independent path: the dense K_ij = F min(tau_i, tau_j) (PHYSICS.md §4b) against the one-pass integral form,
        // on two ramp groups (independent) and reset samples (no shot noise), random weights.
        var windows = new List<CycleWindow>
        {
            new("a", new SampleWindow(3, 4), ChargeSight.Ramp, 1 / Rate, 0, 0),
            new("z", new SampleWindow(9, 2), ChargeSight.None, 0, 1, 0),
            new("b", new SampleWindow(12, 3), ChargeSight.Ramp, 1 / Rate, 0, 0),
            new("c", new SampleWindow(20, 5), ChargeSight.Ramp, 18 / Rate, 1, 0),
        };
        var grid = SampleGrid.FromCycle(Rate, new CycleSpec(windows, 2, 10 / Rate, null, 1), null);
        var shot = ShotNoiseCovariance.For(grid, VoltPerElectron, 3e4)!;
        var rng = new Random(11);
        var h = Enumerable.Range(0, grid.Count).Select(_ => rng.NextDouble() - 0.5).ToArray();
        var dense = 0.0;
        for (var i = 0; i < grid.Count; i++)
        {
            for (var j = 0; j < grid.Count; j++)
            {
                dense += h[i] * h[j] * shot.At(i, j);
            }
        }

        Assert.Equal(1.0, shot.QuadraticForm(h) / dense, 13);
    }

    [Fact]
    public void Optimal_ramp_weights_go_from_the_unweighted_fit_to_the_endpoint_difference_as_shot_noise_grows()
    {
        // PHYSICS.md §4b: the GLS optimum tends to the unweighted fit as F -> 0 and to the two-endpoint difference when
        // shot noise dominates (a random walk's increments are independent, so the endpoints are sufficient).
        const int n = 12;
        var grid = Ramp([.. Enumerable.Range(0, n).Select(k => 10 + (k * 5))], 1, startSample: 10, referenceS: 5 / Rate);
        var white = TestCovariances.White(grid, 1.0);
        var boxcar = BoxcarWeights.Compute(grid, rejectDrift: false).H;
        var quiet = OptimalWeights.Compute(grid, white, rejectDrift: false).Weights.H;
        Assert.True(TestCovariances.MaxRelativeDifference(quiet, boxcar) < 1e-9);

        var faint = TestCovariances.White(grid, 1e-10).WithShot(ShotNoiseCovariance.For(grid, VoltPerElectron, 1e6));
        var optimal = OptimalWeights.Compute(grid, faint, rejectDrift: false).Weights.H;
        var endpoint = new double[n];
        endpoint[0] = -1.0 / (grid.Step[^1] - grid.Step[0]);
        endpoint[^1] = -endpoint[0];
        Assert.True(TestCovariances.MaxRelativeDifference(optimal, endpoint) < 1e-4);
        Assert.True(faint.QuadraticForm(optimal) < faint.QuadraticForm(boxcar));
    }

    [Fact]
    public void Correlated_reads_optimum_beats_the_average_and_matches_a_dense_gls_solve()
    {
        // 1/f-like noise (a slow AR(1) with rho = 0.999 plus white) correlates the reads over the whole cycle: the GLS
        // weights beat the plain average of the pairs (PHYSICS.md §4b). Reference: MathNet's LU on the KKT system with
        // one indicator column per reset group, an independent dense path.
        var grid = Pairs(10, 6, ownReset: true);
        var lags = TestCovariances.LagCount(grid);
        var r = new SampledCovariance(grid.SampleIndex, [TestCovariances.Ar1("slow", lags, 5.0, 0.999), TestCovariances.Ar1("fast", lags, 1.0, 0.2)], 0.05);
        var average = BoxcarWeights.Compute(grid, rejectDrift: false).H;
        var (optimal, variance) = OptimalWeights.Compute(grid, r, rejectDrift: false);
        Assert.True(variance < 0.995 * r.QuadraticForm(average), $"optimal {variance} vs average {r.QuadraticForm(average)}");

        var reference = Kkt(grid, r);
        Assert.True(TestCovariances.MaxRelativeDifference(optimal.H, reference) < 1e-8);
        Assert.Equal(1.0, variance / r.QuadraticForm(reference), 10);

        // The structured solver (Toeplitz FFT, projected CG, circulant per window) takes the same general constraints:
        // the noise is stationary, so its assumptions still hold with many windows and groups.
        var structured = new StructuredSolverAdapter().Solve(grid, r, rejectDrift: false);
        Assert.True(TestCovariances.MaxRelativeDifference(structured.H, reference) < 1e-7);
    }

    private static double[] Kkt(SampleGrid grid, SampledCovariance r)
    {
        MathNet.Numerics.Control.UseManaged();
        var n = grid.Count;
        var m = grid.GroupCount + 1;
        var k = Matrix<double>.Build.Dense(n + m, n + m);
        var rhs = Vector<double>.Build.Dense(n + m);
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                k[i, j] = r.FullAt(i, j);
            }

            k[i, n + grid.Group[i]] = k[n + grid.Group[i], i] = 1.0;
            k[i, n + m - 1] = k[n + m - 1, i] = grid.Step[i];
        }

        rhs[n + m - 1] = 1.0;
        return [.. k.Solve(rhs).Take(n)];
    }
}
