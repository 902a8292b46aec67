using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// The pixel-time split for a general cycle whose read is one pedestal window and one signal window in one reset
/// group (<see cref="ReadWindows"/>): inside the fixed read period, the split between pedestal window, dead time after
/// the transfer and signal window with the lowest read noise. The pedestal start, the gap from the pedestal to the
/// transfer and the time from the signal window to the next read (or the cycle end) stay as written; every copy of the
/// read takes the same split. The search is <see cref="PixelSplitSearch"/>'s.
/// </summary>
public static class ReadSplitSearch
{
    /// <summary>Why the split does not apply to this cycle, or null when it does.</summary>
    public static string? Refusal(string baseText, ReadoutDescription baseline)
    {
        ArgumentNullException.ThrowIfNull(baseText);
        ArgumentNullException.ThrowIfNull(baseline);
        return ReadWindows.Of(baseText, baseline, out var why) is null ? why : null;
    }

    /// <summary>The split, or null when <see cref="Refusal"/> says why not.</summary>
    public static SplitResult? Run(string baseText, ReadoutDescription baseline, DesignPoint point, WeightScheme scheme, int? maxParallelism = null)
    {
        ArgumentNullException.ThrowIfNull(baseText);
        ArgumentNullException.ThrowIfNull(baseline);
        ArgumentNullException.ThrowIfNull(point);
        if (ReadWindows.Of(baseText, baseline, out _) is not { } read)
        {
            return null;
        }

        var result = PixelSplitSearch.Run(baseText, read.Layout, read.Layout.PixelSamples, read.Write, baseline.SourcePath, point, scheme, maxParallelism);
        return result with { PixelSamples = baseline.Timing.PixelSamples, ReadPeriodSamples = read.PeriodSamples, ReadCount = read.ReadCount };
    }

    /// <summary>
    /// For a read written once (no repetition, so no read count): the smallest equal pedestal and signal window count
    /// meeting the target, as <see cref="TargetNoiseSearch"/> does for a classic file; null when the cycle has no such read.
    /// </summary>
    public static TargetNoiseResult? EqualWindowTarget(string baseText, ReadoutDescription baseline, DesignPoint point, double targetElectrons, WeightScheme scheme)
    {
        ArgumentNullException.ThrowIfNull(baseText);
        ArgumentNullException.ThrowIfNull(baseline);
        return ReadWindows.Of(baseText, baseline, out _) is { PeriodSamples: null } read
            ? TargetNoiseSearch.Run(baseText, read.Layout, read.Write, baseline.SourcePath, point, targetElectrons, scheme)
            : null;
    }
}
