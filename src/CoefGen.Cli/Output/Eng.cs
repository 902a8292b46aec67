using CoefGen.Core.Formatting;

namespace CoefGen.Cli.Output;

/// <summary>The terminal's short names for <see cref="Human"/>, the one number formatter for people.</summary>
internal static class Eng
{
    /// <summary>e.g. Si(2.5e6, "Hz") = "2.500 MHz"; Si(3.05e-5, "V") = "30.50 uV".</summary>
    public static string Si(double value, string unit, int significant = 4) => Human.Si(value, unit, significant);

    /// <summary>A number with the given significant digits, never in E-notation.</summary>
    public static string Num(double value, int significant = 4) => Human.Num(value, significant);

    /// <summary>Like <see cref="Si"/> but without trailing zeros ("20 MS/s", "2.5 MHz"), for prose lines.</summary>
    public static string SiShort(double value, string unit, int significant = 4) => Human.SiShort(value, unit, significant);

    /// <summary>Like <see cref="Num"/> but without trailing zeros, for prose lines.</summary>
    public static string NumShort(double value, int significant = 4) => Human.NumShort(value, significant);

    public static string Int(long value) => Human.Whole(value);

    public static string Int(System.Numerics.BigInteger value) => Human.Whole(value);

    /// <summary>A fraction as a percentage with fixed decimals (table columns): 0.1234 -> "12.3 %".</summary>
    public static string Percent(double fraction, int decimals = 1) =>
        Math.Abs(fraction * 100) is var p && (p == 0 || p >= Math.Pow(10, -decimals))
            ? (fraction * 100).ToString("F" + decimals.ToString(System.Globalization.CultureInfo.InvariantCulture), System.Globalization.CultureInfo.InvariantCulture) + " %"
            : Human.Percent(fraction);
}
