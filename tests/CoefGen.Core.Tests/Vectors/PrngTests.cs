using CoefGen.Core.Vectors;
using MathNet.Numerics.Distributions;

namespace CoefGen.Core.Tests.Vectors;

public class PrngTests
{
    /// <summary>SplitMix64 from state 0: the first three outputs (value from memory of the reference C code's output).</summary>
    [Fact]
    public void SplitMix64_from_state_zero_gives_the_reference_sequence()
    {
        ulong state = 0;
        Assert.Equal(0xE220A8397B1DCDAFUL, Xoshiro256StarStar.SplitMix64(ref state));
        Assert.Equal(0x6E789E6AA1B965F4UL, Xoshiro256StarStar.SplitMix64(ref state));
        Assert.Equal(0x06C45D188009454FUL, Xoshiro256StarStar.SplitMix64(ref state));
    }

    [Fact]
    public void The_same_seed_gives_the_same_stream_and_another_seed_a_different_one()
    {
        var a = new Xoshiro256StarStar(42);
        var b = new Xoshiro256StarStar(42);
        var c = new Xoshiro256StarStar(43);
        var sa = Enumerable.Range(0, 100).Select(_ => a.NextUInt64()).ToArray();
        Assert.Equal(sa, Enumerable.Range(0, 100).Select(_ => b.NextUInt64()).ToArray());
        Assert.NotEqual(sa, Enumerable.Range(0, 100).Select(_ => c.NextUInt64()).ToArray());
    }

    /// <summary>
    /// 200000 deviates: the mean within 4.4 standard errors (two-sided 1e-5) and the variance inside the
    /// two-sided 1e-5 chi-square interval: a test that fails by chance once in 10^5 runs (it is deterministic anyway).
    /// </summary>
    [Fact]
    public void Gaussian_deviates_have_zero_mean_and_unit_variance()
    {
        const int n = 200_000;
        var rng = new Xoshiro256StarStar(7);
        var x = Enumerable.Range(0, n).Select(_ => rng.NextGaussian()).ToArray();
        var mean = x.Average();
        var variance = x.Sum(v => (v - mean) * (v - mean)) / (n - 1);
        Assert.InRange(mean, -4.42 / Math.Sqrt(n), 4.42 / Math.Sqrt(n));
        Assert.InRange(variance * (n - 1), ChiSquared.InvCDF(n - 1, 0.5e-5), ChiSquared.InvCDF(n - 1, 1 - 0.5e-5));
        var beyond3 = x.Count(v => Math.Abs(v) > 3) / (double)n;
        Assert.InRange(beyond3, 0.0027 * 0.8, 0.0027 * 1.2); // P(|z| > 3) = 0.0027 (common practice, no source); +-20 % is > 5 sigma at this n
    }
}
