using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Tests.Weights;

/// <summary>White noise through one pole on a uniform grid is AR(1): closed forms derived in PHYSICS.md §4.</summary>
public class Ar1NoiseTests
{
    private const double Sigma2 = 1.7e-8;

    // N samples per window, the first signal sample G samples after the last reset sample.
    private static SampleGrid Grid(int n, int g) =>
        SampleGrid.Create(1e6, new SampleWindow(0, n), new SampleWindow(n - 1 + g, n), (n - 0.5) / 1e6, null);

    [Theory]
    [InlineData(1, 1, 0.3)]
    [InlineData(4, 2, 0.5)]
    [InlineData(8, 5, 0.9)]
    [InlineData(20, 1, 0.97)]
    public void Boxcar_variance_matches_the_AR1_closed_form(int n, int g, double rho)
    {
        // var = (2 s2/N^2)[N(1+p)/(1-p) - 2p(1-p^N)/(1-p)^2 - p^G((1-p^N)/(1-p))^2], derived in PHYSICS.md §4. Tolerance 1e-9 relative.
        var grid = Grid(n, g);
        var geometric = (1 - Math.Pow(rho, n)) / (1 - rho);
        var expected = 2 * Sigma2 / (n * n)
            * ((n * (1 + rho) / (1 - rho)) - (2 * rho * geometric / (1 - rho)) - (Math.Pow(rho, g) * geometric * geometric));
        var actual = TestCovariances.Ar1(grid, Sigma2, rho).QuadraticForm(BoxcarWeights.Compute(grid, false).H);
        Assert.Equal(expected, actual, expected * 1e-9);
    }

    [Theory]
    [InlineData(2, 1, 0.3)]
    [InlineData(4, 2, 0.5)]
    [InlineData(8, 5, 0.9)]
    [InlineData(20, 3, 0.97)]
    [InlineData(6, 40, 0.6)]
    public void Optimal_variance_matches_the_AR1_closed_form(int n, int g, double rho)
    {
        // var* = 2 s2 / (a0 + r/(1-r)), a0 = (N - (N-2)p)/(1+p), r = p^G, derived in PHYSICS.md §4. Tolerance 1e-9 relative.
        var grid = Grid(n, g);
        var r = Math.Pow(rho, g);
        var a0 = (n - ((n - 2) * rho)) / (1 + rho);
        var expected = 2 * Sigma2 / (a0 + (r / (1 - r)));
        var (_, variance) = OptimalWeights.Compute(grid, TestCovariances.Ar1(grid, Sigma2, rho), false);
        Assert.Equal(expected, variance, expected * 1e-9);
    }

    [Theory]
    [InlineData(3, 0.5)]
    [InlineData(8, 0.8)]
    [InlineData(12, 0.3)]
    public void End_samples_get_one_over_one_minus_rho_times_the_interior_weight(int n, double rho)
    {
        // For small r = rho^G the weights in a window are proportional to [1, 1-p, ..., 1-p, 1] (PHYSICS.md §4).
        // At the outer ends (first reset, last signal sample) the ratio is exact for any r; next to the gap
        // it holds up to O(r), here r = rho^200 < 1e-60. Tolerance 1e-9 relative.
        var grid = Grid(n, 200);
        var (w, _) = OptimalWeights.Compute(grid, TestCovariances.Ar1(grid, Sigma2, rho), false);
        var h = w.H;
        var expected = 1 / (1 - rho);
        Assert.Equal(expected, h[0] / h[1], expected * 1e-9);
        Assert.Equal(expected, h[n - 1] / h[n - 2], expected * 1e-9);
        Assert.Equal(expected, h[n] / h[n + 1], expected * 1e-9);
        Assert.Equal(expected, h[(2 * n) - 1] / h[(2 * n) - 2], expected * 1e-9);
    }
}
