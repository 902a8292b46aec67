using CoefGen.Core.Noise;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Tests.Noise;

/// <summary>Sampled covariance facts: independence, per-sample variance, AR(1), quantisation, the 1/f constant.</summary>
public class SampledNoiseTests
{
    private const double E2 = 1e-16;

    [Fact]
    public void Brick_wall_white_noise_sampled_at_twice_the_bandwidth_is_independent()
    {
        // W2, PHYSICS §2: samples on the grid 1/(2 f_b) are independent with variance e² f_b.
        const double fb = 10e6;
        var c = ParametricNoiseComponent.White("w", E2, null, fb);
        var lags = c.LagTable(2 * fb, 500);
        Assert.Equal(E2 * fb, lags[0], E2 * fb * 1e-15);
        for (var k = 1; k < lags.Length; k++)
        {
            Assert.True(Math.Abs(lags[k]) < 1e-14 * lags[0], $"lag {k}: {lags[k]}");
        }
    }

    [Fact]
    public void White_noise_through_a_pole_is_an_AR1_sequence_with_variance_pi_fp_over_2()
    {
        // W1, PHYSICS §2: per-sample variance e² π f_p/2, ρ = exp(-2π f_p dt).
        const double fp = 1.3e6;
        var c = ParametricNoiseComponent.White("w", E2, fp, null);
        var lags = c.LagTable(NoiseTestData.Rate, 200);
        Assert.Equal(E2 * Math.PI * fp / 2, lags[0], lags[0] * 1e-15);
        var rho = Math.Exp(-2 * Math.PI * fp / NoiseTestData.Rate);
        for (var k = 1; k < lags.Length; k++)
        {
            Assert.Equal(rho, lags[k] / lags[k - 1], 1e-13);
        }
    }

    [Fact]
    public void Boxcar_variance_under_AR1_noise_matches_the_closed_form()
    {
        // Boxcar under AR(1), derived in PHYSICS §4 (checked there to 1e-8). Tolerance 1e-12 relative.
        const double fp = 2e6;
        const int n = 48;
        var grid = NoiseTestData.Grid(7, n, 7 + n + 11, n);
        var model = NoiseTestData.Model(0, ParametricNoiseComponent.White("w", E2, fp, null));
        var variance = model.Sample(grid).QuadraticForm(NoiseTestData.Boxcar(grid));
        var sigma2 = E2 * Math.PI * fp / 2;
        var rho = Math.Exp(-2 * Math.PI * fp / NoiseTestData.Rate);
        var g = grid.SampleIndex[n] - grid.SampleIndex[n - 1];
        var geometric = (1 - Math.Pow(rho, n)) / (1 - rho);
        var expected = 2 * sigma2 / (n * n) * (n * (1 + rho) / (1 - rho) - 2 * rho * (1 - Math.Pow(rho, n)) / ((1 - rho) * (1 - rho))
            - Math.Pow(rho, g) * geometric * geometric);
        Assert.Equal(expected, variance, expected * 1e-12);
    }

    [Fact]
    public void Quantisation_variance_is_LSB_squared_over_12()
    {
        // Common practice, no source: 16 bits over 2 V give LSB = 30.518 µV and σ_q = 8.810 µV (PHYSICS §6).
        var adc = new AdcSpec(40e6, 16, 2.0, AdcCoding.TwosComplement, 0);
        Assert.Equal(30.518e-6, adc.LsbV, 0.0005e-6);
        Assert.Equal(8.810e-6, Math.Sqrt(adc.DigitalVarianceV2), 0.0005e-6);
        var model = NoiseModel.FromDescription(NoiseTestData.Description([], null, null, null) with { Adc = adc });
        Assert.Equal(adc.LsbV * adc.LsbV / 12, model.DigitalVarianceV2, 1e-30);
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public void Moving_the_flicker_low_cutoff_by_seven_decades_leaves_zero_sum_variances_unchanged(bool pole)
    {
        // PHYSICS §5: the 1/f constant drops out for Σh = 0; 1e-2 Hz → 1e-9 Hz changes hᵀCh by < 1e-10 relative.
        var grid = NoiseTestData.Grid(0, 200, 260, 200);
        var h = NoiseTestData.Tapered(grid);
        double Variance(double fLow) =>
            NoiseTestData.Model(0, ParametricNoiseComponent.Flicker("f", E2 * 1e5, fLow, pole ? 1e6 : null, pole ? null : 15e6))
                .Sample(grid).QuadraticForm(h);
        var near = Variance(1e-2);
        var far = Variance(1e-9);
        Assert.True(near > 0);
        Assert.True(Math.Abs(near - far) < 1e-10 * near, $"{near} vs {far}");
    }

    [Fact]
    public void Sampled_lags_are_the_component_covariance_at_multiples_of_the_period()
    {
        var grid = NoiseTestData.Grid(3, 10, 40, 12);
        var component = ParametricNoiseComponent.Flicker("f", E2 * 1e4, 1, 1e6, null);
        var sampled = NoiseTestData.Model(1e-12, component).Sample(grid);
        var lag = sampled.Components[0].Lag;
        Assert.Equal(40 + 12 - 3, lag.Count);
        for (var k = 0; k < lag.Count; k++)
        {
            Assert.Equal(component.Covariance(k / NoiseTestData.Rate), lag[k]);
        }

        Assert.Equal(1e-12, sampled.DigitalVarianceV2);
    }
}
