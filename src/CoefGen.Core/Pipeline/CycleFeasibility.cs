using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Pipeline;

/// <summary>The feasibility checks of <see cref="DesignFeasibility"/> for a general cycle.</summary>
internal static class CycleFeasibility
{
    public static void Check(ReadoutDescription d, SampleGrid grid, DiagnosticBag bag)
    {
        var ones = new double[grid.Count];
        Array.Fill(ones, 1.0);
        var (_, _, contrast) = CycleWindowFit.Contrast(grid, ones);
        if (!(contrast > 1e-12))
        {
            bag.Error("CG1206", d.LocationOf("timing.window"),
                "no reset group has windows that see different charge levels (a reset window and a window after a transfer, or ramp windows at different times), so no weights can give a charge estimate; put a reset window and a charge window in one group, or two ramp windows");
        }

        var span = grid.SampleIndex[^1] - grid.SampleIndex[0] + 1;
        if (span > DesignFeasibility.MaxSpanSamples)
        {
            bag.Error("CG1207", d.LocationOf("timing.window"),
                $"the windows span {span} samples; at most {DesignFeasibility.MaxSpanSamples} are supported (the covariance keeps one value per lag of the span); shorten the cycle or lower adc.rate_hz");
        }

        // Offsets (one per group), gain and slope are G + 2 constraints; the samples must leave room for them.
        if (d.Weights.RejectDrift && grid.Count < grid.GroupCount + 3)
        {
            bag.Error("CG1404", d.LocationOf("weights.reject_drift"),
                $"drift rejection with {grid.GroupCount} reset groups needs at least {grid.GroupCount + 3} weighted samples (one offset per group, gain and slope); lengthen the windows or set reject_drift = false");
        }
    }
}
