using System.Numerics;

namespace CoefGen.Core.Weights.Structured;

/// <summary>
/// In-place iterative radix-2 complex FFT on split real/imaginary arrays, with a precomputed twiddle
/// table. Our own so that results never depend on which FFT provider a process has loaded; the
/// operation order is fixed, so output is bit-for-bit reproducible. Stages with at least one vector of butterflies
/// run them with <see cref="Vector{T}"/>: each lane does the scalar butterfly's multiplications, additions and
/// subtractions in the same order (no fused multiply-add), so the result is the same doubles whatever the vector width.
/// </summary>
internal sealed class Fft
{
    private readonly double[] _cos;
    private readonly double[] _sin;
    private readonly int[] _reverse;

    // The twiddles of each stage laid out contiguously (stage with half-size h at offset h - 1): the same values as
    // _cos[k * stride], read in vector loads.
    private readonly double[] _stageCos;
    private readonly double[] _stageSin;

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

        _stageCos = new double[Math.Max(1, length - 1)];
        _stageSin = new double[Math.Max(1, length - 1)];
        for (var half = 1; half < length; half <<= 1)
        {
            var stride = length / (2 * half);
            for (var k = 0; k < half; k++)
            {
                _stageCos[half - 1 + k] = _cos[k * stride];
                _stageSin[half - 1 + k] = _sin[k * stride];
            }
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

        var lanes = Vector<double>.Count;
        for (var size = 2; size <= n; size <<= 1)
        {
            var half = size >> 1;
            if (half >= lanes && Vector.IsHardwareAccelerated)
            {
                VectorStage(re, im, half, sign);
                continue;
            }

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

    /// <summary>One stage of butterflies, <see cref="Vector{T}.Count"/> at a time (half is a multiple of it: both are powers of two).</summary>
    private void VectorStage(double[] re, double[] im, int half, double sign)
    {
        var n = Length;
        var lanes = Vector<double>.Count;
        var signs = new Vector<double>(sign);
        var table = half - 1;
        for (var start = 0; start < n; start += 2 * half)
        {
            for (var k = 0; k < half; k += lanes)
            {
                var wr = new Vector<double>(_stageCos, table + k);
                var wi = signs * new Vector<double>(_stageSin, table + k);
                var a = start + k;
                var b = a + half;
                var rb = new Vector<double>(re, b);
                var ib = new Vector<double>(im, b);
                var ra = new Vector<double>(re, a);
                var ia = new Vector<double>(im, a);
                var tr = (rb * wr) - (ib * wi);
                var ti = (rb * wi) + (ib * wr);
                (ra - tr).CopyTo(re, b);
                (ia - ti).CopyTo(im, b);
                (ra + tr).CopyTo(re, a);
                (ia + ti).CopyTo(im, a);
            }
        }
    }
}
