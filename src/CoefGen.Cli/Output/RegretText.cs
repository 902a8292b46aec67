using System.Globalization;
using System.Text;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;

namespace CoefGen.Cli.Output;

/// <summary>The regret table of `design`: every scheme's read noise in every noise scenario and its ratio to that scenario's optimum.</summary>
internal static class RegretText
{
    public static void Append(StringBuilder sb, DesignResult r)
    {
        if (r.Regret is not { } t)
        {
            return;
        }

        var robust = t.Robust;
        var how = robust.Objective == RobustObjective.Mean
            ? "robust minimises the mean variance (one solve on the mean covariance)"
            : $"robust minimises the worst {(robust.Objective == RobustObjective.Regret ? "ratio" : "case")}: duality gap {Eng.Num(robust.RelativeGap ?? 0, 2)} relative after {robust.Solves.ToString(CultureInfo.InvariantCulture)} optimal solves";
        sb.Append($"Noise scenarios ({t.Scenarios.Count.ToString(CultureInfo.InvariantCulture)}; e- rms and x ratio to the scenario's own optimum; {how})\n");
        var headers = new List<string> { "scenario", "own optimum" };
        headers.AddRange(t.Rows.Select(row => DesignText.SchemeWord(row.Scheme)));
        var table = new TextTable([.. headers]);
        for (var i = 0; i < t.Scenarios.Count; i++)
        {
            table.Add([t.Scenarios[i].Name, Eng.Num(t.OptimumElectrons[i]), .. t.Rows.Select(row => Cell(row.SigmaElectrons[i], row.Ratio[i]))]);
        }

        table.Add(["worst case", Eng.Num(t.OptimumElectrons.Max()), .. t.Rows.Select(row => Cell(row.WorstElectrons, row.WorstRatio))]);
        table.Add(["mean", Eng.Num(t.OptimumElectrons.Average()), .. t.Rows.Select(row => Cell(row.MeanElectrons, row.MeanRatio))]);
        sb.Append(table.Render());
        sb.Append("  (the worst-case and mean ratios are over the scenarios' ratios, not ratios of the worst and mean noise)\n\n");
    }

    private static string Cell(double electrons, double ratio) => $"{Eng.Num(electrons)} x{Eng.Num(ratio, 5)}";
}
