using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Tests.Weights;

public class WhiteNoiseTests
{
    private const double Sigma2 = 2.5e-9;

    private static SampleGrid Grid(int resetCount, int signalCount, int gap = 3) =>
        SampleGrid.Create(1e6, new SampleWindow(0, resetCount), new SampleWindow(resetCount + gap, signalCount), (resetCount - 0.5) / 1e6, null);

    [Theory]
    [InlineData(1, 1)]
    [InlineData(4, 4)]
    [InlineData(3, 11)]
    [InlineData(16, 5)]
    public void Boxcar_variance_is_sigma_squared_times_one_over_NR_plus_one_over_NS(int nr, int ns)
    {
        // Independent samples: var = sigma^2 (1/N_R + 1/N_S) (derived in PHYSICS.md §4; elementary). Tolerance 1e-12 relative.
        var grid = Grid(nr, ns);
        var expected = Sigma2 * ((1.0 / nr) + (1.0 / ns));
        foreach (var r in new[] { TestCovariances.White(grid, Sigma2), TestCovariances.White(grid, 0, Sigma2) })
        {
            var w = BoxcarWeights.Compute(grid, rejectDrift: false);
            Assert.Equal(expected, r.QuadraticForm(w.H), expected * 1e-12);
        }
    }

    [Fact]
    public void Repeated_read_averaging_lowers_noise_as_one_over_root_N()
    {
        // Fowler & Gatley 1990, ApJ 353 L33: N reads at each end give sigma * sqrt(2/N). Tolerance 1e-12 relative.
        var sigma1 = 0.0;
        foreach (var n in new[] { 1, 2, 4, 8, 16, 32, 64 })
        {
            var grid = Grid(n, n);
            var sigma = Math.Sqrt(TestCovariances.White(grid, Sigma2).QuadraticForm(BoxcarWeights.Compute(grid, false).H));
            if (n == 1)
            {
                sigma1 = sigma;
            }

            Assert.Equal(sigma1 / Math.Sqrt(n), sigma, sigma1 * 1e-12);
        }
    }

    [Theory]
    [InlineData(1, 1)]
    [InlineData(5, 5)]
    [InlineData(2, 9)]
    [InlineData(13, 4)]
    public void Optimal_weights_equal_boxcar_weights_under_white_noise(int nr, int ns)
    {
        // Hegyi & Burrows 1980, AJ 85 1421: differential averaging is the optimum for white noise. Tolerance 1e-12 absolute on weights of order 1.
        var grid = Grid(nr, ns);
        var boxcar = BoxcarWeights.Compute(grid, false);
        var (optimal, variance) = OptimalWeights.Compute(grid, TestCovariances.White(grid, Sigma2, 1e-12), false);
        for (var i = 0; i < grid.Count; i++)
        {
            Assert.Equal(boxcar.H[i], optimal.H[i], 1e-12);
        }

        var expected = (Sigma2 + 1e-12) * ((1.0 / nr) + (1.0 / ns));
        Assert.Equal(expected, variance, expected * 1e-12);
    }
}
