using System.Globalization;
using System.Net;
using System.Text;

namespace CoefGen.Core.Study;

/// <summary>Invariant, fixed-precision numbers, escaping and the common opening of hand-written SVG (same bytes on every machine).</summary>
internal static class SvgFormat
{
    /// <summary>Estimated advance of one character of the 12 px sans-serif text, for layout without measuring fonts.</summary>
    public const int CharWidth = 7;

    public static string C(double v) => Math.Round(v, 2).ToString("0.##", CultureInfo.InvariantCulture);

    public static string Esc(string text) => WebUtility.HtmlEncode(text);

    /// <summary>An escaped tick label; "1 x 10^-5" becomes 10 with a raised exponent, "2 x 10^-5" keeps its mantissa.</summary>
    public static string TickText(string label)
    {
        label = System.Text.RegularExpressions.Regex.Replace(label, "(?<=[0-9]) u(?=[A-Za-z])", " \u00b5");
        var at = label.IndexOf(" x 10^", StringComparison.Ordinal);
        if (at < 0)
        {
            return Esc(label);
        }

        var mantissa = label[..at];
        var rest = label[(at + 6)..];
        var space = rest.IndexOf(' ', StringComparison.Ordinal);
        var (exponent, unit) = space < 0 ? (rest, "") : (rest[..space], rest[space..]);
        var head = mantissa == "1" ? "" : Esc(mantissa) + "×";
        return $"{head}10<tspan dy=\"-5\" font-size=\"9\">{Esc(exponent.Replace('-', '\u2212'))}</tspan><tspan dy=\"5\">{Esc(unit)}</tspan>";
    }

    public static string DashAttribute(ChartStyle style) => style.Dash.Length == 0 ? "" : $" stroke-dasharray=\"{style.Dash}\"";

    /// <summary>The svg element (scales down to its container, never wider than drawn), a white background, title and description.</summary>
    public static void SvgOpen(StringBuilder sb, double width, double height, string title, string description)
    {
        sb.Append($"<svg xmlns=\"http://www.w3.org/2000/svg\" role=\"img\" width=\"{C(width)}\" height=\"{C(height)}\" viewBox=\"0 0 {C(width)} {C(height)}\" style=\"max-width:100%;height:auto\" font-family=\"sans-serif\" font-size=\"12\">\n");
        sb.Append($"<title>{Esc(title)}</title>\n<desc>{Esc(description)}</desc>\n");
        sb.Append($"<rect width=\"{C(width)}\" height=\"{C(height)}\" fill=\"#ffffff\"/>\n");
    }

    /// <summary>Splits text at spaces into lines of at most <paramref name="chars"/> characters (a longer word stays whole).</summary>
    public static IReadOnlyList<string> Wrap(string text, int chars)
    {
        var lines = new List<string>();
        var line = new StringBuilder();
        foreach (var word in text.Split(' '))
        {
            if (line.Length > 0 && line.Length + 1 + word.Length > chars)
            {
                lines.Add(line.ToString());
                line.Clear();
            }

            line.Append(line.Length > 0 ? " " : "").Append(word);
        }

        lines.Add(line.ToString());
        return lines;
    }
}
