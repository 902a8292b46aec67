using System.Numerics;

namespace CoefGen.Core.FixedPoint;

/// <summary>Signed two's-complement helpers: ranges, required widths, wrap-around and saturation.</summary>
public static class TwosComplement
{
    /// <summary>-2^(bits-1).</summary>
    public static BigInteger MinValue(int bits) => -(BigInteger.One << (bits - 1));

    /// <summary>2^(bits-1) - 1.</summary>
    public static BigInteger MaxValue(int bits) => (BigInteger.One << (bits - 1)) - 1;

    /// <summary>Smallest signed width that holds every value in [min, max] (at least 1).</summary>
    public static int RequiredBits(BigInteger min, BigInteger max)
    {
        var bits = 1;
        while (min < MinValue(bits) || max > MaxValue(bits))
        {
            bits++;
        }

        return bits;
    }

    /// <summary>v reduced mod 2^bits into [-2^(bits-1), 2^(bits-1)): what a bits-wide register holds.</summary>
    public static BigInteger Wrap(BigInteger v, int bits)
    {
        var modulus = BigInteger.One << bits;
        var r = BigInteger.Remainder(v, modulus);
        if (r.Sign < 0)
        {
            r += modulus;
        }

        return r > MaxValue(bits) ? r - modulus : r;
    }

    /// <summary>v clamped to the signed range of bits.</summary>
    public static BigInteger Saturate(BigInteger v, int bits) => BigInteger.Clamp(v, MinValue(bits), MaxValue(bits));

    /// <summary>Fast wrap for widths 1..127: keep the low bits and sign-extend.</summary>
    public static Int128 Wrap(Int128 v, int bits)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(bits, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(bits, 127);
        var s = 128 - bits;
        return unchecked((v << s) >> s);
    }

    /// <summary>Fast saturation for widths 1..127.</summary>
    public static Int128 Saturate(Int128 v, int bits)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(bits, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(bits, 127);
        var max = (Int128.One << (bits - 1)) - 1;
        var min = -max - 1;
        return v > max ? max : v < min ? min : v;
    }
}
