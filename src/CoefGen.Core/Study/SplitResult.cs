namespace CoefGen.Core.Study;

/// <summary>
/// The answer of <see cref="PixelSplitSearch"/>: the best layout for the fixed pixel cycle, and the trials next to it
/// (one sample more or less in each window, the dead time taking up the difference) that show it is a minimum.
/// </summary>
public sealed record SplitResult(
    Readout.WeightScheme Scheme,
    int PixelSamples,
    WindowTrial? Best,
    IReadOnlyList<WindowTrial> Neighbours,
    int TrialCount,
    string Note)
{
    /// <summary>For one read of a general cycle (<see cref="ReadSplitSearch"/>): the read period the split fills; null for the classic pixel cycle.</summary>
    public int? ReadPeriodSamples { get; init; }

    /// <summary>For one read of a general cycle: how many reads repeat that split.</summary>
    public int ReadCount { get; init; } = 1;
}
