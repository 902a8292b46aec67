using System.Globalization;
using System.Text.RegularExpressions;

namespace CoefGen.Core.Readout.Loading;

/// <summary>
/// Parses value strings such as "40 MHz", "40M", "40e6", "2.5 us". A bare number is in the key's own unit;
/// a prefix and/or unit symbol makes it an absolute SI quantity that is converted to the key's unit
/// ("2.5 us" for an _ns key is 2500). Prefixes and symbols are case-sensitive ("m" is milli, "M" mega).
/// </summary>
internal static partial class SiQuantity
{
    private static readonly Dictionary<char, int> Prefixes = new()
    {
        ['a'] = -18, ['f'] = -15, ['p'] = -12, ['n'] = -9, ['u'] = -6, ['\u00B5'] = -6, ['\u03BC'] = -6,
        ['m'] = -3, ['k'] = 3, ['M'] = 6, ['G'] = 9, ['T'] = 12, ['P'] = 15,
    };

    [GeneratedRegex(@"^([+-]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][+-]?[0-9]+)?)\s*(\S*)$", RegexOptions.CultureInvariant)]
    private static partial Regex Pattern();

    /// <summary>Parses <paramref name="text"/> into a value in the key's unit; on failure gives a reason.</summary>
    public static bool TryParse(string text, KeyUnit unit, out double value, out string error)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(unit);
        value = 0;
        var match = Pattern().Match(text.Trim());
        if (!match.Success)
        {
            error = $"\"{text}\" is not a number with an optional SI prefix and unit";
            return false;
        }

        var number = double.Parse(match.Groups[1].Value, NumberStyles.Float, CultureInfo.InvariantCulture);
        var rest = match.Groups[2].Value;
        if (rest.Length == 0)
        {
            value = number;
            error = "";
            return true;
        }

        if (!TryPrefixExponent(rest, unit, out var exponent))
        {
            error = UnitError(text, rest, unit);
            return false;
        }

        value = Scale(number, exponent - unit.Exponent);
        error = "";
        return true;
    }

    /// <summary>x * 10^e, dividing for negative e so that e.g. 2.5 * 10^3 and 2500 / 10^3 stay exact.</summary>
    public static double Scale(double x, int exponent) =>
        exponent >= 0 ? x * Math.Pow(10, exponent) : x / Math.Pow(10, -exponent);

    private static bool TryPrefixExponent(string rest, KeyUnit unit, out int exponent)
    {
        exponent = 0;
        if (unit.Symbols.Any(s => s.Length > 0 && s == rest))
        {
            return true;
        }

        if (!Prefixes.TryGetValue(rest[0], out exponent))
        {
            return false;
        }

        var symbol = rest[1..];
        return symbol.Length == 0 || unit.Symbols.Contains(symbol);
    }

    private static string UnitError(string text, string rest, KeyUnit unit)
    {
        var expected = unit.Canonical.Length == 0 ? "no unit" : $"'{string.Join("' or '", unit.Symbols.Where(s => s.Length > 0))}'";
        var caseHint = unit.Symbols.Any(s => s.Length > 0 && rest.EndsWith(s, StringComparison.OrdinalIgnoreCase) && !rest.EndsWith(s, StringComparison.Ordinal))
            ? " (units and prefixes are case-sensitive: m = milli, M = mega)"
            : "";
        return $"\"{text}\": '{rest}' does not match the key's unit, expected {expected} with an optional SI prefix (a f p n u m k M G T P){caseHint}";
    }
}
