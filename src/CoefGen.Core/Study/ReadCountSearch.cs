using System.Globalization;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// The window search "how short for a target noise" for a cycle with a read count: the smallest N (reads, or reads per
/// group for Fowler-N) whose read noise meets a target, the cycle edited as <see cref="ReadCountAxis"/> says (at the
/// file's read period; the pixel cycle grows or shrinks by one period per read). Doubling from N = 1 finds a bracket,
/// bisection narrows it; the noise of every trial is checked to fall with N.
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

        var trials = new SortedDictionary<int, ReadCountTrial>();
        ReadCountTrial Try(int n)
        {
            if (!trials.TryGetValue(n, out var t))
            {
                var text = axis.Apply(baseText, n, out var error);
                var outcome = text is null
                    ? PointOutcome.Invalid([Diagnostic.Error("CG6001", SourceLocation.FileOnly(baseline.SourcePath), error ?? "cannot edit the read count")])
                    : point.Evaluate(text);
                t = new ReadCountTrial(n, axis.PixelSamplesFor(n), outcome);
                trials[n] = t;
            }

            return t;
        }

        bool Valid(int n) => Try(n).Outcome.Valid;
        bool Meets(int n) => Valid(n) && Try(n).Outcome.NoiseOf(scheme) <= targetElectrons;

        // Doubling: stop at the first N that meets the target, or when the noise of valid designs stops falling.
        int? hi = null;
        var lo = 0;
        double? previous = null;
        var note = "";
        for (var n = 1; n <= MaxReads; n *= 2)
        {
            if (Meets(n))
            {
                hi = n;
                break;
            }

            lo = n;
            if (Valid(n))
            {
                var noise = Try(n).Outcome.NoiseOf(scheme);
                if (previous is double p && noise >= p)
                {
                    note = $"the noise stopped falling at N = {I(n)} (more {axis.Noun} gather more low-frequency noise than they average away); the target is not reached";
                    break;
                }

                previous = noise;
            }
            else if (previous is not null)
            {
                note = $"N = {I(n)} is not a valid design ({(Try(n).Outcome.Diagnostics is [var first, ..] ? first.Code : "no diagnostic")}); the target is not reached below it";
                break;
            }
        }

        if (hi is null)
        {
            if (note.Length == 0)
            {
                note = $"no N up to {I(MaxReads)} meets the target";
            }

            return new ReadCountTargetResult(targetElectrons, scheme, axis, null, [.. trials.Values], IsMonotone(trials.Values, int.MaxValue, scheme), note);
        }

        var high = hi.Value;
        while (high - lo > 1)
        {
            var mid = lo + ((high - lo) / 2);
            if (Meets(mid))
            {
                high = mid;
            }
            else
            {
                lo = mid;
            }
        }

        // Neighbours that show the answer: two below and two above.
        for (var n = Math.Max(1, high - 2); n <= high + 2; n++)
        {
            Try(n);
        }

        var monotone = IsMonotone(trials.Values, high + 2, scheme);
        note = monotone
            ? "noise falls with N over every valid trial up to N + 2, so the bisection bracket is sound"
            : "the noise does not fall monotonically with N over the trials; the answer is the smallest N found by bisection, a smaller one may exist";
        return new ReadCountTargetResult(targetElectrons, scheme, axis, high, [.. trials.Values], monotone, note);
    }

    private static bool IsMonotone(IEnumerable<ReadCountTrial> trials, int upTo, WeightScheme scheme)
    {
        var noise = trials.Where(t => t.Reads <= upTo && t.Outcome.Valid).Select(t => t.Outcome.NoiseOf(scheme)).ToList();
        return noise.Zip(noise.Skip(1)).All(p => p.Second <= p.First);
    }

    private static string I(int v) => v.ToString(CultureInfo.InvariantCulture);
}
