using System.Globalization;
using System.Net;
using System.Text;
using CoefGen.Core.Study;

namespace CoefGen.Cli.Output;

/// <summary>
/// The design report as one self-contained HTML page: inline CSS and SVG, no scripts, no external resources.
/// Machine text (hashes, integer lists, big integers) is marked class="raw"; every keyed number carries its JSON
/// path and its full-precision value (data-json, data-value).
/// </summary>
internal static class ReportHtml
{
    private const string Style =
        "body{font-family:sans-serif;margin:24px auto;max-width:1200px;padding:0 16px;color:#111;line-height:1.4}" +
        "h2{border-bottom:1px solid #ccc;padding-bottom:2px;margin-top:32px}" +
        "table{border-collapse:collapse;margin:8px 0;max-width:100%}td,th{border:1px solid #bbb;padding:3px 8px;text-align:left;vertical-align:baseline;overflow-wrap:anywhere}" +
        "th{background:#f0f0f0}td[data-json]{text-align:right;white-space:nowrap}td.raw{font-family:monospace;font-size:90%}" +
        "pre{background:#f4f4f4;padding:8px;white-space:pre-wrap;overflow-wrap:anywhere;max-width:100%}" +
        "figure{margin:16px 0}figure svg{display:block}figcaption{font-size:90%;color:#444;max-width:860px}" +
        ".banner{font-size:120%;font-weight:bold;padding:14px 18px;border-radius:4px;margin:12px 0}" +
        ".banner.safe{background:#e3f2e6;border:2px solid #2d7a3e;color:#1b4d27}" +
        ".banner.alarm{background:#fde8e8;border:4px solid #b3261e;color:#7a1711;font-size:140%}" +
        "details{margin:8px 0}summary{cursor:pointer}";

    public static string Render(string title, IReadOnlyList<ReportSection> sections)
    {
        var sb = new StringBuilder();
        sb.Append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<meta name=\"viewport\" content=\"width=device-width\">\n");
        sb.Append($"<title>{E(title)}</title>\n");
        sb.Append($"<style>{Style}</style>\n</head>\n<body>\n");
        sb.Append($"<h1>{E(title)}</h1>\n");
        foreach (var s in sections)
        {
            sb.Append($"<h2>{E(s.Title)}</h2>\n");
            foreach (var b in s.Blocks)
            {
                Block(sb, b);
            }
        }

        sb.Append("</body>\n</html>\n");
        return sb.ToString();
    }

    private static void Block(StringBuilder sb, ReportBlock b)
    {
        if (b.Banner is not null)
        {
            sb.Append($"<div class=\"banner {(b.Alarm ? "alarm" : "safe")}\" role=\"{(b.Alarm ? "alert" : "status")}\">{Code(b.Banner)}</div>\n");
        }

        if (b.Paragraph is not null)
        {
            sb.Append($"<p>{Code(b.Paragraph)}</p>\n");
        }

        if (b.Lines is not null)
        {
            var pre = $"<pre{(b.Raw ? " class=\"raw\"" : "")}>{E(string.Join("\n", b.Lines))}</pre>\n";
            sb.Append(b.Summary is null ? pre : $"<details class=\"raw\"><summary>{E(b.Summary)}</summary>\n{pre}</details>\n");
        }

        if (b.Table is not null)
        {
            Table(sb, b.Table);
        }

        if (b.Svg is not null)
        {
            sb.Append("<figure>\n").Append(b.Svg).Append($"<figcaption>{E(b.Caption ?? "")}</figcaption>\n</figure>\n");
        }
    }

    private static void Table(StringBuilder sb, IReadOnlyList<IReadOnlyList<ReportCell>> rows)
    {
        sb.Append("<table>\n");
        for (var i = 0; i < rows.Count; i++)
        {
            sb.Append("<tr>");
            foreach (var c in rows[i])
            {
                var raw = c.Raw ? " class=\"raw\"" : "";
                if (i == 0)
                {
                    sb.Append($"<th>{E(c.Text)}</th>");
                }
                else if (c.JsonPath is not null)
                {
                    var value = c.Value is double v ? $" data-value=\"{v.ToString("R", CultureInfo.InvariantCulture)}\"" : "";
                    sb.Append($"<td{raw} data-json=\"{E(c.JsonPath)}\"{value}>{(c.Raw ? E(c.Text) : Q(c.Text))}</td>");
                }
                else
                {
                    sb.Append($"<td{raw}>{(c.Raw ? E(c.Text) : Q(c.Text))}</td>");
                }
            }

            sb.Append("</tr>\n");
        }

        sb.Append("</table>\n");
    }

    private static string E(string s) => WebUtility.HtmlEncode(s);

    /// <summary>Escaped prose with `command` spans as code.</summary>
    private static string Code(string s) => System.Text.RegularExpressions.Regex.Replace(Q(s), "`([^`]+)`", "<code>$1</code>");

    /// <summary>A quantity's text for the page: "x 10^-9" as a superscript power, V^2 as V², rtHz as √Hz, u as µ.</summary>
    private static string Q(string s)
    {
        var text = E(s).Replace("^2", "\u00b2", StringComparison.Ordinal).Replace("rtHz", "\u221aHz", StringComparison.Ordinal);
        text = System.Text.RegularExpressions.Regex.Replace(text, @"(?<=\d) uV", " \u00b5V");
        text = System.Text.RegularExpressions.Regex.Replace(text, @"(?<=\d) us\b", " \u00b5s");
        return System.Text.RegularExpressions.Regex.Replace(text, @" x 10\^(-?\d+)", m => $" \u00d7 10<sup>{m.Groups[1].Value.Replace('-', '\u2212')}</sup>");
    }
}
