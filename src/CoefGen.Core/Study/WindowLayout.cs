using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// The pixel cycle in samples, as the window searches move it: a lead-in before the reset window, the reset
/// window, a gap to the charge transfer, the dead time (settling) from the transfer to the signal window, the
/// signal window, and a tail to the end of the cycle. Written back to the readout text in samples.
/// </summary>
/// <param name="LeadSamples">Reset window start.</param>
/// <param name="ResetCount">Reset window length.</param>
/// <param name="TransferGapSamples">From the end of the reset window to the transfer (may be fractional).</param>
/// <param name="DeadSamples">From the transfer to the start of the signal window (may be fractional).</param>
/// <param name="SignalCount">Signal window length.</param>
/// <param name="TailSamples">From the end of the signal window to the end of the cycle.</param>
public sealed record WindowLayout(int LeadSamples, int ResetCount, double TransferGapSamples, double DeadSamples, int SignalCount, int TailSamples)
{
    public double TransferSample => LeadSamples + ResetCount + TransferGapSamples;

    public int SignalStart => (int)Math.Round(TransferSample + DeadSamples);

    public int PixelSamples => SignalStart + SignalCount + TailSamples;

    /// <summary>The layout of a loaded description.</summary>
    public static WindowLayout Of(ReadoutDescription d)
    {
        ArgumentNullException.ThrowIfNull(d);
        var t = d.Timing;
        var c = t.Cycle.AsTwoWindow() ?? throw new ArgumentException("window layouts describe classic two-window files only (the sweep refuses a general cycle, CG1255)", nameof(d));
        var transfer = c.TransferTimeS * d.Adc.RateHz;
        return new WindowLayout(
            c.Reset.Start, c.Reset.Count, Math.Round(transfer - c.Reset.End, 9), Math.Round(c.Signal.Start - transfer, 9), c.Signal.Count, t.PixelSamples - c.Signal.End);
    }

    /// <summary>The readout text with this layout's timing written in samples (ns keys are replaced).</summary>
    public string? Apply(string text, out string? error)
    {
        ArgumentNullException.ThrowIfNull(text);
        var edits = new (string Key, double Value)[]
        {
            ("timing.pixel_samples", PixelSamples),
            ("timing.transfer_sample", TransferSample),
            ("timing.reset.start", LeadSamples),
            ("timing.reset.count", ResetCount),
            ("timing.signal.start", SignalStart),
            ("timing.signal.count", SignalCount),
        };
        return TextEdits.Apply(text, edits, out error);
    }
}
