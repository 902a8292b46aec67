using System.Text;
using CoefGen.Core.Pipeline;

namespace CoefGen.Cli.Output;

/// <summary>The chosen scheme's weights, in brief (first and last of each window) or in full.</summary>
internal static class WeightsText
{
    private const int BriefEach = 3;

    public static void Append(StringBuilder sb, DesignResult r, bool all)
    {
        var h = r.Chosen.H;
        var c = r.Datapath.Coefficients;
        var g = r.Grid;
        sb.Append($"Weights of {r.Chosen.Label} (h: real, unit gain to charge; c: integer, h ~ c / 2^{r.Datapath.P})\n");
        var table = new TextTable("sample", "t", "s", "h", "c");
        void Row(int k) => table.Add(Eng.Int(g.SampleIndex[k]), Eng.Si(g.TimeS[k], "s"), Eng.Num(g.Step[k], 6), Eng.Num(h[k], 6), Eng.Int(c[k]));
        var runs = g.TwoWindow is null ? CycleRuns(g, all) : [.. g.Windows.Select(w => (w.First, w.Count))];
        foreach (var (start, count) in runs)
        {
            for (var k = start; k < start + count; k++)
            {
                var brief = !all && count > 2 * BriefEach && k >= start + BriefEach && k < start + count - BriefEach;
                if (brief)
                {
                    if (k == start + BriefEach)
                    {
                        table.Add("...", "", "", "", "");
                    }

                    continue;
                }

                Row(k);
            }
        }

        sb.Append(table.Render());
        if (!all)
        {
            sb.Append("  (--weights lists every weight; --json carries all of them for scripts)\n");
        }
    }

    /// <summary>The windows of a general cycle as runs of grid entries; in brief, the first and last two windows only.</summary>
    private static (int Start, int Count)[] CycleRuns(CoefGen.Core.Weights.SampleGrid g, bool all)
    {
        var runs = g.Windows.Select(w => (w.First, w.Count)).ToArray();
        return all || runs.Length <= 4 ? runs : [.. runs[..2], .. runs[^2..]];
    }
}
