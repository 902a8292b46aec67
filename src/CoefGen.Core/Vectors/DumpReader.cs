using System.Globalization;
using System.Numerics;
using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Vectors;

/// <summary>
/// Reads a DUT's output dump: one value per pixel, one per line. Blank lines and lines starting with '#' or
/// '//' are skipped (line numbers still count them). Hex values are the output word's bits and are read as
/// two's complement at the output width; decimal values are signed and must lie in the output's signed range.
/// </summary>
public static class DumpReader
{
    /// <summary>At most this many line errors are reported before giving up.</summary>
    public const int MaxLineErrors = 20;

    public static DumpReadResult Parse(string text, string path, int outputBits, DumpFormat format)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(path);
        ArgumentOutOfRangeException.ThrowIfLessThan(outputBits, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(outputBits, 64);
        var lines = DataLines(text).ToList();
        var used = format == DumpFormat.Auto ? Detect(lines.Select(l => l.Text), outputBits) : format;
        var diagnostics = new DiagnosticBag();
        var values = new List<long>(lines.Count);
        foreach (var (number, token) in lines)
        {
            var problem = used == DumpFormat.Hex ? TryHex(token, outputBits, out var v) : TryDecimal(token, outputBits, out v);
            if (problem is null)
            {
                values.Add(v);
                continue;
            }

            var code = problem.StartsWith("outside", StringComparison.Ordinal) || problem.StartsWith("wider", StringComparison.Ordinal)
                ? VectorCodes.DumpOutOfRange
                : VectorCodes.DumpUnparsable;
            diagnostics.Error(code, new SourceLocation(path, number, 1), $"'{Shorten(token)}' {problem}");
            if (diagnostics.Items.Count >= MaxLineErrors)
            {
                break;
            }
        }

        return diagnostics.HasErrors
            ? new DumpReadResult(null, used, diagnostics.Items)
            : new DumpReadResult(values, used, []);
    }

    /// <summary>
    /// Hex when any value has a hex letter or a 0x prefix, or when every value is unsigned, exactly
    /// ceil(bits/4) digits long and at least one starts with a 0 (zero-padded words, as $fdisplay("%h") writes
    /// them; decimal numbers have no leading zeros). Otherwise decimal. Pass the format explicitly when unsure.
    /// </summary>
    public static DumpFormat Detect(IEnumerable<string> tokens, int outputBits)
    {
        ArgumentNullException.ThrowIfNull(tokens);
        var list = tokens.ToList();
        if (list.Any(t => t.StartsWith("0x", StringComparison.OrdinalIgnoreCase) || t.Any(c => c is (>= 'a' and <= 'f') or (>= 'A' and <= 'F'))))
        {
            return DumpFormat.Hex;
        }

        var digits = (outputBits + 3) / 4;
        var padded = list.Count > 0 && list.All(t => t.Length == digits && t.All(char.IsAsciiDigit)) && list.Any(t => t.Length > 1 && t[0] == '0');
        return padded ? DumpFormat.Hex : DumpFormat.DecimalText;
    }

    private static IEnumerable<(int Line, string Text)> DataLines(string text)
    {
        var lines = text.Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            var t = lines[i].Trim();
            if (t.Length == 0 || t.StartsWith('#') || t.StartsWith("//", StringComparison.Ordinal))
            {
                continue;
            }

            yield return (i + 1, t);
        }
    }

    private static string? TryHex(string token, int bits, out long value)
    {
        value = 0;
        var t = token.StartsWith("0x", StringComparison.OrdinalIgnoreCase) ? token[2..] : token;
        t = t.Replace("_", "", StringComparison.Ordinal);
        if (t.Length == 0 || !t.All(char.IsAsciiHexDigit))
        {
            return "is not a hex number (x or z bits, or more than one value on the line?)";
        }

        var v = BigInteger.Parse("0" + t, NumberStyles.AllowHexSpecifier, CultureInfo.InvariantCulture);
        if (v >> bits != 0)
        {
            return $"wider than the {bits}-bit output";
        }

        var half = BigInteger.One << (bits - 1);
        value = (long)(v >= half ? v - (BigInteger.One << bits) : v);
        return null;
    }

    private static string? TryDecimal(string token, int bits, out long value)
    {
        value = 0;
        if (!BigInteger.TryParse(token, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var v))
        {
            return "is not a decimal integer (x or z bits, or more than one value on the line?)";
        }

        var half = BigInteger.One << (bits - 1);
        if (v < -half || v >= half)
        {
            return $"outside the signed {bits}-bit output range {-half}..{half - 1}";
        }

        value = (long)v;
        return null;
    }

    private static string Shorten(string s) => s.Length <= 40 ? s : s[..40] + "...";
}
