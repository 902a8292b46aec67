using System.Globalization;

namespace CoefGen.Core.Instrument;

/// <summary>
/// What changed between two versions of a readout or instrument file, table by table (matched by label): cycle and
/// realised windows, read noise of each scheme, coefficient count, P, shift, post-multiplier, output fraction, every
/// proof width and the margin, and the largest change of any one coefficient. Equal inputs give no entry.
/// </summary>
public static class DesignDiff
{
    public static IReadOnlyList<DiffEntry> Compare(IReadOnlyList<TableSummary> before, IReadOnlyList<TableSummary> after)
    {
        ArgumentNullException.ThrowIfNull(before);
        ArgumentNullException.ThrowIfNull(after);
        var entries = new List<DiffEntry>();
        foreach (var a in before.Where(a => after.All(b => b.Label != a.Label)))
        {
            entries.Add(new DiffEntry(a.Label, "table", "designed", "removed"));
        }

        foreach (var b in after)
        {
            var a = before.FirstOrDefault(x => x.Label == b.Label);
            if (a is null)
            {
                entries.Add(new DiffEntry(b.Label, "table", "absent", "designed"));
                continue;
            }

            void Add(string quantity, string x, string y)
            {
                if (x != y)
                {
                    entries.Add(new DiffEntry(b.Label, quantity, x, y));
                }
            }

            Add("pixel time s", R(a.PixelTimeS), R(b.PixelTimeS));
            Add("pixel samples", I(a.PixelSamples), I(b.PixelSamples));
            Add("windows", Windows(a), Windows(b));
            foreach (var (scheme, e) in b.Noise)
            {
                var old = a.Noise.Where(n => n.Scheme == scheme).Select(n => R(n.Electrons)).FirstOrDefault() ?? "-";
                Add($"read noise e- ({scheme})", old, R(e));
            }

            Add("chosen scheme", a.ChosenScheme, b.ChosenScheme);
            Add("integer penalty %", R(a.PenaltyPercent), R(b.PenaltyPercent));
            Add("coefficient count", I(a.Coefficients.Count), I(b.Coefficients.Count));
            Add("P", I(a.P), I(b.P));
            Add("shift", I(a.Shift), I(b.Shift));
            Add("post-multiplier", I(a.PostMultiplier), I(b.PostMultiplier));
            Add("output fraction bits", I(a.OutputFracBits), I(b.OutputFracBits));
            foreach (var (check, required, available) in b.Widths)
            {
                var old = a.Widths.Where(w => w.Check == check).Select(w => $"{I(w.RequiredBits)} of {I(w.AvailableBits)}").FirstOrDefault() ?? "-";
                Add($"{check.Replace('_', ' ')} bits (needed of available)", old, $"{I(required)} of {I(available)}");
            }

            Add("proof margin bits", I(a.MarginBits), I(b.MarginBits));
            Add("proof", a.Safe ? "safe" : "NOT SAFE", b.Safe ? "safe" : "NOT SAFE");
            if (LargestCoefficientChange(a.Coefficients, b.Coefficients) is string change)
            {
                entries.Add(new DiffEntry(b.Label, "largest coefficient change", "", change));
            }
        }

        return entries;
    }

    /// <summary>
    /// "c[k]: x -> y (d, r % of the largest |c|)" for the largest |change| when both tables have the same length (and
    /// differ); when the lengths differ the coefficients belong to different samples and no element-wise change exists.
    /// </summary>
    public static string? LargestCoefficientChange(IReadOnlyList<long> before, IReadOnlyList<long> after)
    {
        ArgumentNullException.ThrowIfNull(before);
        ArgumentNullException.ThrowIfNull(after);
        if (before.Count != after.Count)
        {
            return "not element-wise: the coefficient count changed";
        }

        var k = -1;
        var largest = 0L;
        for (var i = 0; i < after.Count; i++)
        {
            var d = Math.Abs(after[i] - before[i]);
            if (d > largest)
            {
                (k, largest) = (i, d);
            }
        }

        if (k < 0)
        {
            return null;
        }

        var scale = Math.Max(1, before.Max(c => Math.Abs(c)));
        return string.Create(CultureInfo.InvariantCulture, $"c[{k}]: {before[k]} -> {after[k]} ({after[k] - before[k]:+0;-0}, {100.0 * largest / scale:0.###} % of the largest |c|)");
    }

    private static string Windows(TableSummary s) => string.Join(" ", s.Windows.Select(w => $"{I(w.First)}..{I(w.Last)}"));

    private static string R(double v) => v.ToString("G6", CultureInfo.InvariantCulture);

    private static string I(long v) => v.ToString(CultureInfo.InvariantCulture);
}
