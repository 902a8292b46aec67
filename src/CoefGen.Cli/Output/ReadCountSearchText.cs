using System.Text;
using CoefGen.Core.Study;

namespace CoefGen.Cli.Output;

/// <summary>The target search of a general cycle over its read count, in the layout of the two-window target search.</summary>
internal static class ReadCountSearchText
{
    public static string Target(ReadCountTargetResult r, double rateHz)
    {
        var sb = new StringBuilder();
        var scheme = DesignText.SchemeWord(r.Scheme);
        var noun = r.Axis.Noun;
        sb.Append(r.Reads is int n
            ? $"target {Eng.NumShort(r.TargetElectrons, 6)} e- rms ({scheme}): smallest N = {Eng.Int(n)} {noun} (pixel cycle {Eng.Int(r.Axis.PixelSamplesFor(n))} samples, {Eng.SiShort(r.Axis.PixelSamplesFor(n) / rateHz, "s")})\n"
            : $"target {Eng.NumShort(r.TargetElectrons, 6)} e- rms ({scheme}): not reached\n");
        sb.Append(r.Axis.Kind == ReadCountKind.Repeat
            ? $"  each row: {r.Axis.Key} = N, one read every {Eng.Int(r.Axis.PeriodSamples)} samples as in the file; the pixel cycle changes by one read period per read\n"
            : "  each row: every ramp window N samples long, each keeping its start; the pixel cycle keeps its length\n");
        if (!r.Monotone || r.Reads is null)
        {
            sb.Append($"  {r.Note}\n");
        }

        var table = new TextTable("", "N", "pixel", "pixel time", "e- rms", "ADU rms", "integer design", "");
        foreach (var t in r.Trials)
        {
            var o = t.Outcome;
            var mark = r.Reads == t.Reads ? ">" : "";
            if (!o.Valid)
            {
                var d = o.Diagnostics.Count > 0 ? o.Diagnostics[0] : null;
                table.Add(mark, Eng.Int(t.Reads), Eng.Int(t.PixelSamples), "", "", "", "invalid: " + (d is null ? "" : $"{d.Code} {d.Message}"), "");
                continue;
            }

            var s = o.Schemes.First(x => x.Scheme == r.Scheme);
            table.Add(mark, Eng.Int(t.Reads), Eng.Int(o.PixelSamples), Eng.Si(o.PixelTimeS, "s"), SweepSearchText.Against(s.NoiseElectrons, r.TargetElectrons), Eng.Num(s.NoiseAdu),
                o.Safe ? "safe" : "NOT SAFE", s.NoiseElectrons <= r.TargetElectrons ? "meets" : "above");
        }

        sb.Append(table.Render());
        return sb.ToString();
    }
}
