using CoefGen.Core.Diagnostics;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights.TwoStage;

namespace CoefGen.Core.Study;

/// <summary>
/// Read noise against the read count of a general cycle: the cycle redesigned with N = 1, 2, 4, ... reads and the
/// file's N (<see cref="ReadCountAxis"/> says how the text changes), every scheme's noise and, for identical reads,
/// the two-stage form's. Each point is the edited readout text through the loader and the pipeline, as `sweep` does;
/// the file's own N is the design passed in, so its numbers are the report's.
/// </summary>
public static class ReadCountStudy
{
    /// <summary>
    /// The curve, or null when the cycle has no read count (a classic file, a cycle without repetition) or the design
    /// is on a capture: the capture's noise exists at its own read count only, and the other rows would come from the
    /// parametric model (<see cref="DesignPoint"/> applies no capture), so the table would mix two noise models.
    /// </summary>
    public static ReadCountCurve? Run(string baseText, DesignResult file, DesignPoint point)
    {
        ArgumentNullException.ThrowIfNull(baseText);
        ArgumentNullException.ThrowIfNull(file);
        ArgumentNullException.ThrowIfNull(point);
        var axis = file.CaptureSource is null ? ReadCountAxis.Of(baseText, file.Description, out _) : null;
        if (axis is null)
        {
            return null;
        }

        var points = new List<ReadCountPoint>();
        foreach (var n in axis.PowersOfTwoUpToFile())
        {
            points.Add(n == axis.FileCount ? PointOf(n, file, []) : Design(axis, baseText, point, n, file.Description.SourcePath));
        }

        var ramp = axis.Kind == ReadCountKind.Repeat && file.Description.Timing.Cycle.Windows.Any(w => w.Sees == ChargeSight.Ramp);
        return new ReadCountCurve(axis, points, ramp ? ReadCountLaw.RampFit : ReadCountLaw.InverseSqrt);
    }

    private static ReadCountPoint Design(ReadCountAxis axis, string baseText, DesignPoint point, int n, string sourcePath)
    {
        var text = axis.Apply(baseText, n, out var error);
        if (text is null)
        {
            return new ReadCountPoint(n, axis.PixelSamplesFor(n), [], null, Diagnostic.Error("CG6001", SourceLocation.FileOnly(sourcePath), error ?? "cannot edit the read count"));
        }

        var result = point.Run(text, out var diagnostics);
        return result is null
            ? new ReadCountPoint(n, axis.PixelSamplesFor(n), [], null, diagnostics.FirstOrDefault(d => d.Severity == Severity.Error) ?? Diagnostic.Error("CG6002", SourceLocation.FileOnly(sourcePath), "not a valid design"))
            : PointOf(n, result, diagnostics);
    }

    private static ReadCountPoint PointOf(int n, DesignResult r, IReadOnlyList<Diagnostic> diagnostics)
    {
        var outcome = DesignPoint.Summarise(r, diagnostics);
        // The pipeline's two-stage form when it made one (the same design), else the real design alone.
        var two = r.TwoStage?.Real ?? TwoStageWeights.Design(r.Grid, r.Covariance, r.Description.Weights.RejectDrift);
        double? twoStage = two is null ? null : Math.Sqrt(two.VarianceV2) / r.Description.Sensor.VoltsAtAdcPerElectron;
        return new ReadCountPoint(n, r.Description.Timing.PixelSamples, outcome.Schemes, twoStage, null);
    }
}
