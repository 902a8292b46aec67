using CoefGen.Core.Weights.Structured;

namespace CoefGen.Core.Tests.Weights.Structured;

/// <summary>
/// The vectorised butterflies of <see cref="Fft"/> against the scalar radix-2 loop they replace (kept here as written
/// before): every output double must be identical, so no structured solve, quadratic form or vector file changes.
/// </summary>
public class FftVectorTests
{
    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(4)]
    [InlineData(8)]
    [InlineData(64)]
    [InlineData(1024)]
    [InlineData(8192)]
    public void Forward_and_inverse_are_the_scalar_loop_bit_for_bit(int length)
    {
        var rng = new Random(length);
        var re = Enumerable.Range(0, length).Select(_ => rng.NextDouble() - 0.5).ToArray();
        var im = Enumerable.Range(0, length).Select(_ => rng.NextDouble() - 0.5).ToArray();
        var (sr, si) = ((double[])re.Clone(), (double[])im.Clone());
        var fft = new Fft(length);
        fft.Forward(re, im);
        ScalarTransform(sr, si, 1.0);
        Assert.Equal(sr, re);
        Assert.Equal(si, im);
        fft.Inverse(re, im);
        ScalarTransform(sr, si, -1.0);
        for (var i = 0; i < length; i++)
        {
            sr[i] *= 1.0 / length;
            si[i] *= 1.0 / length;
        }

        Assert.Equal(sr, re);
        Assert.Equal(si, im);
    }

    /// <summary>The scalar transform as <see cref="Fft"/> had it (twiddles cos/sin(-2 pi k / L), strided).</summary>
    private static void ScalarTransform(double[] re, double[] im, double sign)
    {
        var n = re.Length;
        var cos = new double[Math.Max(1, n / 2)];
        var sin = new double[Math.Max(1, n / 2)];
        for (var k = 0; k < n / 2; k++)
        {
            var angle = -2.0 * Math.PI * k / n;
            cos[k] = Math.Cos(angle);
            sin[k] = Math.Sin(angle);
        }

        var bits = System.Numerics.BitOperations.Log2((uint)n);
        for (var i = 0; i < n; i++)
        {
            var j = 0;
            for (var b = 0; b < bits; b++)
            {
                j |= ((i >> b) & 1) << (bits - 1 - b);
            }

            if (j > i)
            {
                (re[i], re[j]) = (re[j], re[i]);
                (im[i], im[j]) = (im[j], im[i]);
            }
        }

        for (var size = 2; size <= n; size <<= 1)
        {
            var half = size >> 1;
            var stride = n / size;
            for (var start = 0; start < n; start += size)
            {
                for (var k = 0; k < half; k++)
                {
                    var wr = cos[k * stride];
                    var wi = sign * sin[k * stride];
                    var a = start + k;
                    var b = a + half;
                    var tr = (re[b] * wr) - (im[b] * wi);
                    var ti = (re[b] * wi) + (im[b] * wr);
                    re[b] = re[a] - tr;
                    im[b] = im[a] - ti;
                    re[a] += tr;
                    im[a] += ti;
                }
            }
        }
    }
}
