using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// Smallest N with reset count = signal count = N whose read noise meets a target. The lead-in, the gap to
/// the transfer, the dead time and the tail keep their sample lengths from the file; the windows grow around
/// them, so the pixel cycle becomes lead + 2N + gaps + tail (it is extended or shortened, never clipped).
/// The search is <see cref="SmallestCountSearch"/>'s: doubling, bisection, the noise of every trial checked to fall with N.
/// </summary>
public static class TargetNoiseSearch
{
    /// <summary>Largest N tried (a window of 2^16 samples already takes seconds to design).</summary>
    public const int MaxWindow = 1 << 16;

    public static TargetNoiseResult Run(string baseText, ReadoutDescription baseline, DesignPoint point, double targetElectrons, WeightScheme scheme)
    {
        ArgumentNullException.ThrowIfNull(baseText);
        ArgumentNullException.ThrowIfNull(baseline);
        ArgumentNullException.ThrowIfNull(point);
        if (!(targetElectrons > 0) || !double.IsFinite(targetElectrons))
        {
            throw new ArgumentException("target must be a positive number of electrons", nameof(targetElectrons));
        }

        return Run(baseText, WindowLayout.Of(baseline), (WindowLayout l, string t, out string? e) => l.Apply(t, out e), baseline.SourcePath, point, targetElectrons, scheme);
    }

    /// <summary>The search on any layout, written into the text by <paramref name="write"/>: the classic cycle, or the one read of a general cycle.</summary>
    internal static TargetNoiseResult Run(string baseText, WindowLayout layout, LayoutWriter write, string sourcePath, DesignPoint point, double targetElectrons, WeightScheme scheme)
    {
        WindowLayout Equal(int n) => layout with { ResetCount = n, SignalCount = n };
        PointOutcome Evaluate(int n)
        {
            var text = write(Equal(n), baseText, out var error);
            return text is null
                ? PointOutcome.Invalid([Diagnostics.Diagnostic.Error("CG6001", Diagnostics.SourceLocation.FileOnly(sourcePath), error ?? "cannot edit the timing")])
                : point.Evaluate(text);
        }

        var answer = SmallestCountSearch.Run(Evaluate, targetElectrons, scheme, MaxWindow, "longer windows", stopAtInvalid: false);
        return new TargetNoiseResult(targetElectrons, scheme, answer.Count, [.. answer.Trials.Select(t => new WindowTrial(Equal(t.N), t.Outcome))], answer.Monotone, answer.Note);
    }
}
