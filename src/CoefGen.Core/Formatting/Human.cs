using System.Globalization;

namespace CoefGen.Core.Formatting;

/// <summary>
/// The one number formatter for people (terminal, report, chart ticks, comments of emitted files): invariant culture,
/// 4 significant figures, SI prefixes before a unit, percentages as %, never E-notation. Values beyond the prefixes
/// are written "1.234 x 10^-21". Machine output (JSON, literals in code) keeps full precision and does not use this.
/// </summary>
public static class Human
{
    public const int Significant = 4;

    private static readonly (double Scale, string Prefix)[] Prefixes =
    [
        (1e12, "T"), (1e9, "G"), (1e6, "M"), (1e3, "k"), (1, ""), (1e-3, "m"), (1e-6, "u"), (1e-9, "n"), (1e-12, "p"), (1e-15, "f"),
    ];

    /// <summary>Fixed significant figures with an SI prefix: Si(2.5e6, "Hz") = "2.500 MHz"; for aligned table columns.</summary>
    public static string Si(double value, string unit, int significant = Significant) => SiCore(value, unit, significant, trim: false);

    /// <summary>Like <see cref="Si"/> without trailing zeros: "2.5 MHz", "20 MS/s", "5 us"; for prose and chart ticks.</summary>
    public static string SiShort(double value, string unit, int significant = Significant) => SiCore(value, unit, significant, trim: true);

    /// <summary>A plain number with fixed significant figures ("0.9194", "1234", "12340000"); beyond 1e-4 .. 1e9 "x 10^n".</summary>
    public static string Num(double value, int significant = Significant) => NumCore(value, significant, trim: false);

    /// <summary>Like <see cref="Num"/> without trailing zeros.</summary>
    public static string NumShort(double value, int significant = Significant) => NumCore(value, significant, trim: true);

    /// <summary>A fraction as a percentage with significant figures and no trailing zeros: 0.1234567 -> "12.35 %".</summary>
    public static string Percent(double fraction, int significant = Significant) => NumCore(fraction * 100, significant, trim: true) + " %";

    /// <summary>A number followed by a unit that takes no prefix (e-, ADU, LSB, bits, ppm): "0.9194 e-".</summary>
    public static string With(double value, string unit, int significant = Significant) => $"{NumCore(value, significant, trim: true)} {unit}";

    public static string Whole(long value) => value.ToString(CultureInfo.InvariantCulture);

    public static string Whole(System.Numerics.BigInteger value) => value.ToString(CultureInfo.InvariantCulture);

    private static string SiCore(double value, string unit, int significant, bool trim)
    {
        if (value == 0 || !double.IsFinite(value))
        {
            return $"{NumCore(value, significant, trim)} {unit}";
        }

        var abs = Math.Abs(value);
        var rounded = RoundSignificant(abs, significant);
        foreach (var (scale, prefix) in Prefixes)
        {
            if (rounded >= scale)
            {
                return $"{NumCore(value / scale, significant, trim)} {prefix}{unit}";
            }
        }

        return $"{NumCore(value, significant, trim)} {unit}";
    }

    private static string NumCore(double value, int significant, bool trim)
    {
        if (value == 0)
        {
            return "0";
        }

        if (double.IsNaN(value))
        {
            return "NaN";
        }

        if (double.IsInfinity(value))
        {
            return value > 0 ? "infinity" : "-infinity";
        }

        var abs = RoundSignificant(Math.Abs(value), significant);
        var exponent = (int)Math.Floor(Math.Log10(abs));
        if (exponent < -4 || exponent >= 9)
        {
            var mantissa = Math.Sign(value) * abs / Math.Pow(10, exponent);
            return $"{Fixed(mantissa, significant - 1, trim)} x 10^{exponent.ToString(CultureInfo.InvariantCulture)}";
        }

        var decimals = Math.Clamp(significant - 1 - exponent, 0, 15);
        return Fixed(Math.Sign(value) * abs, decimals, trim);
    }

    private static string Fixed(double value, int decimals, bool trim)
    {
        var text = Math.Round(value, decimals, MidpointRounding.AwayFromZero).ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        if (trim && text.Contains('.', StringComparison.Ordinal))
        {
            text = text.TrimEnd('0').TrimEnd('.');
        }

        return text == "-0" ? "0" : text;
    }

    /// <summary>|value| rounded to the given significant figures (so 999.96 with 4 figures becomes 1000, one prefix up).</summary>
    private static double RoundSignificant(double abs, int significant)
    {
        var exponent = (int)Math.Floor(Math.Log10(abs));
        var scale = Math.Pow(10, significant - 1 - exponent);
        var r = Math.Round(abs * scale, MidpointRounding.AwayFromZero) / scale;
        return double.IsFinite(r) && r > 0 ? r : abs;
    }
}
