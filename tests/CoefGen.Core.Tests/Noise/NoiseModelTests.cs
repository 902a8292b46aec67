using CoefGen.Core.Noise;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Tests.Noise;

/// <summary>Building the model from a readout description.</summary>
public class NoiseModelTests
{
    [Fact]
    public void Sources_become_named_white_and_flicker_components_referred_to_the_adc_input()
    {
        NoiseSourceSpec[] sources =
        [
            new("amp", NoiseReference.Sensor, 5, 1e4, 1),
            new("driver", NoiseReference.Adc, 3, 0, 0),
            new("silent", NoiseReference.Adc, 0, 1e3, 1),
        ];
        var table = new PsdTable("bench.csv", [0, 1e6], [1e-17, 1e-18]);
        var model = NoiseModel.FromDescription(NoiseTestData.Description(sources, 1e6, null, table, gain: -2));
        Assert.Equal(["amp white", "amp 1/f", "driver white", "bench.csv (measured)"], model.Components.Select(c => c.Name));

        // At the sensor: e = 5 nV/√Hz times |gain| = 2 → e² = 1e-16 V²/Hz at the ADC input.
        var white = (ParametricNoiseComponent)model.Components[0];
        Assert.Equal(1e-16, white.Level, 1e-30);
        Assert.Equal(1e-16 * Math.PI * 1e6 / 2, white.Covariance(0), 1e-25);
        var flicker = (ParametricNoiseComponent)model.Components[1];
        Assert.Equal(1e-16 * 1e4, flicker.Level, 1e-26);
        Assert.Equal(1e-16 * 1e4 / 1e3 / (1 + 1e-6), flicker.Psd(1e3), 1e-30);
        Assert.Equal(0, flicker.Psd(0.5));
        Assert.Equal(9e-18, ((ParametricNoiseComponent)model.Components[2]).Level, 1e-32);

        var adc = new AdcSpec(NoiseTestData.Rate, 16, 2.0, AdcCoding.TwosComplement, 0.5);
        Assert.Equal(adc.LsbV * adc.LsbV * (1.0 / 12 + 0.25), model.DigitalVarianceV2, 1e-30);
    }

    [Fact]
    public void A_source_without_pole_or_bandwidth_is_rejected()
    {
        var d = NoiseTestData.Description([new("amp", NoiseReference.Adc, 5, 0, 0)], null, null, null);
        Assert.Throws<ArgumentException>(() => NoiseModel.FromDescription(d));
    }

    [Fact]
    public void Psd_integral_above_matches_quadrature_of_the_psd()
    {
        // Analytic alias tails against MathNet Gauss–Legendre of Psd itself (log-f panels).
        NoiseComponent[] components =
        [
            ParametricNoiseComponent.White("a", 1e-16, 1e6, null),
            ParametricNoiseComponent.White("b", 1e-16, 1e6, 7e6),
            ParametricNoiseComponent.Flicker("c", 1e-12, 2, 1e6, null),
            ParametricNoiseComponent.Flicker("d", 1e-12, 2, null, 7e6),
            new MeasuredPsdComponent("e", [1e3, 1e5, 2e6], [1e-15, 2e-16, 1e-17]),
        ];
        foreach (var c in components)
        {
            foreach (var f in new[] { 1.0, 5e4, 3e6 })
            {
                var upper = double.IsFinite(c.UpperLimitHz) ? c.UpperLimitHz : 1e14;
                var a = Math.Max(f, 2);
                var reference = 0.0;
                var cuts = c.Breakpoints.Where(b => b > a && b < upper).Append(upper).ToArray();
                foreach (var b in cuts)
                {
                    reference += ReferenceQuadrature.Composite(u => Math.Exp(u) * c.Psd(Math.Exp(u)), Math.Log(a), Math.Log(b), 200);
                    a = b;
                }

                if (f < 2)
                {
                    reference += c.Psd(1.5) * (2 - f);
                }

                var expected = reference + (double.IsFinite(c.UpperLimitHz) ? 0 : c.PsdIntegralAbove(1e14));
                Assert.Equal(expected, c.PsdIntegralAbove(f), expected * 1e-10);
            }
        }
    }
}
