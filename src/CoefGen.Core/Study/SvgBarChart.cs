using System.Text;
using static CoefGen.Core.Study.SvgFormat;

namespace CoefGen.Core.Study;

/// <summary>Horizontal bars with a label and a value caption each, as a self-contained SVG element.</summary>
public sealed class SvgBarChart
{
    public required string Title { get; init; }

    /// <summary>Label, bar length (any unit, >= 0) and the caption printed after the bar.</summary>
    public required IReadOnlyList<(string Label, double Value, string Caption)> Bars { get; init; }

    public double Width { get; init; } = 760;

    public string Render()
    {
        const double left = 200, row = 24, top = 34;
        var height = top + (row * Bars.Count) + 16;
        var max = Bars.Count == 0 ? 1 : Math.Max(Bars.Max(b => b.Value), double.Epsilon);
        var span = Width - left - 150;
        var sb = new StringBuilder();
        sb.Append($"<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{C(Width)}\" height=\"{C(height)}\" viewBox=\"0 0 {C(Width)} {C(height)}\" font-family=\"sans-serif\" font-size=\"12\">\n");
        sb.Append($"<rect width=\"{C(Width)}\" height=\"{C(height)}\" fill=\"#ffffff\"/>\n");
        sb.Append($"<text x=\"{C(Width / 2)}\" y=\"20\" text-anchor=\"middle\" font-size=\"14\">{Esc(Title)}</text>\n");
        for (var i = 0; i < Bars.Count; i++)
        {
            var (label, value, caption) = Bars[i];
            var y = top + (row * i);
            var w = Math.Max(0, span * value / max);
            sb.Append($"<text x=\"{C(left - 8)}\" y=\"{C(y + 15)}\" text-anchor=\"end\">{Esc(label)}</text>\n");
            sb.Append($"<rect x=\"{C(left)}\" y=\"{C(y + 3)}\" width=\"{C(w)}\" height=\"{C(row - 6)}\" fill=\"{Palette[i % Palette.Length]}\"/>\n");
            sb.Append($"<text x=\"{C(left + w + 6)}\" y=\"{C(y + 15)}\">{Esc(caption)}</text>\n");
        }

        sb.Append("</svg>\n");
        return sb.ToString();
    }
}
