using CoefGen.Core.Readout;

namespace CoefGen.Core.FixedPoint;

/// <summary>
/// The integer datapath of <see cref="IntegerDesign"/>, bit for bit: the single source of truth for emitted tables
/// and golden vectors. Two's complement throughout; Int128 holds every intermediate (products of at most
/// 32 x 32 bits, an accumulator of at most 64 bits, acc * M below 2^127), so nothing is lost before the
/// explicit wrap or saturation.
/// </summary>
public static class BitExactModel
{
    /// <summary>Runs one pixel cycle. <paramref name="codes"/>: ADC codes of the weighted samples, time order.</summary>
    public static BitExactResult Run(IntegerDesign design, IReadOnlyList<long> codes)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(codes);
        var c = design.Coefficients;
        if (codes.Count != c.Count)
        {
            throw new ArgumentException($"{codes.Count} codes for {c.Count} coefficients");
        }

        Int128 acc = 0;
        var clipped = false;
        for (var k = 0; k < c.Count; k++)
        {
            Int128 product = (Int128)c[k] * ToSample(codes[k], design.AdcBits, design.Coding);
            var sum = acc + product;
            acc = design.Accumulator == AccumulatorMode.Wrap
                ? TwosComplement.Wrap(sum, design.AccBits)
                : TwosComplement.Saturate(sum, design.AccBits);
            clipped |= acc != sum;
        }

        clipped &= design.Accumulator == AccumulatorMode.Saturate;
        var (output, saturated) = OutputStage(design, acc);
        return new BitExactResult((long)acc, output, clipped, saturated);
    }

    /// <summary>Runs one pixel cycle given every sample of the cycle (PixelSamples codes); picks the weighted ones.</summary>
    public static BitExactResult RunCycle(IntegerDesign design, IReadOnlyList<long> cycleCodes)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(cycleCodes);
        if (cycleCodes.Count != design.PixelSamples)
        {
            throw new ArgumentException($"{cycleCodes.Count} codes for a {design.PixelSamples}-sample pixel cycle");
        }

        return Run(design, [.. design.SampleIndex.Select(i => cycleCodes[i])]);
    }

    /// <summary>The signed sample the MAC sees: the code itself, or code - 2^(B-1) for offset binary.</summary>
    public static long ToSample(long code, int adcBits, AdcCoding coding)
    {
        var half = 1L << (adcBits - 1);
        var (min, max) = coding == AdcCoding.OffsetBinary ? (0L, (2 * half) - 1) : (-half, half - 1);
        if (code < min || code > max)
        {
            throw new ArgumentOutOfRangeException(nameof(code), code, $"ADC code outside {min}..{max}");
        }

        return coding == AdcCoding.OffsetBinary ? code - half : code;
    }

    /// <summary>The code the ADC writes for signed sample x (inverse of <see cref="ToSample"/>).</summary>
    public static long ToCode(long sample, int adcBits, AdcCoding coding) =>
        coding == AdcCoding.OffsetBinary ? sample + (1L << (adcBits - 1)) : sample;

    /// <summary>out = round(acc * M / 2^Shift), saturated to OutputBits.</summary>
    public static (long Output, bool Saturated) OutputStage(IntegerDesign design, Int128 acc)
    {
        ArgumentNullException.ThrowIfNull(design);
        var rounded = RoundShift(acc * design.PostMultiplier, design.Shift, design.Rounding);
        var output = TwosComplement.Saturate(rounded, design.OutputBits);
        return ((long)output, output != rounded);
    }

    /// <summary>v / 2^shift rounded as the mode says (shift 0 returns v).</summary>
    public static Int128 RoundShift(Int128 v, int shift, RoundingMode rounding)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(shift);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(shift, 126);
        if (shift == 0)
        {
            return v;
        }

        var half = Int128.One << (shift - 1);
        switch (rounding)
        {
            case RoundingMode.HalfUp:
                return (v + half) >> shift;
            case RoundingMode.Truncate:
                return v >> shift;
            default:
                var q = v >> shift;
                var rem = v - (q << shift);
                return rem > half || (rem == half && !Int128.IsEvenInteger(q)) ? q + 1 : q;
        }
    }
}
