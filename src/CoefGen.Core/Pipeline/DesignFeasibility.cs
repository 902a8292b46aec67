using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Pipeline;

/// <summary>
/// Checks that the constraints can be met on this sample grid before any weights are solved, so a file the
/// loader accepted but that cannot give a charge estimate is a located error, not an exception.
/// </summary>
internal static class DesignFeasibility
{
    /// <summary>Largest span from the first reset sample to the last signal sample (2^21: 16 MB per lag table).</summary>
    public const int MaxSpanSamples = 1 << 21;

    public static IReadOnlyList<Diagnostic> Check(ReadoutDescription d, SampleGrid grid)
    {
        var bag = new DiagnosticBag();
        if (grid.TwoWindow is not { } classic)
        {
            CycleFeasibility.Check(d, grid, bag);
            return bag.Items;
        }

        // The classic file's own diagnostics (located at its [timing.reset] / [timing.signal] keys).
        var meanReset = 0.0;
        var meanSignal = 0.0;
        for (var i = 0; i < grid.Count; i++)
        {
            if (grid.SightOf(i) == ChargeSight.Transfer)
            {
                meanSignal += grid.Step[i] / classic.Signal.Count;
            }
            else
            {
                meanReset += grid.Step[i] / classic.Reset.Count;
            }
        }

        if (!(Math.Abs(meanSignal - meanReset) > 1e-9))
        {
            bag.Error("CG1206", d.LocationOf("timing.signal.start"),
                "no signal-window sample sees the charge step (every sample lies at or before the transfer instant); start the signal window after timing.transfer_*");
        }

        var span = grid.SampleIndex[^1] - grid.SampleIndex[0] + 1;
        if (span > MaxSpanSamples)
        {
            bag.Error("CG1207", d.LocationOf("timing.signal.start"),
                $"the reset and signal windows span {span} samples; at most {MaxSpanSamples} are supported (the covariance keeps one value per lag of the span); move the windows closer or lower adc.rate_hz");
        }

        if (d.Weights.RejectDrift && (classic.Reset.Count < 2 || classic.Signal.Count < 2))
        {
            bag.Error("CG1404", d.LocationOf("weights.reject_drift"),
                "drift rejection needs at least 2 samples in each window (offset, gain and slope are three constraints); lengthen the windows or set reject_drift = false");
        }

        return bag.Items;
    }
}
