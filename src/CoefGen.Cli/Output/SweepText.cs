using System.Text;
using CoefGen.Core.Study;

namespace CoefGen.Cli.Output;

/// <summary>The sweep as a terminal table: one row per point, the diagnostic in the row of an invalid point.</summary>
internal static class SweepText
{
    public static string Render(SweepResult r)
    {
        var firstValid = r.Points.Select(p => p.Outcome).FirstOrDefault(o => o.Valid);
        var schemes = firstValid?.Schemes.Select(s => s.Scheme).ToList() ?? [];
        var regret = firstValid?.Schemes.All(s => s.WorstRegret is not null) == true;
        var header = new List<string>();
        header.AddRange(r.Axes.Select(a => a.Key));
        foreach (var s in schemes)
        {
            header.Add($"{DesignText.SchemeWord(s)} e-");
            header.Add($"{DesignText.SchemeWord(s)} ADU");
            if (regret)
            {
                header.Add($"{DesignText.SchemeWord(s)} worst x");
            }
        }

        header.AddRange(["integer design", "gain err ppm", "penalty %"]);
        var table = new TextTable([.. header]);
        var problems = new StringBuilder();
        foreach (var p in r.Points)
        {
            var row = p.Values.Select((v, i) => SweepUnits.Format(r.Axes[i].Key, v)).ToList();
            var o = p.Outcome;
            if (!o.Valid)
            {
                var first = o.Diagnostics.Count > 0 ? o.Diagnostics[0] : null;
                // The row names the code only; the full diagnostic is listed once below the table.
                row.Add("invalid: " + (first is null ? "no design" : $"{first.Code} (point {Eng.Int(p.Index)})"));
                problems.Append($"  point {Eng.Int(p.Index)} ({string.Join(", ", p.Values.Select((v, i) => $"{r.Axes[i].Key} = {SweepUnits.Format(r.Axes[i].Key, v)}"))}):\n");
                foreach (var d in o.Diagnostics)
                {
                    problems.Append($"    {d}\n");
                }
                table.Add([.. row]);
                continue;
            }

            foreach (var s in o.Schemes)
            {
                row.Add(Eng.Num(s.NoiseElectrons, 4));
                row.Add(Eng.Num(s.NoiseAdu, 4));
                if (regret)
                {
                    row.Add(s.WorstRegret is double x ? "x" + Eng.Num(x, 5) : "");
                }
            }

            row.Add($"{DesignText.SchemeWord(o.Chosen)} {(o.Safe ? "safe" : "NOT SAFE")}");
            row.Add(Eng.Num(o.GainErrorPpm, 3));
            row.Add(Eng.Num(o.NoisePenaltyPercent, 3));
            table.Add([.. row]);
        }

        var valid = r.Points.Count(p => p.Outcome.Valid);
        var sb = new StringBuilder();
        sb.Append($"sweep: {Eng.Int(r.Points.Count)} points, {Eng.Int(valid)} valid; read noise rms per scheme (e- at the sense node, ADU at the ADC)\n");
        sb.Append(table.Render());
        if (problems.Length > 0)
        {
            sb.Append("\ninvalid points (numbered from 0 in sweep order):\n").Append(problems);
        }

        return sb.ToString();
    }
}
