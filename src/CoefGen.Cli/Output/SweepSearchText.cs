using System.Text;
using CoefGen.Core.Readout;
using CoefGen.Core.Study;

namespace CoefGen.Cli.Output;

/// <summary>The direct answers (target noise, pixel-time split) with the trials that show them.</summary>
internal static class SweepSearchText
{
    public static string Target(TargetNoiseResult r, double rateHz)
    {
        var sb = new StringBuilder();
        var scheme = DesignText.SchemeWord(r.Scheme);
        sb.Append(r.WindowCount is int n
            ? $"target {Eng.Num(r.TargetElectrons)} e- rms ({scheme}): smallest equal windows N = {Eng.Int(n)} samples each ({Eng.Si(n / rateHz, "s")})\n"
            : $"target {Eng.Num(r.TargetElectrons)} e- rms ({scheme}): not reached\n");
        sb.Append("  the lead-in, the gap to the transfer, the dead time and the tail keep their lengths; the pixel cycle grows or shrinks with N\n");
        sb.Append($"  {r.Note}\n");
        sb.Append(Table(r.Trials, r.Scheme, t => r.WindowCount is int w && t.Layout.ResetCount == w, t => r.Outcome(t)));
        return sb.ToString();
    }

    public static string Split(SplitResult r, double rateHz)
    {
        var sb = new StringBuilder();
        var scheme = DesignText.SchemeWord(r.Scheme);
        if (r.Best is null)
        {
            return $"split of {Eng.Int(r.PixelSamples)} samples ({scheme}): no valid split; {r.Note}\n";
        }

        var b = r.Best.Layout;
        sb.Append($"split of the {Eng.Int(r.PixelSamples)}-sample pixel cycle ({Eng.Si(r.PixelSamples / rateHz, "s")}, {scheme}): " +
                  $"reset {Eng.Int(b.ResetCount)}, dead time {b.DeadSamples.ToString("G6", System.Globalization.CultureInfo.InvariantCulture)} ({Eng.Si(b.DeadSamples / rateHz, "s")}), signal {Eng.Int(b.SignalCount)} samples " +
                  $"-> {Eng.Num(r.Best.Outcome.NoiseOf(r.Scheme))} e- rms\n");
        sb.Append($"  {r.Note}; neighbours move one sample between a window and the dead time\n");
        sb.Append(Table([r.Best, .. r.Neighbours], r.Scheme, t => ReferenceEquals(t, r.Best), _ => ""));
        return sb.ToString();
    }

    private static string Outcome(this TargetNoiseResult r, WindowTrial t) =>
        t.Outcome.Valid ? (t.Outcome.NoiseOf(r.Scheme) <= r.TargetElectrons ? "meets" : "above") : "";

    private static string Table(IEnumerable<WindowTrial> trials, WeightScheme scheme, Func<WindowTrial, bool> mark, Func<WindowTrial, string> verdict)
    {
        var table = new TextTable("", "reset", "dead", "signal", "pixel", "pixel time", "e- rms", "ADU rms", "integer design", "");
        foreach (var t in trials)
        {
            var l = t.Layout;
            var o = t.Outcome;
            if (!o.Valid)
            {
                var d = o.Diagnostics.Count > 0 ? o.Diagnostics[0] : null;
                table.Add(mark(t) ? ">" : "", Eng.Int(l.ResetCount), l.DeadSamples.ToString("G6", System.Globalization.CultureInfo.InvariantCulture), Eng.Int(l.SignalCount), Eng.Int(l.PixelSamples), "", "", "",
                    "invalid: " + (d is null ? "" : $"{d.Code} {d.Message}"), "");
                continue;
            }

            var s = o.Schemes.First(x => x.Scheme == scheme);
            table.Add(mark(t) ? ">" : "", Eng.Int(l.ResetCount), l.DeadSamples.ToString("G6", System.Globalization.CultureInfo.InvariantCulture), Eng.Int(l.SignalCount), Eng.Int(o.PixelSamples),
                Eng.Si(o.PixelTimeS, "s"), Eng.Num(s.NoiseElectrons), Eng.Num(s.NoiseAdu), o.Safe ? "safe" : "NOT SAFE", verdict(t));
        }

        return table.Render();
    }
}
