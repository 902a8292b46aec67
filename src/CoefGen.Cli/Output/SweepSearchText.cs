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
            ? $"target {Eng.NumShort(r.TargetElectrons, 6)} e- rms ({scheme}): smallest equal windows N = {Eng.Int(n)} samples each ({Eng.SiShort(n / rateHz, "s")})\n"
            : $"target {Eng.NumShort(r.TargetElectrons, 6)} e- rms ({scheme}): not reached\n");
        sb.Append("  each row: reset and signal windows of N samples; the rest of the pixel cycle keeps its length\n");
        if (!r.Monotone || r.WindowCount is null)
        {
            sb.Append($"  {r.Note}\n");
        }

        sb.Append(Table(r.Trials, r.Scheme, t => r.WindowCount is int w && t.Layout.ResetCount == w, t => r.Outcome(t), r.TargetElectrons));
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
        if (r.ReadPeriodSamples is int period)
        {
            sb.Append($"split of each read's {Eng.Int(period)}-sample period ({Eng.Si(period / rateHz, "s")}, {Eng.Int(r.ReadCount)} reads, {scheme}): " +
                      $"pedestal {Eng.Int(b.ResetCount)}, dead time {Eng.NumShort(b.DeadSamples, 6)} ({Eng.Si(b.DeadSamples / rateHz, "s")}), signal {Eng.Int(b.SignalCount)} samples " +
                      $"-> {Eng.Num(r.Best.Outcome.NoiseOf(r.Scheme))} e- rms\n");
            sb.Append($"  {r.Note}; every read takes the split; neighbours move one sample between a window and the dead time\n");
            sb.Append(Table([r.Best, .. r.Neighbours], r.Scheme, t => ReferenceEquals(t, r.Best), _ => "", null));
            return sb.ToString();
        }

        sb.Append($"split of the {Eng.Int(r.PixelSamples)}-sample pixel cycle ({Eng.Si(r.PixelSamples / rateHz, "s")}, {scheme}): " +
                  $"reset {Eng.Int(b.ResetCount)}, dead time {Eng.NumShort(b.DeadSamples, 6)} ({Eng.Si(b.DeadSamples / rateHz, "s")}), signal {Eng.Int(b.SignalCount)} samples " +
                  $"-> {Eng.Num(r.Best.Outcome.NoiseOf(r.Scheme))} e- rms\n");
        sb.Append($"  {r.Note}; neighbours move one sample between a window and the dead time\n");
        sb.Append(Table([r.Best, .. r.Neighbours], r.Scheme, t => ReferenceEquals(t, r.Best), _ => "", null));
        return sb.ToString();
    }

    private static string Outcome(this TargetNoiseResult r, WindowTrial t) =>
        t.Outcome.Valid ? (t.Outcome.NoiseOf(r.Scheme) <= r.TargetElectrons ? "meets" : "above") : "";

    /// <summary>The noise with 4 figures, or with as many more as it takes to differ from the target it is compared with.</summary>
    internal static string Against(double noise, double? target)
    {
        var digits = 4;
        while (target is double t && noise != t && Eng.Num(noise, digits) == Eng.Num(t, digits) && digits < 12)
        {
            digits++;
        }

        return Eng.Num(noise, digits);
    }

    private static string Table(IEnumerable<WindowTrial> trials, WeightScheme scheme, Func<WindowTrial, bool> mark, Func<WindowTrial, string> verdict, double? target)
    {
        var table = new TextTable("", "reset", "dead", "signal", "pixel", "pixel time", "e- rms", "ADU rms", "integer design", "");
        foreach (var t in trials)
        {
            var l = t.Layout;
            var o = t.Outcome;
            if (!o.Valid)
            {
                var d = o.Diagnostics.Count > 0 ? o.Diagnostics[0] : null;
                table.Add(mark(t) ? ">" : "", Eng.Int(l.ResetCount), Eng.NumShort(l.DeadSamples, 6), Eng.Int(l.SignalCount), Eng.Int(l.PixelSamples), "", "", "",
                    "invalid: " + (d is null ? "" : $"{d.Code} {d.Message}"), "");
                continue;
            }

            var s = o.Schemes.First(x => x.Scheme == scheme);
            table.Add(mark(t) ? ">" : "", Eng.Int(l.ResetCount), Eng.NumShort(l.DeadSamples, 6), Eng.Int(l.SignalCount), Eng.Int(o.PixelSamples),
                Eng.Si(o.PixelTimeS, "s"), Against(s.NoiseElectrons, target), Eng.Num(s.NoiseAdu), o.Safe ? "safe" : "NOT SAFE", verdict(t));
        }

        return table.Render();
    }
}
