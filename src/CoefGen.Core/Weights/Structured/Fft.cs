namespace CoefGen.Core.Weights.Structured;

/// <summary>
/// In-place iterative radix-2 complex FFT on split real/imaginary arrays, with a precomputed twiddle
/// table. Our own so that results never depend on which FFT provider a process has loaded; the
/// operation order is fixed, so output is bit-for-bit reproducible.
/// </summary>
internal sealed class Fft
{
    private readonly double[] _cos;
    private readonly double[] _sin;
    private readonly int[] _reverse;

    public Fft(int length)
    {
        if (length < 1 || (length & (length - 1)) != 0)
        {
            throw new ArgumentException($"FFT length must be a power of two, got {length}", nameof(length));
        }

        Length = length;
        _cos = new double[Math.Max(1, length / 2)];
        _sin = new double[Math.Max(1, length / 2)];
        for (var k = 0; k < length / 2; k++)
        {
            // Twiddles straight from the angle (no recurrence) keep errors at one ulp each.
            var angle = -2.0 * Math.PI * k / length;
            _cos[k] = Math.Cos(angle);
            _sin[k] = Math.Sin(angle);
        }

        _reverse = new int[length];
        var bits = System.Numerics.BitOperations.Log2((uint)length);
        for (var i = 0; i < length; i++)
        {
            var r = 0;
            for (var b = 0; b < bits; b++)
            {
                r |= ((i >> b) & 1) << (bits - 1 - b);
            }

            _reverse[i] = r;
        }
    }

    public int Length { get; }

    /// <summary>Forward transform X_k = sum x_n exp(-2 pi i n k / L).</summary>
    public void Forward(double[] re, double[] im) => Transform(re, im, 1.0);

    /// <summary>Inverse transform including the 1/L factor.</summary>
    public void Inverse(double[] re, double[] im)
    {
        Transform(re, im, -1.0);
        var scale = 1.0 / Length;
        for (var i = 0; i < Length; i++)
        {
            re[i] *= scale;
            im[i] *= scale;
        }
    }

    private void Transform(double[] re, double[] im, double sign)
    {
        var n = Length;
        for (var i = 0; i < n; i++)
        {
            var j = _reverse[i];
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
                    var wr = _cos[k * stride];
                    var wi = sign * _sin[k * stride];
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
