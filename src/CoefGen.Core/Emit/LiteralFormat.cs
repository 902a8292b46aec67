using System.Globalization;
using System.Numerics;

namespace CoefGen.Core.Emit;

/// <summary>
/// Language-specific integer literals, formatted with the invariant culture so the bytes never depend on
/// the machine. Each method checks that the value fits the stated width (API misuse otherwise).
/// </summary>
public static class LiteralFormat
{
    /// <summary>Decimal, invariant culture, '-' for negatives.</summary>
    public static string DecimalText(BigInteger value) => value.ToString(CultureInfo.InvariantCulture);

    /// <summary>Decimal of a double with round-trip precision ("R"), invariant culture.</summary>
    public static string RoundTrip(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>
    /// A C literal for an int32_t (<paramref name="wide"/> false) or int64_t (true). The most negative value
    /// is written as a subtraction, since e.g. -2147483648 is the negation of a literal that does not fit int.
    /// 64-bit constants use INT64_C so they carry the right suffix on every platform.
    /// </summary>
    public static string C(long value, bool wide)
    {
        if (!wide)
        {
            if (value is < int.MinValue or > int.MaxValue)
            {
                throw new ArgumentOutOfRangeException(nameof(value), value, "does not fit int32_t");
            }

            return value == int.MinValue ? "(-2147483647 - 1)" : DecimalText(value);
        }

        if (value == long.MinValue)
        {
            return "(-INT64_C(9223372036854775807) - 1)";
        }

        return value < 0 ? $"(-INT64_C({DecimalText(-value)}))" : $"INT64_C({DecimalText(value)})";
    }

    /// <summary>A VHDL integer literal (32-bit in GHDL); the most negative value as a subtraction.</summary>
    public static string VhdlInteger(long value)
    {
        if (value is < int.MinValue or > int.MaxValue)
        {
            throw new ArgumentOutOfRangeException(nameof(value), value, "does not fit a 32-bit VHDL integer");
        }

        return value == int.MinValue ? "(-2147483647 - 1)" : DecimalText(value);
    }

    /// <summary>A VHDL string literal of exactly <paramref name="width"/> bits, two's complement, MSB first: "1111011".</summary>
    public static string VhdlBits(BigInteger value, int width)
    {
        var bits = Masked(value, width);
        var chars = new char[width];
        for (var i = 0; i < width; i++)
        {
            chars[width - 1 - i] = ((bits >> i) & 1) == 1 ? '1' : '0';
        }

        return "\"" + new string(chars) + "\"";
    }

    /// <summary>
    /// A sized signed Verilog/SystemVerilog literal: 18'sd5, -18'sd5, and for the most negative value
    /// (-18'sd131071 - 18'sd1) so no literal ever exceeds its width.
    /// </summary>
    public static string VerilogSigned(BigInteger value, int width)
    {
        CheckSigned(value, width);
        var w = width.ToString(CultureInfo.InvariantCulture);
        var min = -(BigInteger.One << (width - 1));
        if (width > 1 && value == min)
        {
            return $"(-{w}'sd{DecimalText(-min - 1)} - {w}'sd1)";
        }

        if (width == 1 && value == -1)
        {
            return "1'sb1";
        }

        return value < 0 ? $"-{w}'sd{DecimalText(-value)}" : $"{w}'sd{DecimalText(value)}";
    }

    /// <summary>Lower-case hex of the value masked to <paramref name="width"/> bits, ceil(width/4) digits: what $readmemh and VHDL hread expect.</summary>
    public static string MaskedHex(BigInteger value, int width)
    {
        var digits = (width + 3) / 4;
        var s = Masked(value, width).ToString("x", CultureInfo.InvariantCulture).TrimStart('0');
        return s.PadLeft(digits, '0');
    }

    /// <summary>The value reduced mod 2^width (two's complement bit pattern as a non-negative number).</summary>
    public static BigInteger Masked(BigInteger value, int width)
    {
        CheckSigned(value, width);
        return value & ((BigInteger.One << width) - 1);
    }

    private static void CheckSigned(BigInteger value, int width)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(width, 1);
        var half = BigInteger.One << (width - 1);
        if (value < -half || value >= half)
        {
            throw new ArgumentOutOfRangeException(nameof(value), value, $"does not fit {width} signed bits");
        }
    }
}
