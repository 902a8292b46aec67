using System.Text;
using CoefGen.Core.Study;

namespace CoefGen.Cli.Output;

/// <summary>The design report as Markdown for code review; charts are written next to it as SVG files and linked.</summary>
internal static class ReportMarkdown
{
    /// <summary>Renders the page; <paramref name="charts"/> receives (file name, SVG) for each chart.</summary>
    public static string Render(string title, IReadOnlyList<ReportSection> sections, List<(string Name, string Svg)> charts)
    {
        var sb = new StringBuilder();
        sb.Append($"# {title}\n");
        foreach (var s in sections)
        {
            sb.Append($"\n## {s.Title}\n");
            foreach (var b in s.Blocks)
            {
                if (b.Banner is not null)
                {
                    sb.Append("\n> **").Append(b.Banner).Append("**\n");
                }

                if (b.Summary is not null)
                {
                    sb.Append('\n').Append(b.Summary).Append(':').Append('\n');
                }

                if (b.Paragraph is not null)
                {
                    sb.Append('\n').Append(b.Paragraph).Append('\n');
                }

                if (b.Lines is not null)
                {
                    sb.Append("\n```\n").Append(string.Join("\n", b.Lines)).Append("\n```\n");
                }

                if (b.Table is not null)
                {
                    sb.Append('\n');
                    for (var i = 0; i < b.Table.Count; i++)
                    {
                        sb.Append("| ").Append(string.Join(" | ", b.Table[i].Select(c => c.Text.Replace("|", "\\|", StringComparison.Ordinal)))).Append(" |\n");
                        if (i == 0)
                        {
                            sb.Append('|').Append(string.Concat(b.Table[i].Select(_ => " --- |"))).Append('\n');
                        }
                    }
                }

                if (b.Svg is not null)
                {
                    var name = $"report-chart-{(charts.Count + 1).ToString(System.Globalization.CultureInfo.InvariantCulture)}.svg";
                    charts.Add((name, b.Svg));
                    sb.Append($"\n![{b.Caption}]({name})\n");
                }
            }
        }

        return sb.ToString();
    }
}
