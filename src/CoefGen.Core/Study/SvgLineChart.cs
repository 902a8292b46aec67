using System.Text;
using static CoefGen.Core.Study.SvgFormat;

namespace CoefGen.Core.Study;

/// <summary>
/// A line chart as a self-contained SVG element (no scripts, fonts or external references): labelled axes, ticks,
/// grid, legend, optional log axes. Written by hand so the bytes are deterministic.
/// </summary>
public sealed class SvgLineChart
{
    private const double Left = 78, Right = 16, Top = 34, Bottom = 52;

    public required string Title { get; init; }

    public required string XLabel { get; init; }

    public required string YLabel { get; init; }

    public bool XLog { get; init; }

    public bool YLog { get; init; }

    public double Width { get; init; } = 760;

    public double Height { get; init; } = 420;

    public required IReadOnlyList<ChartSeries> Series { get; init; }

    public string Render()
    {
        var points = Series.Select(s => Usable(s).ToList()).ToList();
        var all = points.SelectMany(p => p).Where(p => !double.IsNaN(p.X)).ToList();
        var (x0, x1) = Extent(all.Select(p => p.X), XLog);
        var (y0, y1) = Extent(all.Select(p => p.Y), YLog);
        var pw = Width - Left - Right;
        var ph = Height - Top - Bottom;
        var fullHeight = Height + (14 * Series.Count);
        double Px(double x) => Left + (pw * Frac(x, x0, x1, XLog));
        double Py(double y) => Top + ph - (ph * Frac(y, y0, y1, YLog));

        var sb = new StringBuilder();
        sb.Append($"<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{C(Width)}\" height=\"{C(fullHeight)}\" viewBox=\"0 0 {C(Width)} {C(fullHeight)}\" font-family=\"sans-serif\" font-size=\"12\">\n");
        sb.Append($"<rect width=\"{C(Width)}\" height=\"{C(fullHeight)}\" fill=\"#ffffff\"/>\n");
        sb.Append($"<text x=\"{C(Width / 2)}\" y=\"20\" text-anchor=\"middle\" font-size=\"14\">{Esc(Title)}</text>\n");
        foreach (var t in Ticks(x0, x1, XLog))
        {
            var x = Px(t);
            sb.Append($"<line x1=\"{C(x)}\" y1=\"{C(Top)}\" x2=\"{C(x)}\" y2=\"{C(Top + ph)}\" stroke=\"#e0e0e0\"/>\n");
            sb.Append($"<text x=\"{C(x)}\" y=\"{C(Top + ph + 16)}\" text-anchor=\"middle\">{Esc(Tick(t))}</text>\n");
        }

        foreach (var t in Ticks(y0, y1, YLog))
        {
            var y = Py(t);
            sb.Append($"<line x1=\"{C(Left)}\" y1=\"{C(y)}\" x2=\"{C(Left + pw)}\" y2=\"{C(y)}\" stroke=\"#e0e0e0\"/>\n");
            sb.Append($"<text x=\"{C(Left - 6)}\" y=\"{C(y + 4)}\" text-anchor=\"end\">{Esc(Tick(t))}</text>\n");
        }

        sb.Append($"<rect x=\"{C(Left)}\" y=\"{C(Top)}\" width=\"{C(pw)}\" height=\"{C(ph)}\" fill=\"none\" stroke=\"#000000\"/>\n");
        sb.Append($"<text x=\"{C(Left + (pw / 2))}\" y=\"{C(Top + ph + 36)}\" text-anchor=\"middle\">{Esc(XLabel)}</text>\n");
        sb.Append($"<text transform=\"translate(16 {C(Top + (ph / 2))}) rotate(-90)\" text-anchor=\"middle\">{Esc(YLabel)}</text>\n");
        for (var i = 0; i < Series.Count; i++)
        {
            var colour = Palette[i % Palette.Length];
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

            if (points[i].Count > 0)
            {
                sb.Append($"<path d=\"{path}\" fill=\"none\" stroke=\"{colour}\" stroke-width=\"1.6\"/>\n");
            }

            if (points[i].Count is > 0 and <= 60 && !Series[i].Steps)
            {
                foreach (var (x, y) in points[i].Where(p => !double.IsNaN(p.X)))
                {
                    sb.Append($"<circle cx=\"{C(Px(x))}\" cy=\"{C(Py(y))}\" r=\"2.5\" fill=\"{colour}\"/>\n");
                }
            }

            var ly = Height + 4 + (14 * i);
            sb.Append($"<line x1=\"{C(Left)}\" y1=\"{C(ly - 4)}\" x2=\"{C(Left + 24)}\" y2=\"{C(ly - 4)}\" stroke=\"{colour}\" stroke-width=\"3\"/>\n");
            sb.Append($"<text x=\"{C(Left + 30)}\" y=\"{C(ly)}\">{Esc(Series[i].Name)}</text>\n");
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

    private IEnumerable<(double X, double Y)> Usable(ChartSeries s)
    {
        for (var i = 0; i < Math.Min(s.X.Count, s.Y.Count); i++)
        {
            var (x, y) = (s.X[i], s.Y[i]);
            if (double.IsFinite(x) && double.IsFinite(y) && (!XLog || x > 0) && (!YLog || y > 0))
            {
                yield return (x, y);
            }
            else if (double.IsNaN(x))
            {
                yield return (double.NaN, double.NaN); // a break in the line
            }
        }
    }

    private static (double, double) Extent(IEnumerable<double> values, bool log)
    {
        var v = values.ToList();
        if (v.Count == 0)
        {
            return log ? (1, 10) : (0, 1);
        }

        double lo = v.Min(), hi = v.Max();
        if (log)
        {
            return (Math.Pow(10, Math.Floor(Math.Log10(lo))), Math.Pow(10, Math.Ceiling(Math.Log10(hi) + 1e-12)));
        }

        if (hi == lo)
        {
            var pad = lo == 0 ? 1 : Math.Abs(lo) * 0.1;
            return (lo - pad, hi + pad);
        }

        var margin = (hi - lo) * 0.05;
        return (lo - margin, hi + margin);
    }

    private static double Frac(double v, double lo, double hi, bool log) =>
        log ? (Math.Log10(v) - Math.Log10(lo)) / (Math.Log10(hi) - Math.Log10(lo)) : (v - lo) / (hi - lo);

    private static IEnumerable<double> Ticks(double lo, double hi, bool log)
    {
        if (log)
        {
            var a = (int)Math.Round(Math.Log10(lo));
            var b = (int)Math.Round(Math.Log10(hi));
            var every = Math.Max(1, (b - a + 7) / 8);
            for (var k = a; k <= b; k += every)
            {
                yield return Math.Pow(10, k);
            }

            yield break;
        }

        var raw = (hi - lo) / 6;
        var mag = Math.Pow(10, Math.Floor(Math.Log10(raw)));
        var step = new[] { 1.0, 2, 5, 10 }.Select(m => m * mag).First(s => s >= raw);
        for (var t = Math.Ceiling(lo / step) * step; t <= hi + (step * 1e-9); t += step)
        {
            yield return Math.Abs(t) < step * 1e-9 ? 0 : t;
        }
    }
}
