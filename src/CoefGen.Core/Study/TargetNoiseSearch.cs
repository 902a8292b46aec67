using System.Globalization;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// Smallest N with reset count = signal count = N whose read noise meets a target. The lead-in, the gap to
/// the transfer, the dead time and the tail keep their sample lengths from the file; the windows grow around
/// them, so the pixel cycle becomes lead + 2N + gaps + tail (it is extended or shortened, never clipped).
/// Doubling finds a bracket, bisection narrows it; the noise of every trial is checked to fall with N.
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

        var layout = WindowLayout.Of(baseline);
        var trials = new SortedDictionary<int, WindowTrial>();
        WindowTrial Try(int n)
        {
            if (!trials.TryGetValue(n, out var t))
            {
                var l = layout with { ResetCount = n, SignalCount = n };
                var text = l.Apply(baseText, out var error);
                var outcome = text is null
                    ? PointOutcome.Invalid([Diagnostics.Diagnostic.Error("CG6001", Diagnostics.SourceLocation.FileOnly(baseline.SourcePath), error ?? "cannot edit the timing")])
                    : point.Evaluate(text);
                t = new WindowTrial(l, outcome);
                trials[n] = t;
            }

            return t;
        }

        bool Meets(int n) => Try(n).Outcome is { Valid: true } o && o.NoiseOf(scheme) <= targetElectrons;

        // Doubling: stop at the first N that meets the target, or when the noise stops falling.
        int? hi = null;
        var lo = 0;
        double? previous = null;
        var note = "";
        for (var n = 1; n <= MaxWindow; n *= 2)
        {
            if (Meets(n))
            {
                hi = n;
                break;
            }

            lo = n;
            if (trials[n].Outcome is { Valid: true } o)
            {
                var noise = o.NoiseOf(scheme);
                if (previous is double p && noise >= p)
                {
                    note = $"the noise stopped falling at N = {n.ToString(CultureInfo.InvariantCulture)} (longer windows gather more low-frequency noise than they average away); the target is not reached";
                    break;
                }

                previous = noise;
            }
        }

        if (hi is null)
        {
            if (note.Length == 0)
            {
                note = $"no N up to {MaxWindow.ToString(CultureInfo.InvariantCulture)} meets the target";
            }

            return new TargetNoiseResult(targetElectrons, scheme, null, [.. trials.Values], IsMonotone(trials.Values, int.MaxValue, scheme), note);
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
            ? "noise falls with N over every trial up to N + 2, so the bisection bracket is sound"
            : "the noise does not fall monotonically with N over the trials; the answer is the smallest N found by bisection, a smaller one may exist";
        return new TargetNoiseResult(targetElectrons, scheme, high, [.. trials.Values], monotone, note);
    }

    private static bool IsMonotone(IEnumerable<WindowTrial> trials, int upTo, WeightScheme scheme)
    {
        var noise = trials.Where(t => t.Layout.ResetCount <= upTo && t.Outcome.Valid).Select(t => t.Outcome.NoiseOf(scheme)).ToList();
        return noise.Zip(noise.Skip(1)).All(p => p.Second <= p.First);
    }
}
