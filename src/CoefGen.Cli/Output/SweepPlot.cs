using CoefGen.Core.Study;

namespace CoefGen.Cli.Output;

/// <summary>Read noise against the first varied key: one line per scheme (and per value of any further keys).</summary>
internal static class SweepPlot
{
    public static string Render(SweepResult r)
    {
        var first = r.Axes[0];
        var series = new List<ChartSeries>();
        var groups = r.Points.GroupBy(p => string.Join(", ", p.Values.Skip(1).Select((v, i) => $"{r.Axes[i + 1].Key} = {SweepUnits.Format(r.Axes[i + 1].Key, v)}")));
        foreach (var group in groups)
        {
            var points = group.OrderBy(p => p.Values[0]).ToList();
            var schemes = points.Select(p => p.Outcome).FirstOrDefault(o => o.Valid)?.Schemes ?? [];
            foreach (var s in schemes)
            {
                var name = group.Key.Length == 0 ? s.Label : $"{s.Label}, {group.Key}";
                series.Add(new ChartSeries(
                    name,
                    [.. points.Where(p => p.Outcome.Valid).Select(p => p.Values[0])],
                    [.. points.Where(p => p.Outcome.Valid).Select(p => p.Outcome.NoiseOf(s.Scheme))]));
            }
        }

        var ys = series.SelectMany(s => s.Y);
        return new SvgLineChart
        {
            Title = $"Read noise against {first.Key}",
            XLabel = SweepUnits.Label(first.Key),
            XUnit = SweepUnits.TickUnit(first.Key),
            YLabel = "read noise (e- rms)",
            XLog = SvgLineChart.SpansDecade(first.Values),
            YLog = SvgLineChart.SpansDecade(ys),
            Series = series,
        }.Render();
    }
}
