using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// The window search "how short for a target noise" for a cycle with a read count: the smallest N (reads, or reads per
/// group for Fowler-N) whose read noise meets a target, the cycle edited as <see cref="ReadCountAxis"/> says (at the
/// file's read period; the pixel cycle grows or shrinks by one period per read), by <see cref="SmallestCountSearch"/>;
/// doubling stops at the first count that is no longer a valid design.
/// </summary>
public static class ReadCountSearch
{
    /// <summary>Largest N tried (a thousand reads of a few dozen samples already take seconds per design).</summary>
    public const int MaxReads = 1024;

    public static ReadCountTargetResult Run(string baseText, ReadoutDescription baseline, ReadCountAxis axis, DesignPoint point, double targetElectrons, WeightScheme scheme)
    {
        ArgumentNullException.ThrowIfNull(baseText);
        ArgumentNullException.ThrowIfNull(baseline);
        ArgumentNullException.ThrowIfNull(axis);
        ArgumentNullException.ThrowIfNull(point);
        if (!(targetElectrons > 0) || !double.IsFinite(targetElectrons))
        {
            throw new ArgumentException("target must be a positive number of electrons", nameof(targetElectrons));
        }

        PointOutcome Evaluate(int n)
        {
            var text = axis.Apply(baseText, n, out var error);
            return text is null
                ? PointOutcome.Invalid([Diagnostic.Error("CG6001", SourceLocation.FileOnly(baseline.SourcePath), error ?? "cannot edit the read count")])
                : point.Evaluate(text);
        }

        var answer = SmallestCountSearch.Run(Evaluate, targetElectrons, scheme, MaxReads, "more " + axis.Noun, stopAtInvalid: true);
        return new ReadCountTargetResult(targetElectrons, scheme, axis, answer.Count, [.. answer.Trials.Select(t => new ReadCountTrial(t.N, axis.PixelSamplesFor(t.N), t.Outcome))], answer.Monotone, answer.Note);
    }

}
