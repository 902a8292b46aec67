using System.Globalization;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// The read count of a general cycle as a key the studies can set: the readout text of the same cycle with N reads.
/// <list type="bullet">
/// <item>Repeated reads ([timing.repeat], <see cref="ReadCountKind.Repeat"/>): timing.repeat.times = N at the file's read
/// period. The pixel cycle changes by one read period per read added or removed, so the time after the last read stays
/// as written; when a window that is not repeated lies after the first read, timing.pixel_samples is left as written.</item>
/// <item>Fowler-N (<see cref="ReadCountKind.GroupSize"/>: two or more ramp windows of equal length, no repetition): every
/// window gets N samples and keeps its start, so the distance between the groups' centres (the integration time of
/// the difference of group means) stays as written.</item>
/// </list>
/// </summary>
public sealed class ReadCountAxis
{
    private readonly int _pixelSamples;
    private readonly bool _movePixel;
    private readonly IReadOnlyList<int> _entries;

    private ReadCountAxis(ReadCountKind kind, int fileCount, int periodSamples, int pixelSamples, bool movePixel, IReadOnlyList<int> entries)
    {
        Kind = kind;
        FileCount = fileCount;
        PeriodSamples = periodSamples;
        _pixelSamples = pixelSamples;
        _movePixel = movePixel;
        _entries = entries;
    }

    public ReadCountKind Kind { get; }

    /// <summary>N of the readout file.</summary>
    public int FileCount { get; }

    /// <summary>Read period in samples (<see cref="ReadCountKind.Repeat"/>); the sample period (1) for Fowler-N.</summary>
    public int PeriodSamples { get; }

    /// <summary>The key that N is: timing.repeat.times, or the ramp windows' count.</summary>
    public string Key => Kind == ReadCountKind.Repeat ? "timing.repeat.times" : "timing.window[*].count";

    /// <summary>What N counts, for people.</summary>
    public string Noun => Kind == ReadCountKind.Repeat ? "reads" : "reads per group";

    /// <summary>The read-count axis of <paramref name="d"/>, or null with <paramref name="why"/> when the cycle has none.</summary>
    public static ReadCountAxis? Of(string text, ReadoutDescription d, out string why)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(d);
        var cycle = d.Timing.Cycle;
        if (cycle.IsClassic)
        {
            why = "a classic two-window file has no read count";
            return null;
        }

        var windows = cycle.Windows;
        if (RepeatedRead.Of(cycle) is { } read)
        {
            var firstRead = read.Windows[0].Samples.Start;
            var after = windows.Any(w => read.IsOutside(w) && w.Samples.Start > firstRead);
            why = "";
            return new ReadCountAxis(ReadCountKind.Repeat, cycle.RepeatCount, read.PeriodSamples, d.Timing.PixelSamples, !after, []);
        }

        var names = WrittenWindows.Names(text);
        if (windows.Count >= 2 && windows.All(w => w.Sees == ChargeSight.Ramp) && windows.All(w => w.Samples.Count == windows[0].Samples.Count)
            && names is not null && names.Count == windows.Count && windows.All(w => names.Count(n => n == w.Name) == 1))
        {
            why = "";
            return new ReadCountAxis(ReadCountKind.GroupSize, windows[0].Samples.Count, 1, d.Timing.PixelSamples, false,
                [.. windows.Select(w => names.ToList().IndexOf(w.Name))]);
        }

        why = cycle.RepeatCount == 1 && windows.Any(w => w.Sees == ChargeSight.Ramp)
            ? "this ramp cycle neither repeats its reads ([timing.repeat] with times >= 2) nor is a Fowler-N cycle (ramp windows of equal length, each written once)"
            : "this cycle does not repeat its reads ([timing.repeat] with times >= 2)";
        return null;
    }

    /// <summary>The pixel cycle in samples of the cycle with <paramref name="n"/> reads.</summary>
    public int PixelSamplesFor(int n) => _movePixel ? _pixelSamples + ((n - FileCount) * PeriodSamples) : _pixelSamples;

    /// <summary>The readout text of the cycle with <paramref name="n"/> reads, or null with the reason.</summary>
    public string? Apply(string text, int n, out string? error)
    {
        ArgumentNullException.ThrowIfNull(text);
        if (n < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(n), "at least one read");
        }

        var edits = new List<(string, double)>();
        if (Kind == ReadCountKind.Repeat)
        {
            edits.Add(("timing.repeat.times", n));
            if (_movePixel)
            {
                edits.Add(("timing.pixel_samples", PixelSamplesFor(n)));
            }
        }
        else
        {
            edits.AddRange(_entries.Select(e => (WrittenWindows.Path(e) + ".count", (double)n)));
        }

        return TextEdits.Apply(text, edits, out error);
    }

    /// <summary>The read counts a study shows: 1, 2, 4, ... below the file's N, then the file's N.</summary>
    public IReadOnlyList<int> PowersOfTwoUpToFile()
    {
        var list = new List<int>();
        for (var n = 1; n < FileCount; n *= 2)
        {
            list.Add(n);
        }

        list.Add(FileCount);
        return list;
    }

    public override string ToString() => string.Create(CultureInfo.InvariantCulture, $"{Key} = {FileCount}");
}
