namespace CoefGen.Core.Readout;

/// <summary>
/// A general pixel cycle: every window in time order with what it sees and its reset group, plus the integration
/// settings of ramp windows. The two-window cycle of a classic readout file is the special case
/// [reset: no charge, group 0], [signal: after the transfer, group 0] (<see cref="TwoWindowCycle.ToCycle()"/>);
/// every layer that computes works on the windows and groups alone, so both forms go through one path.
/// </summary>
/// <param name="Windows">Windows sorted by start, disjoint, repetitions expanded.</param>
/// <param name="GroupCount">Number of reset groups (every group 0 .. GroupCount-1 has a window).</param>
/// <param name="ReferenceTimeS">For ramp windows: the estimate is the charge collected in this time; null without ramps.</param>
/// <param name="ShotNoise">Shot noise of the integrating charge; null without ramps or when not given.</param>
/// <param name="RepeatCount">Copies of the repeated windows (1 when nothing repeats).</param>
public sealed record CycleSpec(
    IReadOnlyList<CycleWindow> Windows,
    int GroupCount,
    double? ReferenceTimeS,
    ShotNoiseSpec? ShotNoise,
    int RepeatCount)
{
    /// <summary>Set only for a cycle written in the classic form; see <see cref="AsTwoWindow"/>.</summary>
    internal TwoWindowCycle? TwoWindow { get; init; }

    /// <summary>True when the file was written in the classic form ([timing.reset] and [timing.signal]).</summary>
    public bool IsClassic => TwoWindow is not null;

    /// <summary>
    /// The reset/signal view of a classic-form cycle; null for a general cycle ([[timing.window]]), even one with
    /// two windows, whose output lists its windows instead.
    /// </summary>
    public TwoWindowCycle? AsTwoWindow() => TwoWindow;
}
