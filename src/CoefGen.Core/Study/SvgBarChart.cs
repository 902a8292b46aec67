using System.Text;
using static CoefGen.Core.Study.SvgFormat;

namespace CoefGen.Core.Study;

/// <summary>Horizontal bars with a label and a value caption each, as a self-contained SVG element; long labels wrap.</summary>
public sealed class SvgBarChart
{
    public required string Title { get; init; }

    public string? Description { get; init; }

    public required IReadOnlyList<ChartBar> Bars { get; init; }

    public double Width { get; init; } = 860;

    public string Render()
    {
        const double top = 34, line = 15;
        var labelChars = Math.Min((int)(Width * 0.4 / CharWidth), Math.Max(8, Bars.Max(b => (int?)b.Label.Length) ?? 8));
        var left = 16 + (CharWidth * labelChars);
        var captionRoom = 16 + (CharWidth * Math.Max(8, Bars.Max(b => (int?)b.Caption.Length) ?? 8));
        var labels = Bars.Select(b => Wrap(b.Label, labelChars)).ToList();
        var rows = labels.Select(l => Math.Max(24, (line * l.Count) + 9)).ToList();
        var height = top + rows.Sum() + 12;
        var max = Bars.Count == 0 ? 1 : Math.Max(Bars.Max(b => b.Value), double.Epsilon);
        var span = Width - left - captionRoom;
        var sb = new StringBuilder();
        SvgOpen(sb, Width, height, Title, Description ?? $"Bars: {string.Join("; ", Bars.Select(b => $"{b.Label} {b.Caption}"))}.");
        sb.Append($"<text x=\"{C(Width / 2)}\" y=\"20\" text-anchor=\"middle\" font-size=\"14\" font-weight=\"bold\">{Esc(Title)}</text>\n");
        var y = top;
        for (var i = 0; i < Bars.Count; i++)
        {
            var b = Bars[i];
            var w = Math.Max(0, span * b.Value / max);
            var mid = y + (rows[i] / 2);
            for (var k = 0; k < labels[i].Count; k++)
            {
                var ty = mid + 4 + (line * (k - ((labels[i].Count - 1) / 2.0)));
                sb.Append($"<text x=\"{C(left - 8)}\" y=\"{C(ty)}\" text-anchor=\"end\">{Esc(labels[i][k])}</text>\n");
            }

            sb.Append($"<rect x=\"{C(left)}\" y=\"{C(mid - 9)}\" width=\"{C(w)}\" height=\"18\" fill=\"{b.Style.Colour}\"><title>{Esc(b.Label + ": " + b.Caption)}</title></rect>\n");
            sb.Append($"<text x=\"{C(left + w + 6)}\" y=\"{C(mid + 4)}\">{Esc(b.Caption)}</text>\n");
            y += rows[i];
        }

        sb.Append("</svg>\n");
        return sb.ToString();
    }
}
