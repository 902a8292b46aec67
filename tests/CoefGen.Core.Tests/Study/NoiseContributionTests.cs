using CoefGen.Core.Noise;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Study;
using CoefGen.Core.Tests.Pipeline;

namespace CoefGen.Core.Tests.Study;

public class NoiseContributionTests
{
    /// <summary>Parseval for a sampled sequence: the integral of |H|^2 from 0 to Nyquist is (rate / 2) sum h^2.</summary>
    [Fact]
    public void Under_white_noise_the_variance_below_nyquist_is_parsevals_sum()
    {
        double[] h = [-0.25, -0.25, -0.5, 0.3, 0.4, 0.3];
        int[] index = [3, 4, 5, 20, 21, 22];
        const double rate = 1e6, s0 = 4e-16;
        var c = NoiseContribution.Compute(h, index, rate, _ => s0);
        var expected = s0 * rate / 2 * h.Sum(x => x * x);
        Assert.Equal(expected, c.BelowNyquist, expected * 1e-12);
        Assert.Equal(rate / 2, c.FrequencyHz[^1]);
    }

    [Fact]
    public void The_fft_power_response_equals_the_direct_sum()
    {
        double[] h = [-0.2, -0.3, -0.5, 0.6, 0.4];
        int[] index = [1, 2, 3, 9, 10];
        const double rate = 2e6;
        var c = NoiseContribution.Compute(h, index, rate, _ => 1, minBins: 64);
        var t = index.Select(i => i / rate).ToArray();
        for (var j = 0; j < c.FrequencyHz.Count; j += 7)
        {
            Assert.Equal(DesignReport.PowerResponse(h, t, c.FrequencyHz[j]), c.PowerResponse[j], 1e-12);
        }
    }

    /// <summary>
    /// With a brick-wall bandwidth below Nyquist nothing lies above it, so the running integral at Nyquist is the
    /// scheme's whole predicted variance, computed on the time-domain path (h^T R h).
    /// </summary>
    [Fact]
    public void For_a_band_limited_readout_the_integral_to_nyquist_is_the_predicted_variance()
    {
        var d = ShippedExamples.Load("fast_imaging.toml");
        var r = DesignPipeline.Run(d, ShippedExamples.Catalog);
        Assert.True(d.Noise.BandwidthHz < d.Adc.RateHz / 2);
        var digital = 2 * r.Noise.DigitalVarianceV2 / r.Grid.RateHz;
        for (var i = 0; i < r.Weights.Count; i++)
        {
            var c = NoiseContribution.Compute(r.Weights[i].H, r.Grid.SampleIndex, r.Grid.RateHz, f => r.Noise.Components.Sum(x => x.Psd(f)) + digital, minBins: 16384);
            Assert.Equal(1, c.BelowNyquist / r.Predictions[i].VarianceV2, 2e-3);
        }
    }
}
