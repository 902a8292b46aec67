using System.Net;
using System.Text;
using CoefGen.Core.Study;

namespace CoefGen.Cli.Output;

/// <summary>The design report as one self-contained HTML page: inline CSS and SVG, no scripts, no external resources.</summary>
internal static class ReportHtml
{
    public static string Render(string title, IReadOnlyList<ReportSection> sections)
    {
        var sb = new StringBuilder();
        sb.Append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
        sb.Append($"<title>{E(title)}</title>\n");
        sb.Append("<style>body{font-family:sans-serif;margin:24px;max-width:1100px;color:#111}table{border-collapse:collapse;margin:8px 0}" +
                  "td,th{border:1px solid #bbb;padding:3px 8px;text-align:left}td[data-json]{text-align:right;font-family:monospace}" +
                  "pre{background:#f4f4f4;padding:8px}figure{margin:12px 0}figcaption{font-size:90%;color:#444}</style>\n</head>\n<body>\n");
        sb.Append($"<h1>{E(title)}</h1>\n");
        foreach (var s in sections)
        {
            sb.Append($"<h2>{E(s.Title)}</h2>\n");
            foreach (var b in s.Blocks)
            {
                if (b.Paragraph is not null)
                {
                    sb.Append($"<p>{E(b.Paragraph)}</p>\n");
                }

                if (b.Lines is not null)
                {
                    sb.Append("<pre>").Append(E(string.Join("\n", b.Lines))).Append("</pre>\n");
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
        }

        sb.Append("</body>\n</html>\n");
        return sb.ToString();
    }

    private static void Table(StringBuilder sb, IReadOnlyList<IReadOnlyList<ReportCell>> rows)
    {
        sb.Append("<table>\n");
        for (var i = 0; i < rows.Count; i++)
        {
            sb.Append("<tr>");
            foreach (var c in rows[i])
            {
                if (i == 0)
                {
                    sb.Append($"<th>{E(c.Text)}</th>");
                }
                else if (c.JsonPath is not null)
                {
                    sb.Append($"<td data-json=\"{E(c.JsonPath)}\">{E(c.Text)}</td>");
                }
                else
                {
                    sb.Append($"<td>{E(c.Text)}</td>");
                }
            }

            sb.Append("</tr>\n");
        }

        sb.Append("</table>\n");
    }

    private static string E(string s) => WebUtility.HtmlEncode(s);
}
