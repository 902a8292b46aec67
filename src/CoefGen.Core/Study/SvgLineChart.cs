using System.Text;
using static CoefGen.Core.Study.SvgFormat;

namespace CoefGen.Core.Study;

/// <summary>
/// A line chart as a self-contained SVG element (no scripts, fonts or external references): title and description
/// for screen readers, labelled axes with SI tick labels, grid, legend with each series' colour and dash pattern,
/// optional log axes, a second y scale, shaded x spans and vertical markers. Written by hand so the bytes are
/// deterministic (see DEVELOPERS.md, "Charts").
/// </summary>
public sealed class SvgLineChart
{
    private const double Top = 34, Bottom = 50, LegendRow = 16;

    public required string Title { get; init; }

    /// <summary>What the chart shows, in words (the SVG &lt;desc&gt;); defaults to the axes and the series names.</summary>
    public string? Description { get; init; }

    public required string XLabel { get; init; }

    public required string YLabel { get; init; }

    /// <summary>Unit of the x tick labels ("Hz": ticks "20 kHz"); null for plain numbers (the unit then goes into the label).</summary>
    public string? XUnit { get; init; }

    public string? YUnit { get; init; }

    public bool XLog { get; init; }

    public bool YLog { get; init; }

    public double? XMin { get; init; }

    public double? XMax { get; init; }

    public double? YMin { get; init; }

    public double? YMax { get; init; }

    /// <summary>A second y scale on the right: value there = value on the left x <see cref="Y2Factor"/>.</summary>
    public double? Y2Factor { get; init; }

    public string? Y2Label { get; init; }

    public double Width { get; init; } = 860;

    public double Height { get; init; } = 400;

    public required IReadOnlyList<ChartSeries> Series { get; init; }

    public IReadOnlyList<ChartBand> Bands { get; init; } = [];

    public IReadOnlyList<ChartMarker> Markers { get; init; } = [];

    public string Render()
    {
        var points = Series.Select(s => Usable(s).ToList()).ToList();
        var all = points.SelectMany(p => p).Where(p => !double.IsNaN(p.X)).ToList();
        var (x0, x1) = Extent(all.Select(p => p.X).Concat(Bands.SelectMany(b => new[] { b.From, b.To })).Concat(Markers.Select(m => m.X)), XLog, XMin, XMax, pad: !XLog);
        var (y0, y1) = Extent(all.Select(p => p.Y), YLog, YMin, YMax, pad: true);
        var xTicks = XLog ? ChartTicks.Log(x0, x1) : ChartTicks.Linear(x0, x1);
        var yTicks = YLog ? ChartTicks.Log(y0, y1) : ChartTicks.Linear(y0, y1);
        var yLabels = yTicks.Select(t => ChartTicks.Label(t, YUnit)).ToList();
        var left = 40 + (CharWidth * Math.Max(4, yLabels.Max(l => (int?)TickLength(l)) ?? 0));
        var y2Ticks = Y2Factor is double f ? (YLog ? ChartTicks.Log(y0 * f, y1 * f) : ChartTicks.Linear(y0 * f, y1 * f)) : [];
        var y2Labels = y2Ticks.Select(t => ChartTicks.Label(t, YUnit)).ToList();
        var right = Y2Factor is null ? 24 : 40 + (CharWidth * Math.Max(4, y2Labels.Max(l => (int?)TickLength(l)) ?? 0));
        right = Math.Max(right, 6 + (CharWidth * (xTicks.Select(t => TickLength(ChartTicks.Label(t, XUnit))).DefaultIfEmpty(0).Max() + 1) / 2)); // the last x label is centred on the edge
        var pw = Width - left - right;
        var ph = Height - Top - Bottom;
        var legend = Series.Select(s => Wrap(s.Name, (int)((Width - left - 40) / CharWidth))).ToList();
        var fullHeight = Height + 8 + (LegendRow * legend.Sum(l => l.Count)) + (Bands.Count > 0 || Markers.Count > 0 ? LegendRow : 0);
        double Px(double x) => left + (pw * Math.Clamp(Frac(x, x0, x1, XLog), 0, 1));
        double Py(double y) => Top + ph - (ph * Math.Clamp(Frac(y, y0, y1, YLog), 0, 1));

        var sb = new StringBuilder();
        SvgOpen(sb, Width, fullHeight, Title, Description ?? DefaultDescription());
        sb.Append($"<text x=\"{C(Width / 2)}\" y=\"20\" text-anchor=\"middle\" font-size=\"14\" font-weight=\"bold\">{Esc(Title)}</text>\n");
        foreach (var b in Bands)
        {
            var (bx0, bx1) = (Px(b.From), Px(b.To));
            sb.Append($"<rect x=\"{C(bx0)}\" y=\"{C(Top)}\" width=\"{C(Math.Max(1, bx1 - bx0))}\" height=\"{C(ph)}\" fill=\"{b.Fill}\" fill-opacity=\"0.14\"><title>{Esc(b.Label)}</title></rect>\n");
            sb.Append($"<text x=\"{C((bx0 + bx1) / 2)}\" y=\"{C(Top + 14)}\" text-anchor=\"middle\" font-size=\"11\" fill=\"#333333\">{Esc(b.Label)}</text>\n");
        }

        for (var i = 0; i < xTicks.Count; i++)
        {
            var x = Px(xTicks[i]);
            sb.Append($"<line x1=\"{C(x)}\" y1=\"{C(Top)}\" x2=\"{C(x)}\" y2=\"{C(Top + ph)}\" stroke=\"#e3e3e3\"/>\n");
            sb.Append($"<text x=\"{C(x)}\" y=\"{C(Top + ph + 16)}\" text-anchor=\"middle\">{TickText(ChartTicks.Label(xTicks[i], XUnit))}</text>\n");
        }

        for (var i = 0; i < yTicks.Count; i++)
        {
            var y = Py(yTicks[i]);
            sb.Append($"<line x1=\"{C(left)}\" y1=\"{C(y)}\" x2=\"{C(left + pw)}\" y2=\"{C(y)}\" stroke=\"#e3e3e3\"/>\n");
            sb.Append($"<text x=\"{C(left - 6)}\" y=\"{C(y + 4)}\" text-anchor=\"end\">{TickText(yLabels[i])}</text>\n");
        }

        for (var i = 0; i < y2Ticks.Count; i++)
        {
            var y = Py(y2Ticks[i] / Y2Factor!.Value);
            sb.Append($"<line x1=\"{C(left + pw)}\" y1=\"{C(y)}\" x2=\"{C(left + pw + 5)}\" y2=\"{C(y)}\" stroke=\"#000000\"/>\n");
            sb.Append($"<text x=\"{C(left + pw + 8)}\" y=\"{C(y + 4)}\" text-anchor=\"start\">{TickText(y2Labels[i])}</text>\n");
        }

        sb.Append($"<rect x=\"{C(left)}\" y=\"{C(Top)}\" width=\"{C(pw)}\" height=\"{C(ph)}\" fill=\"none\" stroke=\"#000000\"/>\n");
        sb.Append($"<text x=\"{C(left + (pw / 2))}\" y=\"{C(Top + ph + 36)}\" text-anchor=\"middle\">{Esc(XLabel)}</text>\n");
        sb.Append($"<text transform=\"translate(14 {C(Top + (ph / 2))}) rotate(-90)\" text-anchor=\"middle\">{Esc(YLabel)}</text>\n");
        if (Y2Label is not null)
        {
            sb.Append($"<text transform=\"translate({C(Width - 18)} {C(Top + (ph / 2))}) rotate(90)\" text-anchor=\"middle\">{Esc(Y2Label)}</text>\n");
        }

        foreach (var m in Markers)
        {
            var x = Px(m.X);
            sb.Append($"<line x1=\"{C(x)}\" y1=\"{C(Top)}\" x2=\"{C(x)}\" y2=\"{C(Top + ph)}\" stroke=\"{ChartPalette.Annotation}\" stroke-width=\"1.2\" stroke-dasharray=\"4 3\"><title>{Esc(m.Label)}</title></line>\n");
            sb.Append($"<text x=\"{C(x + 4)}\" y=\"{C(Top + ph - 6)}\" font-size=\"11\" fill=\"{ChartPalette.Annotation}\">{Esc(m.Label)}</text>\n");
        }

        var row = 0;
        for (var i = 0; i < Series.Count; i++)
        {
            var style = Series[i].Style ?? ChartPalette.Cycle(i);
            var path = new StringBuilder();
            var first = true;
            foreach (var (x, y) in points[i])
            {
                if (double.IsNaN(x))
                {
                    first = true;
                    continue;
                }

                if (Series[i].Steps && !first)
                {
                    path.Append($" H{C(Px(x))}");
                }

                path.Append(first ? "M" : " L").Append(C(Px(x))).Append(',').Append(C(Py(y)));
                first = false;
            }

            sb.Append($"<g class=\"series\"><title>{Esc(Series[i].Name)}</title>\n");
            if (path.Length > 0)
            {
                sb.Append($"<path d=\"{path}\" fill=\"none\" stroke=\"{style.Colour}\" stroke-width=\"{C(style.Width)}\"{DashAttribute(style)}/>\n");
            }

            if (points[i].Count is > 0 and <= 60 && !Series[i].Steps)
            {
                foreach (var (x, y) in points[i].Where(p => !double.IsNaN(p.X)))
                {
                    sb.Append($"<circle cx=\"{C(Px(x))}\" cy=\"{C(Py(y))}\" r=\"2.4\" fill=\"{style.Colour}\"/>\n");
                }
            }

            sb.Append("</g>\n");
            var ly = Height + 8 + (LegendRow * row);
            sb.Append($"<line x1=\"{C(left)}\" y1=\"{C(ly - 4)}\" x2=\"{C(left + 30)}\" y2=\"{C(ly - 4)}\" stroke=\"{style.Colour}\" stroke-width=\"{C(style.Width + 0.6)}\"{DashAttribute(style)}/>\n");
            foreach (var line in legend[i])
            {
                sb.Append($"<text x=\"{C(left + 38)}\" y=\"{C(Height + 8 + (LegendRow * row))}\">{Esc(line)}</text>\n");
                row++;
            }
        }

        sb.Append("</svg>\n");
        return sb.ToString();
    }

    /// <summary>True when the values span more than one decade (then a log axis reads better).</summary>
    public static bool SpansDecade(IEnumerable<double> values)
    {
        ArgumentNullException.ThrowIfNull(values);
        var v = values.Where(x => x > 0 && double.IsFinite(x)).ToList();
        return v.Count > 1 && v.Max() / v.Min() > 10;
    }

    private static int TickLength(string label) => label.Replace("1 x 10^", "10", StringComparison.Ordinal).Replace(" x 10^", "x10", StringComparison.Ordinal).Length;

    private string DefaultDescription() =>
        $"{(XLog ? "Log" : "Linear")} {XLabel} against {(YLog ? "log " : "")}{YLabel}; series: {string.Join("; ", Series.Select(s => s.Name))}.";

    private IEnumerable<(double X, double Y)> Usable(ChartSeries s)
    {
        for (var i = 0; i < Math.Min(s.X.Count, s.Y.Count); i++)
        {
            var (x, y) = (s.X[i], s.Y[i]);
            var inX = (XMin is not double lo || x >= lo * (1 - 1e-12)) && (XMax is not double hi || x <= hi * (1 + 1e-12));
            if (double.IsFinite(x) && double.IsFinite(y) && (!XLog || x > 0) && (!YLog || y > 0) && inX)
            {
                yield return (x, y);
            }
            else if (double.IsNaN(x))
            {
                yield return (double.NaN, double.NaN); // a break in the line
            }
        }
    }

    private static (double, double) Extent(IEnumerable<double> values, bool log, double? min, double? max, bool pad)
    {
        var v = values.Where(x => double.IsFinite(x) && (!log || x > 0)).ToList();
        if (v.Count == 0)
        {
            return (min ?? (log ? 1 : 0), max ?? (log ? 10 : 1));
        }

        double lo = v.Min(), hi = v.Max();
        if (log)
        {
            var llo = min ?? Math.Pow(10, Math.Floor(Math.Log10(lo) + 1e-9));
            var lhi = max ?? Math.Pow(10, Math.Ceiling(Math.Log10(hi) - 1e-9));
            return lhi > llo ? (llo, lhi) : (llo, llo * 10);
        }

        if (hi == lo)
        {
            var p = lo == 0 ? 1 : Math.Abs(lo) * 0.1;
            return (min ?? lo - p, max ?? hi + p);
        }

        var margin = pad ? (hi - lo) * 0.05 : 0;
        return (min ?? lo - margin, max ?? hi + margin);
    }

    private static double Frac(double v, double lo, double hi, bool log) =>
        log ? (Math.Log10(v) - Math.Log10(lo)) / (Math.Log10(hi) - Math.Log10(lo)) : (v - lo) / (hi - lo);
}
