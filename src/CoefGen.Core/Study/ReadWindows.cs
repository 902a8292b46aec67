using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// The read of a general cycle as the window searches move it: one pedestal window (no charge) and one signal window
/// (after its transfer) in one reset group, repeated by [timing.repeat] or written once, as a <see cref="WindowLayout"/>
/// whose span is the read period (the time to the next read; for a read written once, to the end of the pixel cycle)
/// and a writer that sets the two [[timing.window]] entries (and, for a read written once, timing.pixel_samples).
/// </summary>
/// <param name="Layout">The read as written.</param>
/// <param name="PeriodSamples">Read period of a repetition; null for a read written once.</param>
/// <param name="ReadCount">Reads in the cycle.</param>
/// <param name="Write">Writes a layout of the read into the readout text.</param>
internal sealed record ReadWindows(WindowLayout Layout, int? PeriodSamples, int ReadCount, LayoutWriter Write)
{
    /// <summary>The read of <paramref name="d"/>'s cycle, or null with <paramref name="why"/>.</summary>
    public static ReadWindows? Of(string text, ReadoutDescription d, out string why)
    {
        var cycle = d.Timing.Cycle;
        if (cycle.IsClassic)
        {
            throw new ArgumentException("a general cycle ([[timing.window]]) is needed; a classic file has WindowLayout.Of", nameof(d));
        }

        var windows = cycle.Windows;
        var repetition = RepeatedRead.Of(cycle);
        var repeated = repetition is not null;
        var read = repetition?.Windows ?? windows;
        var names = WrittenWindows.Names(text);
        if (read.Count != 2 || read[0].Sees != ChargeSight.None || read[1].Sees != ChargeSight.Transfer || read[0].ResetGroup != read[1].ResetGroup
            || names is null || read.Any(w => names.Count(n => n == w.Name) != 1))
        {
            why = windows.Any(w => w.Sees == ChargeSight.Ramp)
                ? "a ramp cycle has no pedestal/signal windows to resize (its reads all see the integrating charge)"
                : "its read is not one pedestal window (sees = \"reset\") followed by one signal window (sees = \"charge\") in one reset group, repeated by [timing.repeat] or written once";
            return null;
        }

        var (pedestal, signal) = (read[0], read[1]);
        var period = repetition?.PeriodSamples ?? d.Timing.PixelSamples - pedestal.Samples.Start;
        var transfer = signal.ChargeTimeS * d.Adc.RateHz;
        var layout = new WindowLayout(
            pedestal.Samples.Start, pedestal.Samples.Count, Math.Round(transfer - pedestal.Samples.End, 9), Math.Round(signal.Samples.Start - transfer, 9),
            signal.Samples.Count, pedestal.Samples.Start + period - signal.Samples.End);
        var (p, s) = (WrittenWindows.Path(names.ToList().IndexOf(pedestal.Name)), WrittenWindows.Path(names.ToList().IndexOf(signal.Name)));
        string? Write(WindowLayout l, string edited, out string? error)
        {
            var edits = new List<(string, double)>
            {
                (p + ".start", l.LeadSamples),
                (p + ".count", l.ResetCount),
                (s + ".transfer_sample", l.TransferSample),
                (s + ".start", l.SignalStart),
                (s + ".count", l.SignalCount),
            };
            if (!repeated)
            {
                edits.Insert(0, ("timing.pixel_samples", l.PixelSamples)); // a read written once spans the pixel cycle
            }

            return TextEdits.Apply(edited, edits, out error);
        }

        why = "";
        return new ReadWindows(layout, repeated ? period : null, cycle.RepeatCount, Write);
    }
}
