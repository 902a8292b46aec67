using System.Globalization;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// For the file's pixel cycle, the split between reset window, dead time (settling after the transfer) and
/// signal window that minimises the read noise of a scheme. The lead-in, the gap from the reset window to the
/// transfer and the tail stay as written; reset count + dead time + signal count fill the rest.
/// A coarse grid (about 12 steps per window) is searched in full, then a pattern search refines the best point
/// with halving steps down to one sample. A small search, not a proof of the global minimum.
/// </summary>
public static class PixelSplitSearch
{
    private const int CoarseSteps = 12;

    public static SplitResult Run(string baseText, ReadoutDescription baseline, DesignPoint point, WeightScheme scheme, int? maxParallelism = null)
    {
        ArgumentNullException.ThrowIfNull(baseText);
        ArgumentNullException.ThrowIfNull(baseline);
        ArgumentNullException.ThrowIfNull(point);
        return Run(baseText, WindowLayout.Of(baseline), baseline.Timing.PixelSamples, (WindowLayout l, string t, out string? e) => l.Apply(t, out e), baseline.SourcePath, point, scheme, maxParallelism);
    }

    /// <summary>
    /// The search on any layout of <paramref name="pixel"/> samples (lead-in, gap to the transfer and tail fixed), written
    /// into the text by <paramref name="write"/>: the classic pixel cycle, or one read of a general cycle.
    /// </summary>
    internal static SplitResult Run(string baseText, WindowLayout layout, int pixel, LayoutWriter write, string sourcePath, DesignPoint point, WeightScheme scheme, int? maxParallelism)
    {
        var budget = pixel - layout.LeadSamples - layout.TailSamples - layout.TransferGapSamples;
        var room = (int)Math.Floor(budget + 1e-9);
        if (room < 2)
        {
            return new SplitResult(scheme, pixel, null, [], 0, "the pixel cycle leaves no room for two windows after the lead-in, transfer gap and tail");
        }

        var trials = new Dictionary<(int, int), WindowTrial>();
        WindowLayout LayoutFor(int r, int s) =>
            layout with { ResetCount = r, SignalCount = s, DeadSamples = Math.Round(pixel - layout.TailSamples - s - (layout.LeadSamples + r + layout.TransferGapSamples), 9) };
        bool Fits(int r, int s) => r >= 1 && s >= 1 && r + s <= room;

        void Evaluate(IEnumerable<(int R, int S)> candidates)
        {
            var todo = candidates.Where(c => Fits(c.R, c.S) && !trials.ContainsKey(c)).Distinct().ToArray();
            var results = new WindowTrial[todo.Length];
            Parallel.For(0, todo.Length, new ParallelOptions { MaxDegreeOfParallelism = maxParallelism ?? Environment.ProcessorCount }, i =>
            {
                var l = LayoutFor(todo[i].R, todo[i].S);
                var text = write(l, baseText, out var error);
                results[i] = new WindowTrial(l, text is null
                    ? PointOutcome.Invalid([Diagnostics.Diagnostic.Error("CG6001", Diagnostics.SourceLocation.FileOnly(sourcePath), error ?? "cannot edit the timing")])
                    : point.Evaluate(text));
            });
            for (var i = 0; i < todo.Length; i++)
            {
                trials[todo[i]] = results[i];
            }
        }

        (int R, int S)? BestKey() => trials
            .Where(t => t.Value.Outcome.Valid)
            .OrderBy(t => t.Value.Outcome.NoiseOf(scheme)).ThenBy(t => t.Key.Item1).ThenBy(t => t.Key.Item2)
            .Select(t => ((int R, int S)?)t.Key).FirstOrDefault();

        var step = Math.Max(1, room / CoarseSteps);
        var coarse = new List<(int, int)>();
        for (var r = 1; r < room; r += step)
        {
            for (var s = 1; r + s <= room; s += step)
            {
                coarse.Add((r, s));
            }
        }

        Evaluate(coarse);
        var best = BestKey();
        if (best is null)
        {
            return new SplitResult(scheme, pixel, null, [], trials.Count, "no split on the coarse grid gives a valid design");
        }

        for (var h = Math.Max(1, step / 2); ; h = Math.Max(1, h / 2))
        {
            while (true)
            {
                var (r, s) = best!.Value;
                Evaluate([(r - h, s), (r + h, s), (r, s - h), (r, s + h), (r - h, s - h), (r + h, s + h), (r - h, s + h), (r + h, s - h)]);
                var next = BestKey();
                if (next == best)
                {
                    break;
                }

                best = next;
            }

            if (h == 1)
            {
                break;
            }
        }

        var (br, bs) = best!.Value;
        Evaluate([(br - 1, bs), (br + 1, bs), (br, bs - 1), (br, bs + 1)]);
        var neighbours = new[] { (br - 1, bs), (br + 1, bs), (br, bs - 1), (br, bs + 1) }
            .Where(trials.ContainsKey).Select(k => trials[k]).ToList();
        var note = $"{trials.Count.ToString(CultureInfo.InvariantCulture)} splits designed: a coarse grid with step {step.ToString(CultureInfo.InvariantCulture)} samples, then a pattern search down to 1 sample";
        return new SplitResult(scheme, pixel, trials[best.Value], neighbours, trials.Count, note);
    }
}
