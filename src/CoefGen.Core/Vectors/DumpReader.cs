using System.Globalization;
using System.Numerics;
using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Vectors;

/// <summary>
/// Reads a DUT's output dump: one pixel per line, the output value, optionally followed by the final accumulator
/// (space separated, as in expected.txt). Blank lines and lines starting with '#' or '//' are skipped (line
/// numbers still count them). Hex values are the word's bits and are read as two's complement at its width;
/// decimal values are signed and must lie in the word's signed range. The format is decided once for the whole
/// file (<see cref="Detect"/>) or given; a bad line is reported as the first one, with how many more follow.
/// </summary>
public static class DumpReader
{
    /// <summary>Reads outputs only (a second column is an error).</summary>
    public static DumpReadResult Parse(string text, string path, int outputBits, DumpFormat format) => Parse(text, path, outputBits, 0, format);

    /// <summary>Reads outputs and, when <paramref name="accBits"/> &gt; 0 and every line has a second value, accumulators.</summary>
    public static DumpReadResult Parse(string text, string path, int outputBits, int accBits, DumpFormat format)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(path);
        ArgumentOutOfRangeException.ThrowIfLessThan(outputBits, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(outputBits, 64);
        ArgumentOutOfRangeException.ThrowIfNegative(accBits);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(accBits, 64);
        var lines = DataLines(text).Select(l => (l.Line, Tokens: l.Text.Split((char[])[' ', '\t'], StringSplitOptions.RemoveEmptyEntries))).ToList();
        var columns = accBits > 0 && lines.Count > 0 && lines[0].Tokens.Length == 2 ? 2 : 1;
        int Width(int column) => column == 0 ? outputBits : accBits;
        var used = format == DumpFormat.Auto
            ? Detect(lines.SelectMany(l => l.Tokens.Take(columns).Select((t, c) => (t, Width(c)))))
            : format;
        var values = new List<long>(lines.Count);
        var accs = columns == 2 ? new List<long>(lines.Count) : null;
        Diagnostic? first = null;
        var more = 0;
        foreach (var (number, tokens) in lines)
        {
            var problem = tokens.Length != columns
                ? (columns == 2 ? "has not two values (output and accumulator) like the first line" : accBits > 0 ? "holds more than output and accumulator" : "holds more than one value")
                : null;
            var code = VectorCodes.DumpUnparsable;
            var bad = tokens.Length > 0 ? tokens[0] : "";
            for (var c = 0; problem is null && c < columns; c++)
            {
                problem = used == DumpFormat.Hex ? TryHex(tokens[c], Width(c), out var v) : TryDecimal(tokens[c], Width(c), out v);
                if (problem is null)
                {
                    (c == 0 ? values : accs!).Add(v);
                }
                else
                {
                    bad = tokens[c];
                    code = problem.StartsWith("outside", StringComparison.Ordinal) || problem.StartsWith("wider", StringComparison.Ordinal)
                        ? VectorCodes.DumpOutOfRange
                        : VectorCodes.DumpUnparsable;
                    problem = (c == 0 ? "output " : "accumulator ") + problem;
                }
            }

            if (problem is null)
            {
                continue;
            }

            if (first is null)
            {
                first = Diagnostic.Error(code, new SourceLocation(path, number, 1), $"'{Shorten(bad)}': {problem} (reading the dump as {Word(used)}{(format == DumpFormat.Auto ? ", decided from the whole file; pass --format to choose" : "")})");
            }
            else
            {
                more++;
            }
        }

        if (first is not null)
        {
            var note = more == 0 ? "" : $"; {more} more bad line{(more == 1 ? "" : "s")} not shown";
            return new DumpReadResult(null, null, used, [first with { Message = first.Message + note }]);
        }

        return new DumpReadResult(values, accs, used, []);
    }

    /// <summary>Lower-case name of a format as the messages use it.</summary>
    public static string Word(DumpFormat format) => format == DumpFormat.Hex ? "hex" : "decimal";

    /// <summary>
    /// Decided once from every value of the file (value, word width): each value votes for hex when it only
    /// reads as hex (a hex letter or a 0x prefix) and for decimal when it only reads as decimal (a sign) or is
    /// all digits but not of the fixed hex width ceil(bits/4); the majority wins, so one stray line cannot flip
    /// the file. Without votes, hex when every value is
    /// unsigned, exactly ceil(bits/4) digits long and at least one starts with a 0 (zero-padded words, as
    /// $fdisplay("%h") writes them; decimal numbers have no leading zeros); otherwise decimal.
    /// </summary>
    public static DumpFormat Detect(IEnumerable<(string Token, int Bits)> values)
    {
        ArgumentNullException.ThrowIfNull(values);
        var list = values.ToList();
        var hexVotes = list.Count(v => TryHex(v.Token, 64, out _) is null && !IsDecimal(v.Token));
        var decVotes = list.Count(v => IsDecimal(v.Token) && (TryHex(v.Token, 64, out _) is not null || v.Token.Length != (v.Bits + 3) / 4));
        if (hexVotes != decVotes)
        {
            return hexVotes > decVotes ? DumpFormat.Hex : DumpFormat.DecimalText;
        }

        var padded = list.Count > 0 && list.All(v => v.Token.Length == (v.Bits + 3) / 4 && v.Token.All(char.IsAsciiDigit)) && list.Any(v => v.Token.Length > 1 && v.Token[0] == '0');
        return padded ? DumpFormat.Hex : DumpFormat.DecimalText;
    }

    private static bool IsDecimal(string token) => BigInteger.TryParse(token, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out _);

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
