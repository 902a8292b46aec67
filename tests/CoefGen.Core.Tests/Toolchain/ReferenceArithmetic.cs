using System.Numerics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// Test-only big-integer reference of the arithmetic documented on <see cref="IntegerDesign"/>, written
/// straight from that comment before BitExactModel existed. Kept as an independent second implementation:
/// the toolchain tests compare emitted code against it, and ReferenceArithmeticAgreementTests pins it to
/// BitExactModel, so "the C matches the reference" also means "the C matches the model".
/// </summary>
public static class ReferenceArithmetic
{
    /// <summary>One output from the pixel cycle's ADC codes (as the ADC writes them, indexed by cycle sample).</summary>
    public static BigInteger Apply(IntegerDesign d, IReadOnlyList<long> cycleCodes) => Evaluate(d, cycleCodes).Output;

    /// <summary>The accumulator, the output and both clip flags for one pixel cycle (codes indexed by cycle sample).</summary>
    public static ReferenceArithmeticResult Evaluate(IntegerDesign d, IReadOnlyList<long> cycleCodes)
    {
        var clipped = false;
        var accMin = -(BigInteger.One << (d.AccBits - 1));
        var accMax = (BigInteger.One << (d.AccBits - 1)) - 1;
        BigInteger acc = 0;
        for (var k = 0; k < d.Coefficients.Count; k++)
        {
            BigInteger x = cycleCodes[d.SampleIndex[k]];
            if (d.Coding == AdcCoding.OffsetBinary)
            {
                x -= BigInteger.One << (d.AdcBits - 1);
            }

            acc += d.Coefficients[k] * x;
            if (d.Accumulator == AccumulatorMode.Saturate)
            {
                var clamped = BigInteger.Min(accMax, BigInteger.Max(accMin, acc));
                clipped |= clamped != acc;
                acc = clamped;
            }
            else
            {
                acc = Wrap(acc, d.AccBits);
            }
        }

        var m = acc * d.PostMultiplier;
        var q = Round(m, d.Shift, d.Rounding);
        var outMin = -(BigInteger.One << (d.OutputBits - 1));
        var outMax = (BigInteger.One << (d.OutputBits - 1)) - 1;
        var output = BigInteger.Min(outMax, BigInteger.Max(outMin, q));
        return new ReferenceArithmeticResult(acc, output, clipped, output != q);
    }

    /// <summary>Two's-complement wrap to <paramref name="bits"/> bits.</summary>
    public static BigInteger Wrap(BigInteger v, int bits)
    {
        var mod = BigInteger.One << bits;
        var r = BigInteger.Remainder(v, mod);
        if (r < 0)
        {
            r += mod;
        }

        return r >= mod / 2 ? r - mod : r;
    }

    /// <summary>m / 2^s rounded by the mode (floor-based, so negative values behave like an arithmetic shift).</summary>
    public static BigInteger Round(BigInteger m, int s, RoundingMode mode)
    {
        if (s == 0)
        {
            return m;
        }

        var scale = BigInteger.One << s;
        var floor = FloorDiv(m, scale);
        var rem = m - floor * scale;
        var half = scale / 2;
        return mode switch
        {
            RoundingMode.Truncate => floor,
            RoundingMode.HalfUp => FloorDiv(m + half, scale),
            RoundingMode.HalfEven => rem > half || (rem == half && !floor.IsEven) ? floor + 1 : floor,
            _ => throw new ArgumentOutOfRangeException(nameof(mode)),
        };
    }

    private static BigInteger FloorDiv(BigInteger a, BigInteger b)
    {
        var q = BigInteger.DivRem(a, b, out var r);
        return r < 0 ? q - 1 : q;
    }
}
