using CoefGen.Core.Noise;
using CoefGen.Core.Prediction;
using CoefGen.Core.Readout;
using CoefGen.Core.Tests.Weights;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Tests.Prediction;

public class NoisePredictorTests
{
    private static readonly AdcSpec Adc16 = new(1e6, 16, 4.0, AdcCoding.TwosComplement, 0.5);

    // 5 uV/e at the sense node, gain -2: 1e-5 V at the ADC per electron.
    private static readonly SensorSpec Sensor = new(5.0, -2.0);

    private static SampleGrid Grid(int nr, int ns) =>
        SampleGrid.Create(1e6, new SampleWindow(0, nr), new SampleWindow(nr + 3, ns), (nr - 0.5) / 1e6, null);

    [Fact]
    public void Boxcar_noise_is_reported_in_volts_ADU_and_electrons()
    {
        // White analog + digital, boxcar: var = (s2 + sd2)(1/N_R + 1/N_S) (PHYSICS.md §4); units by definition. Tolerance 1e-12 relative.
        var grid = Grid(4, 8);
        const double analog = 1e-8;
        var r = TestCovariances.White(grid, analog, Adc16.DigitalVarianceV2);
        var p = NoisePredictor.Predict(BoxcarWeights.Compute(grid, false), r, Adc16, Sensor, null);
        var variance = (analog + Adc16.DigitalVarianceV2) * (0.25 + 0.125);
        Assert.Equal(variance, p.VarianceV2, variance * 1e-12);
        Assert.Equal(Math.Sqrt(variance), p.SigmaV, Math.Sqrt(variance) * 1e-12);
        Assert.Equal(Math.Sqrt(variance) / (4.0 / 65536), p.SigmaAdu, p.SigmaAdu * 1e-12);
        Assert.Equal(Math.Sqrt(variance) / 1e-5, p.SigmaElectrons, p.SigmaElectrons * 1e-12);
        Assert.Null(p.FrequencyDomainVarianceV2);
        Assert.Null(p.FrequencyDomainRelativeDifference);
    }

    [Fact]
    public void Budget_lists_each_analog_component_then_quantisation_then_ADC_noise()
    {
        var grid = Grid(3, 5);
        var lags = TestCovariances.LagCount(grid);
        var r = new SampledCovariance(
            grid.SampleIndex,
            [TestCovariances.Ar1("pole", lags, 2e-9, 0.6), TestCovariances.Ar1("slow", lags, 1e-9, 0.99)],
            Adc16.DigitalVarianceV2);
        var w = BoxcarWeights.Compute(grid, false);
        var p = NoisePredictor.Predict(w, r, Adc16, Sensor, null);
        Assert.Equal(["pole", "slow", "quantisation", "ADC noise"], p.Budget.Select(b => b.Source));

        // Quantisation LSB^2/12 per sample (common practice, no source); ADC noise 0.5 LSB rms. Tolerance 1e-12 relative.
        var lsb = 4.0 / 65536;
        var sumSq = w.H.Sum(x => x * x);
        Assert.Equal(lsb * lsb / 12 * sumSq, p.Budget[2].VarianceV2, p.Budget[2].VarianceV2 * 1e-12);
        Assert.Equal(0.25 * lsb * lsb * sumSq, p.Budget[3].VarianceV2, p.Budget[3].VarianceV2 * 1e-12);
        Assert.Equal(r.ComponentQuadraticForm(w.H, 1), p.Budget[1].VarianceV2);
        Assert.Equal(p.VarianceV2, p.Budget.Sum(b => b.VarianceV2), p.VarianceV2 * 1e-12);
        Assert.Equal(1.0, p.Budget.Sum(b => b.Share), 1e-12);
    }

    [Fact]
    public void ADC_noise_is_left_out_of_the_budget_when_the_ADC_adds_none()
    {
        var adc = Adc16 with { NoiseLsb = 0 };
        var grid = Grid(2, 2);
        var r = TestCovariances.White(grid, 1e-8, adc.DigitalVarianceV2);
        var p = NoisePredictor.Predict(BoxcarWeights.Compute(grid, false), r, adc, Sensor, null);
        Assert.Equal(["white", "quantisation"], p.Budget.Select(b => b.Source));
    }

    [Fact]
    public void A_covariance_whose_digital_part_disagrees_with_the_ADC_is_refused()
    {
        var grid = Grid(2, 2);
        var r = TestCovariances.White(grid, 1e-8, 2 * Adc16.DigitalVarianceV2);
        Assert.Throws<ArgumentException>(() => NoisePredictor.Predict(BoxcarWeights.Compute(grid, false), r, Adc16, Sensor, null));
    }

    [Theory]
    [InlineData(WeightScheme.Boxcar, 0.5)]
    [InlineData(WeightScheme.Optimal, 0.9)]
    [InlineData(WeightScheme.Optimal, 0.2)]
    public void Frequency_domain_integral_of_an_AR1_spectrum_agrees_with_the_time_domain(WeightScheme scheme, double rho)
    {
        // AR(1) spectrum S(theta) = s2 (1 - p^2) / |1 - p e^{-j theta}|^2 on the sample grid (Wiener-Khinchin, textbook;
        // common practice, no source); variance = (1/2pi) integral over (-pi, pi] of S |H|^2. The periodic trapezoid rule
        // is exponentially accurate here. Tolerance 1e-10 relative.
        var grid = Grid(6, 9);
        const double sigma2 = 3e-9;
        var r = TestCovariances.Ar1(grid, sigma2, rho, Adc16.DigitalVarianceV2);
        var w = scheme == WeightScheme.Boxcar ? BoxcarWeights.Compute(grid, false) : OptimalWeights.Compute(grid, r, false).Weights;
        double Spectral(IReadOnlyList<double> h)
        {
            const int points = 4096;
            var total = 0.0;
            for (var q = 0; q < points; q++)
            {
                var theta = (2 * Math.PI * q / points) - Math.PI;
                double re = 0, im = 0;
                for (var k = 0; k < h.Count; k++)
                {
                    re += h[k] * Math.Cos(theta * grid.SampleIndex[k]);
                    im -= h[k] * Math.Sin(theta * grid.SampleIndex[k]);
                }

                var denominator = 1 - (2 * rho * Math.Cos(theta)) + (rho * rho);
                total += sigma2 * (1 - (rho * rho)) / denominator * ((re * re) + (im * im));
            }

            return total / points;
        }

        var p = NoisePredictor.Predict(w, r, Adc16, Sensor, Spectral);
        Assert.NotNull(p.FrequencyDomainRelativeDifference);
        Assert.True(p.FrequencyDomainRelativeDifference < 1e-10, $"relative difference {p.FrequencyDomainRelativeDifference}");
        Assert.Equal(p.VarianceV2, p.FrequencyDomainVarianceV2!.Value, p.VarianceV2 * 1e-10);
    }

    [Fact]
    public void Frequency_domain_difference_is_relative_to_the_total_variance()
    {
        // A delegate 10 % high on the analog part: difference = 0.1 analog / (analog + digital). Tolerance 1e-12 relative.
        var grid = Grid(4, 4);
        var r = TestCovariances.White(grid, 1e-8, Adc16.DigitalVarianceV2);
        var w = BoxcarWeights.Compute(grid, false);
        var p = NoisePredictor.Predict(w, r, Adc16, Sensor, h => 1.1e-8 * h.Sum(x => x * x));
        var expected = 0.1e-8 / (1e-8 + Adc16.DigitalVarianceV2);
        Assert.Equal(expected, p.FrequencyDomainRelativeDifference!.Value, expected * 1e-12);
    }
}
