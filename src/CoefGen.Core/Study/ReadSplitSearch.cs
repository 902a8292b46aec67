using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// The pixel-time split for a general cycle whose read is one pedestal window (no charge) and one signal window (after
/// its transfer) in one reset group, repeated by [timing.repeat] or written once: inside the fixed read period, the split
/// between pedestal window, dead time after the transfer and signal window with the lowest read noise. The pedestal
/// start, the gap from the pedestal to the transfer and the time from the signal window to the next read (or the cycle
/// end) stay as written; every copy of the read takes the same split. The search is <see cref="PixelSplitSearch"/>'s.
/// </summary>
public static class ReadSplitSearch
{
    /// <summary>Why the split does not apply to this cycle, or null when it does.</summary>
    public static string? Refusal(string baseText, ReadoutDescription baseline)
    {
        ArgumentNullException.ThrowIfNull(baseText);
        ArgumentNullException.ThrowIfNull(baseline);
        return Plan(baseText, baseline, out var why) is null ? why : null;
    }

    /// <summary>The split, or null when <see cref="Refusal"/> says why not.</summary>
    public static SplitResult? Run(string baseText, ReadoutDescription baseline, DesignPoint point, WeightScheme scheme, int? maxParallelism = null)
    {
        ArgumentNullException.ThrowIfNull(baseText);
        ArgumentNullException.ThrowIfNull(baseline);
        ArgumentNullException.ThrowIfNull(point);
        if (Plan(baseText, baseline, out _) is not var (layout, period, write))
        {
            return null;
        }

        var result = PixelSplitSearch.Run(baseText, layout, layout.PixelSamples, write, baseline.SourcePath, point, scheme, maxParallelism);
        return result with { PixelSamples = baseline.Timing.PixelSamples, ReadPeriodSamples = period, ReadCount = baseline.Timing.Cycle!.RepeatCount };
    }

    private static (WindowLayout Layout, int Period, LayoutWriter Write)? Plan(string baseText, ReadoutDescription baseline, out string why)
    {
        var cycle = baseline.Timing.Cycle ?? throw new ArgumentException("a general cycle is needed", nameof(baseline));
        var windows = cycle.Windows;
        var copies = windows.Where(w => w.Read == 1).Select(w => w.Name[..w.Name.LastIndexOf('#')]).ToHashSet(StringComparer.Ordinal);
        var read = cycle.RepeatCount >= 2 ? windows.Where(w => w.Read == 0 && copies.Contains(w.Name)).ToList() : [.. windows];
        var names = WrittenWindows.Names(baseText);
        if (read.Count != 2 || read[0].Sees != ChargeSight.None || read[1].Sees != ChargeSight.Transfer || read[0].ResetGroup != read[1].ResetGroup
            || names is null || read.Any(w => names.Count(n => n == w.Name) != 1))
        {
            why = windows.Any(w => w.Sees == ChargeSight.Ramp)
                ? "a ramp cycle has no pedestal/signal split (its reads all see the integrating charge); vary its windows with --vary timing.window[i].count or the read count with --target-noise-e"
                : "the split needs a read made of one pedestal window (sees = \"reset\") followed by one signal window (sees = \"charge\") in one reset group, repeated by [timing.repeat] or written once";
            return null;
        }

        var (pedestal, signal) = (read[0], read[1]);
        var rate = baseline.Adc.RateHz;
        var period = cycle.RepeatCount >= 2
            ? windows.First(w => w.Name == pedestal.Name + "#1").Samples.Start - pedestal.Samples.Start
            : baseline.Timing.PixelSamples - pedestal.Samples.Start;
        var transfer = signal.ChargeTimeS * rate;
        var layout = new WindowLayout(
            pedestal.Samples.Start, pedestal.Samples.Count, Math.Round(transfer - pedestal.Samples.End, 9), Math.Round(signal.Samples.Start - transfer, 9),
            signal.Samples.Count, pedestal.Samples.Start + period - signal.Samples.End);
        var (p, s) = (WrittenWindows.Path(names.ToList().IndexOf(pedestal.Name)), WrittenWindows.Path(names.ToList().IndexOf(signal.Name)));
        string? Write(WindowLayout l, string text, out string? error) => TextEdits.Apply(text,
        [
            (p + ".start", l.LeadSamples),
            (p + ".count", l.ResetCount),
            (s + ".transfer_sample", l.TransferSample),
            (s + ".start", l.SignalStart),
            (s + ".count", l.SignalCount),
        ], out error);

        why = "";
        return (layout, period, Write);
    }
}
