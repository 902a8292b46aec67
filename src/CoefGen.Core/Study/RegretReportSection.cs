using System.Globalization;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// The report's "Noise scenarios" section: the regret table (every scheme's read noise in every scenario and its
/// ratio to that scenario's own optimum) and a chart of noise against the varied key (or the scenario number).
/// Cells name their path in the `design --json` "scenarios" object. Empty when the readout names no scenarios.
/// </summary>
public static class RegretReportSection
{
    public static IReadOnlyList<ReportSection> For(DesignResult r)
    {
        ArgumentNullException.ThrowIfNull(r);
        if (r.Regret is not { } t)
        {
            return [];
        }

        var header = new List<ReportCell> { ReportCell.Of("scenario"), ReportCell.Of("own optimum (e- rms)") };
        header.AddRange(t.Rows.SelectMany(row => new[] { ReportCell.Of($"{row.Label}: e- rms"), ReportCell.Of("ratio") }));
        var rows = new List<IReadOnlyList<ReportCell>> { header };
        for (var i = 0; i < t.Scenarios.Count; i++)
        {
            var cells = new List<ReportCell> { ReportCell.Of(t.Scenarios[i].Name), ReportCell.Number($"scenarios.cases[{I(i)}].optimum_e_rms", t.OptimumElectrons[i]) };
            for (var s = 0; s < t.Rows.Count; s++)
            {
                cells.Add(ReportCell.Number($"scenarios.regret[{I(s)}].noise_e_rms[{I(i)}]", t.Rows[s].SigmaElectrons[i]));
                cells.Add(ReportCell.Number($"scenarios.regret[{I(s)}].ratio_to_optimum[{I(i)}]", t.Rows[s].Ratio[i]));
            }

            rows.Add(cells);
        }

        foreach (var (name, noise, ratio) in new[] { ("worst case", "worst_noise_e_rms", "worst_ratio"), ("mean", "mean_noise_e_rms", "mean_ratio") })
        {
            var cells = new List<ReportCell> { ReportCell.Of(name), ReportCell.Of("") };
            for (var s = 0; s < t.Rows.Count; s++)
            {
                var row = t.Rows[s];
                cells.Add(ReportCell.Number($"scenarios.regret[{I(s)}].{noise}", name == "mean" ? row.MeanElectrons : row.WorstElectrons));
                cells.Add(ReportCell.Number($"scenarios.regret[{I(s)}].{ratio}", name == "mean" ? row.MeanRatio : row.WorstRatio));
            }

            rows.Add(cells);
        }

        var order = Enumerable.Range(0, t.Scenarios.Count).ToArray();
        double[] x;
        string xLabel;
        if (t.VariedKey is not null && t.VariedValues is { } values)
        {
            order = [.. order.OrderBy(i => values[i])];
            x = [.. order.Select(i => values[i])];
            xLabel = t.VariedKey;
        }
        else
        {
            x = [.. order.Select(i => (double)(i + 1))];
            xLabel = "scenario number (table order)";
        }

        var xLog = t.VariedKey is not null && x[0] > 0 && x[^1] >= 10 * x[0] * (1 - 1e-9);
        var xUnit = t.VariedKey?.EndsWith("_hz", StringComparison.Ordinal) == true ? "Hz" : null;
        var ratioChart = new SvgLineChart
        {
            Title = "Ratio to each scenario's own optimum (regret)",
            XLabel = xLabel,
            YLabel = "read noise / own optimum",
            XLog = xLog,
            XUnit = xUnit,
            XMin = xLog ? x[0] : null,
            XMax = xLog ? x[^1] : null,
            Series = [.. t.Rows.Select(row => new ChartSeries(row.Label, x, [.. order.Select(i => row.Ratio[i])], Style: ChartPalette.Scheme(row.Scheme)))],
        }.Render();
        var chart = new SvgLineChart
        {
            Title = "Read noise in each noise scenario",
            XLabel = xLabel,
            YLabel = "read noise (e- rms)",
            XLog = xLog,
            XUnit = xUnit,
            XMin = xLog ? x[0] : null,
            XMax = xLog ? x[^1] : null,
            Series =
            [
                .. t.Rows.Select(row => new ChartSeries(row.Label, x, [.. order.Select(i => row.SigmaElectrons[i])], Style: ChartPalette.Scheme(row.Scheme))),
                new ChartSeries("own optimum of each scenario", x, [.. order.Select(i => t.OptimumElectrons[i])], Style: ChartPalette.Reference),
            ],
        }.Render();
        var robust = t.Robust;
        var how = robust.Objective switch
        {
            RobustObjective.Mean => "The robust weights minimise the mean variance over the scenarios (one optimal solve on the mean covariance).",
            RobustObjective.Regret => $"The robust weights minimise the worst ratio to a scenario's own optimum; relative duality gap {F(robust.RelativeGap ?? 0)} after {I(robust.Solves)} optimal solves.",
            _ => $"The robust weights minimise the worst-case read noise over the scenarios; relative duality gap {F(robust.RelativeGap ?? 0)} after {I(robust.Solves)} optimal solves.",
        };
        return
        [
            new ReportSection("Noise scenarios", [
                new ReportBlock { Paragraph = $"{I(t.Scenarios.Count)} noise scenarios; every scheme's read noise in each and its ratio to that scenario's own optimum (the optimal weights for that noise). {how}" },
                new ReportBlock { Table = rows },
                new ReportBlock { Svg = chart, Caption = "Read noise of every scheme against the varied key, with each scenario's own optimum as the lower envelope." },
                new ReportBlock { Svg = ratioChart, Caption = "The same noise divided by each scenario's own optimum: the worst case over the scenarios is each scheme's worst-case regret." },
            ]),
        ];
    }

    private static string I(int v) => v.ToString(CultureInfo.InvariantCulture);

    private static string F(double v) => Formatting.Human.NumShort(v, 3);
}
