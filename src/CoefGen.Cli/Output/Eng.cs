using System.Globalization;

namespace CoefGen.Cli.Output;

/// <summary>Invariant-culture number formatting for the terminal: SI prefixes, fixed significant digits.</summary>
internal static class Eng
{
    private static readonly (double Scale, string Prefix)[] Prefixes =
    [
        (1e9, "G"), (1e6, "M"), (1e3, "k"), (1, ""), (1e-3, "m"), (1e-6, "u"), (1e-9, "n"), (1e-12, "p"), (1e-15, "f"),
    ];

    /// <summary>e.g. Si(2.5e6, "Hz") = "2.5 MHz"; Si(3.05e-5, "V") = "30.5 uV".</summary>
    public static string Si(double value, string unit, int significant = 4)
    {
        if (value == 0 || double.IsNaN(value) || double.IsInfinity(value))
        {
            return $"{Num(value, significant)} {unit}";
        }

        var abs = Math.Abs(value);
        foreach (var (scale, prefix) in Prefixes)
        {
            if (abs >= scale * 0.9995)
            {
                return $"{Num(value / scale, significant)} {prefix}{unit}";
            }
        }

        return $"{Num(value / 1e-15, significant)} f{unit}";
    }

    /// <summary>A number with the given significant digits, no exponent for ordinary magnitudes.</summary>
    public static string Num(double value, int significant = 4)
    {
        if (value == 0)
        {
            return "0";
        }

        if (double.IsNaN(value) || double.IsInfinity(value))
        {
            return value.ToString(CultureInfo.InvariantCulture);
        }

        var abs = Math.Abs(value);
        if (abs >= 1e7 || abs < 1e-4)
        {
            return value.ToString("G" + significant.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        }

        var digitsBefore = (int)Math.Floor(Math.Log10(abs)) + 1;
        var decimals = Math.Clamp(significant - digitsBefore, 0, 12);
        return Math.Round(value, decimals, MidpointRounding.AwayFromZero)
            .ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
    }

    /// <summary>Like <see cref="Si"/> but without trailing zeros ("20 MS/s", "2.5 MHz"), for prose lines.</summary>
    public static string SiShort(double value, string unit, int significant = 4)
    {
        var text = Si(value, unit, significant);
        var space = text.IndexOf(' ', StringComparison.Ordinal);
        return space < 0 ? text : Trim(text[..space]) + text[space..];
    }

    /// <summary>Like <see cref="Num"/> but without trailing zeros, for prose lines.</summary>
    public static string NumShort(double value, int significant = 4) => Trim(Num(value, significant));

    private static string Trim(string number) =>
        number.Contains('.', StringComparison.Ordinal) && !number.Contains('E', StringComparison.Ordinal)
            ? number.TrimEnd('0').TrimEnd('.')
            : number;

    public static string Int(long value) => value.ToString(CultureInfo.InvariantCulture);

    public static string Int(System.Numerics.BigInteger value) => value.ToString(CultureInfo.InvariantCulture);

    public static string Percent(double fraction, int decimals = 1) =>
        (fraction * 100).ToString("F" + decimals.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture) + " %";
}
