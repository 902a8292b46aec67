using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Tests.Weights;

public class DriftConstraintTests
{
    private const double Sigma2 = 3e-9;

    // N samples per window at unit spacing, the signal window starting M samples after the reset window starts.
    private static SampleGrid Grid(int n, int m) =>
        SampleGrid.Create(2e6, new SampleWindow(4, n), new SampleWindow(4 + m, n), (4 + n - 0.5) / 2e6, null);

    private static double Expected(int n, int m) => Sigma2 * ((2.0 / n) + (6.0 * m * m / (n * ((n * n) - 1.0))));

    [Theory]
    [InlineData(8, 10)]
    [InlineData(2, 2)]
    [InlineData(5, 17)]
    [InlineData(32, 40)]
    public void Drift_rejecting_boxcar_has_the_white_noise_least_squares_variance(int n, int m)
    {
        // var/s2 = 2/N + 6 M^2/(N(N^2-1)) for white noise with sum h t = 0, derived in PHYSICS.md §4. Tolerance 1e-12 relative.
        var grid = Grid(n, m);
        var w = BoxcarWeights.Compute(grid, rejectDrift: true);
        var expected = Expected(n, m);
        Assert.Equal(expected, TestCovariances.White(grid, Sigma2).QuadraticForm(w.H), expected * 1e-12);
    }

    [Theory]
    [InlineData(8, 10)]
    [InlineData(2, 2)]
    [InlineData(5, 17)]
    [InlineData(32, 40)]
    public void Drift_rejecting_optimum_has_the_same_variance_under_white_noise(int n, int m)
    {
        // Same closed form (PHYSICS.md §4): under white noise the optimum is the least-squares estimate. Tolerance 1e-12 relative.
        var grid = Grid(n, m);
        var (w, variance) = OptimalWeights.Compute(grid, TestCovariances.White(grid, 0, Sigma2), rejectDrift: true);
        var expected = Expected(n, m);
        Assert.Equal(expected, variance, expected * 1e-12);
        var boxcar = BoxcarWeights.Compute(grid, rejectDrift: true);
        Assert.True(TestCovariances.MaxRelativeDifference(w.H, boxcar.H) < 1e-12);
    }

    [Fact]
    public void Rejecting_drift_costs_1_44_sigma_squared_against_0_25_for_eight_samples_ten_apart()
    {
        // PHYSICS.md §4: N = 8, M = 10 gives 1.44 s2 with drift rejection against 0.25 s2 without. Tolerance 5e-3 (1.44 is rounded).
        var grid = Grid(8, 10);
        var r = TestCovariances.White(grid, Sigma2);
        Assert.Equal(1.44, r.QuadraticForm(BoxcarWeights.Compute(grid, true).H) / Sigma2, 5e-3);
        Assert.Equal(0.25, r.QuadraticForm(BoxcarWeights.Compute(grid, false).H) / Sigma2, 1e-12);
    }

    [Fact]
    public void Drift_rejection_with_one_sample_per_window_is_refused()
    {
        // Three constraints on two samples: the step and the drift cannot be separated.
        var grid = Grid(1, 5);
        Assert.Throws<ArgumentException>(() => BoxcarWeights.Compute(grid, true));
        Assert.Throws<ArgumentException>(() => OptimalWeights.Compute(grid, TestCovariances.White(grid, Sigma2), true));
    }
}
