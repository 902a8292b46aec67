namespace CoefGen.Core.Tests.Capture;

/// <summary>Test-only FFT for synthesising captures, independent of the production FFT (Weights/Structured/Fft).
/// Written here rather than taken from a library so the bits never depend on a native provider.
/// </summary>
internal static class RadixTwoFft
{
    public static bool IsPowerOfTwo(int n) => n > 0 && (n & (n - 1)) == 0;

    public static void Forward(double[] re, double[] im) => Transform(re, im, -1.0);

    /// <summary>Inverse transform without the 1/N factor.</summary>
    public static void InverseUnscaled(double[] re, double[] im) => Transform(re, im, 1.0);

    private static void Transform(double[] re, double[] im, double sign)
    {
        var n = re.Length;
        if (!IsPowerOfTwo(n) || im.Length != n)
        {
            throw new ArgumentException("FFT length must be a power of two and both arrays the same length");
        }

        for (int i = 1, j = 0; i < n; i++)
        {
            var bit = n >> 1;
            for (; (j & bit) != 0; bit >>= 1)
            {
                j ^= bit;
            }

            j ^= bit;
            if (i < j)
            {
                (re[i], re[j]) = (re[j], re[i]);
                (im[i], im[j]) = (im[j], im[i]);
            }
        }

        for (var len = 2; len <= n; len <<= 1)
        {
            var half = len >> 1;
            for (var k = 0; k < half; k++)
            {
                // Twiddles from sin/cos of the exact angle each time: no accumulated rotation error.
                var angle = sign * 2.0 * Math.PI * k / len;
                var wr = Math.Cos(angle);
                var wi = Math.Sin(angle);
                for (var start = 0; start < n; start += len)
                {
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
