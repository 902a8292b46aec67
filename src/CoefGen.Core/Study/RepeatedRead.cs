using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// The repeated read of a cycle with [timing.repeat] (times >= 2), from its loaded windows: the first copy of the
/// repeated windows (they keep the names as written; copy k is named "name#k") and the read period.
/// </summary>
/// <param name="Windows">The first copy's windows, in time order.</param>
/// <param name="PeriodSamples">Samples from one copy to the next.</param>
internal sealed record RepeatedRead(IReadOnlyList<CycleWindow> Windows, int PeriodSamples)
{
    /// <summary>The repeated read, or null when nothing repeats.</summary>
    public static RepeatedRead? Of(CycleSpec cycle)
    {
        if (cycle.RepeatCount < 2)
        {
            return null;
        }

        var second = cycle.Windows.Where(w => w.Read == 1).ToDictionary(w => w.Name[..w.Name.LastIndexOf('#')], w => w.Samples.Start, StringComparer.Ordinal);
        var first = cycle.Windows.Where(w => w.Read == 0 && second.ContainsKey(w.Name)).ToList();
        return new RepeatedRead(first, second[first[0].Name] - first[0].Samples.Start);
    }

    /// <summary>True for a window of the cycle that is not a copy of the repeated read.</summary>
    public bool IsOutside(CycleWindow w) => w.Read == 0 && !Windows.Contains(w);
}
