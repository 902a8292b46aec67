using System.Globalization;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// The smallest count N >= 1 whose design meets a read-noise target, for searches whose noise falls with N (equal window
/// counts, read counts). Doubling from N = 1 finds a bracket, stopping early when the noise of valid designs stops
/// falling; bisection narrows it; the two counts either side of the answer are designed too, and the noise of every
/// trial is checked to fall with N (bisection is only sound then).
/// </summary>
internal static class SmallestCountSearch
{
    /// <summary>What the search found: the answer (null when not reached), every trial by N, monotonicity and a note.</summary>
    public sealed record Answer(int? Count, IReadOnlyList<(int N, PointOutcome Outcome)> Trials, bool Monotone, string Note);

    /// <param name="evaluate">The design at N (called once per N).</param>
    /// <param name="targetElectrons">The target, e- rms.</param>
    /// <param name="scheme">Whose noise must meet it.</param>
    /// <param name="max">Largest N tried.</param>
    /// <param name="more">What larger N means, for the note when the noise stops falling ("longer windows", "more reads").</param>
    /// <param name="stopAtInvalid">Stop doubling at the first invalid N after a valid one (a cycle that no longer fits).</param>
    public static Answer Run(Func<int, PointOutcome> evaluate, double targetElectrons, WeightScheme scheme, int max, string more, bool stopAtInvalid)
    {
        var trials = new SortedDictionary<int, PointOutcome>();
        PointOutcome Try(int n)
        {
            if (!trials.TryGetValue(n, out var o))
            {
                o = evaluate(n);
                trials[n] = o;
            }

            return o;
        }

        bool Meets(int n) => Try(n) is { Valid: true } o && o.NoiseOf(scheme) <= targetElectrons;

        int? hi = null;
        var lo = 0;
        double? previous = null;
        var note = "";
        for (var n = 1; n <= max; n *= 2)
        {
            if (Meets(n))
            {
                hi = n;
                break;
            }

            lo = n;
            if (trials[n] is { Valid: true } o)
            {
                var noise = o.NoiseOf(scheme);
                if (previous is double p && noise >= p)
                {
                    note = $"the noise stopped falling at N = {I(n)} ({more} gather more low-frequency noise than they average away); the target is not reached";
                    break;
                }

                previous = noise;
            }
            else if (stopAtInvalid && previous is not null)
            {
                note = $"N = {I(n)} is not a valid design ({(trials[n].Diagnostics is [var first, ..] ? first.Code : "no diagnostic")}); the target is not reached below it";
                break;
            }
        }

        if (hi is null)
        {
            if (note.Length == 0)
            {
                note = $"no N up to {I(max)} meets the target";
            }

            return new Answer(null, List(trials), IsMonotone(trials, int.MaxValue, scheme), note);
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

        var monotone = IsMonotone(trials, high + 2, scheme);
        note = monotone
            ? "noise falls with N over every trial up to N + 2, so the bisection bracket is sound"
            : "the noise does not fall monotonically with N over the trials; the answer is the smallest N found by bisection, a smaller one may exist";
        return new Answer(high, List(trials), monotone, note);
    }

    private static List<(int, PointOutcome)> List(SortedDictionary<int, PointOutcome> trials) => [.. trials.Select(t => (t.Key, t.Value))];

    private static bool IsMonotone(SortedDictionary<int, PointOutcome> trials, int upTo, WeightScheme scheme)
    {
        var noise = trials.Where(t => t.Key <= upTo && t.Value.Valid).Select(t => t.Value.NoiseOf(scheme)).ToList();
        return noise.Zip(noise.Skip(1)).All(p => p.Second <= p.First);
    }

    private static string I(int v) => v.ToString(CultureInfo.InvariantCulture);
}
