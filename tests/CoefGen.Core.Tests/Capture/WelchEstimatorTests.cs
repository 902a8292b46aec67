using CoefGen.Core.Capture;

namespace CoefGen.Core.Tests.Capture;

public sealed class WelchEstimatorTests
{
    [Fact]
    public void Welch_psd_of_white_noise_is_flat_within_its_band_at_two_sigma_squared_over_rate()
    {
        const double rate = 1e6;
        const double sigma = 0.5;
        var random = new Random(7);
        var x = new double[1 << 16];
        for (var i = 0; i < x.Length; i++)
        {
            x[i] = sigma * Math.Sqrt(-2 * Math.Log(1 - random.NextDouble())) * Math.Cos(2 * Math.PI * random.NextDouble());
        }

        var s = WelchEstimator.Estimate(x, rate, 1024);
        var level = 2 * sigma * sigma / rate; // One-sided white density (common practice, no source).

        // Mean over the bins: relative sd sqrt(2/nu * 1.944 / bins) (correlated Hann bins); 3 sd allowed.
        var tolerance = 3 * Math.Sqrt(2 / s.DegreesOfFreedom * SpectrumFitter.HannBinInflation / s.PsdV2PerHz.Count);
        Assert.InRange(s.PsdV2PerHz.Average() / level, 1 - tolerance, 1 + tolerance);

        // Flat within the 95 % band: the true level lies inside it in about 95 % of bins (binomial, correlated bins: +-4 %).
        var inside = Enumerable.Range(0, s.PsdV2PerHz.Count).Count(k => s.LowerV2PerHz[k] <= level && level <= s.UpperV2PerHz[k]);
        Assert.InRange((double)inside / s.PsdV2PerHz.Count, 0.91, 0.99);
        Assert.Equal(127, s.Segments);
    }

    [Fact]
    public void Production_fft_matches_the_direct_sum()
    {
        var random = new Random(3);
        var n = 64;
        var re = Enumerable.Range(0, n).Select(_ => random.NextDouble() - 0.5).ToArray();
        var im = Enumerable.Range(0, n).Select(_ => random.NextDouble() - 0.5).ToArray();
        var (r0, i0) = ((double[])re.Clone(), (double[])im.Clone());
        new CoefGen.Core.Weights.Structured.Fft(n).Forward(re, im);
        for (var k = 0; k < n; k++)
        {
            double sr = 0, si = 0;
            for (var t = 0; t < n; t++)
            {
                var a = -2 * Math.PI * k * t / n;
                sr += (r0[t] * Math.Cos(a)) - (i0[t] * Math.Sin(a));
                si += (r0[t] * Math.Sin(a)) + (i0[t] * Math.Cos(a));
            }

            Assert.Equal(sr, re[k], 1e-12);
            Assert.Equal(si, im[k], 1e-12);
        }
    }
}
