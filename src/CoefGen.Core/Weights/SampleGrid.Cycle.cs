using CoefGen.Core.Readout;

namespace CoefGen.Core.Weights;

/// <summary>The cycle part of the grid: reset groups, windows and the exposure of ramp samples.</summary>
public sealed partial class SampleGrid
{
    private readonly int[] windowOf;

    private SampleGrid(int[] sampleIndex, double[] timeS, double[] step, double rateHz, int[] group, int groupCount, GridWindow[] windows, int[] windowOf, double[] exposure, TwoWindowCycle? twoWindow)
    {
        SampleIndex = sampleIndex;
        TimeS = timeS;
        Step = step;
        RateHz = rateHz;
        Group = group;
        GroupCount = groupCount;
        Windows = windows;
        this.windowOf = windowOf;
        ExposureS = exposure;
        TwoWindow = twoWindow;
    }

    /// <summary>Reset group of each sample (0 .. <see cref="GroupCount"/>-1); all 0 for a classic grid.</summary>
    public IReadOnlyList<int> Group { get; }

    public int GroupCount { get; }

    /// <summary>The windows in time order as runs of grid entries.</summary>
    public IReadOnlyList<GridWindow> Windows { get; }

    /// <summary>
    /// For ramp samples: seconds of integration since the integration start (shot noise grows with it); NaN for
    /// samples that see no integrating charge.
    /// </summary>
    public IReadOnlyList<double> ExposureS { get; }

    /// <summary>
    /// The reset/signal view when the grid comes from a classic-form cycle (<see cref="CycleSpec.AsTwoWindow"/>),
    /// for output that is two-window by nature; null for a general cycle. Computation never asks it.
    /// </summary>
    public TwoWindowCycle? TwoWindow { get; }

    /// <summary>
    /// True when the cycle is one reset group of a window that sees no charge followed by one window after a
    /// transfer (a classic file, or the same two windows written as [[timing.window]]): its window-mean estimator
    /// has the closed form of a difference of the two means (<see cref="BoxcarWeights.WindowDifference"/>).
    /// </summary>
    public bool IsResetSignalPair =>
        GroupCount == 1 && Windows.Count == 2 && Windows[0].Sees == ChargeSight.None && Windows[1].Sees == ChargeSight.Transfer;

    /// <summary>Index into <see cref="Windows"/> of the window sample i lies in.</summary>
    public int WindowOf(int i) => windowOf[i];

    /// <summary>What sample i sees of the charge (its window's sight).</summary>
    public ChargeSight SightOf(int i) => Windows[windowOf[i]].Sees;

    /// <summary>Grid indices of the samples of every reset group.</summary>
    public int[][] GroupMembers()
    {
        var members = new List<int>[GroupCount];
        for (var g = 0; g < GroupCount; g++)
        {
            members[g] = [];
        }

        for (var i = 0; i < Count; i++)
        {
            members[Group[i]].Add(i);
        }

        return [.. members.Select(m => m.ToArray())];
    }

    /// <summary>
    /// Builds the grid of a general cycle. Step responses: 0 for reset windows; after a transfer at t_x, 1 (ideal)
    /// or 1 - exp(-2 pi f_p (t - t_x)) (pole); for a ramp from t_0, (t - t_0) / T_ref, so the estimate is the charge
    /// collected in the reference time T_ref.
    /// </summary>
    public static SampleGrid FromCycle(double rateHz, CycleSpec cycle, double? poleHz)
    {
        ArgumentNullException.ThrowIfNull(cycle);
        if (!(rateHz > 0) || cycle.Windows.Count == 0)
        {
            throw new ArgumentException("a cycle needs a rate > 0 and at least one window");
        }

        var n = cycle.Windows.Sum(w => w.Samples.Count);
        var index = new int[n];
        var time = new double[n];
        var step = new double[n];
        var group = new int[n];
        var exposure = new double[n];
        var windowOf = new int[n];
        var windows = new GridWindow[cycle.Windows.Count];
        var k = 0;
        var previousEnd = int.MinValue;
        for (var wi = 0; wi < cycle.Windows.Count; wi++)
        {
            var w = cycle.Windows[wi];
            if (w.Samples.Count < 1 || w.Samples.Start < previousEnd || w.ResetGroup < 0 || w.ResetGroup >= cycle.GroupCount)
            {
                throw new ArgumentException("cycle windows must be non-empty, disjoint, in time order and in a valid group");
            }

            if (w.Sees == ChargeSight.Ramp && !(cycle.ReferenceTimeS > 0))
            {
                throw new ArgumentException("ramp windows need a reference time > 0");
            }

            previousEnd = w.Samples.End;
            windows[wi] = new GridWindow(k, w.Samples.Count, w.Sees, w.ResetGroup, w.Read);
            for (var j = 0; j < w.Samples.Count; j++, k++)
            {
                index[k] = w.Samples.Start + j;
                time[k] = index[k] / rateHz;
                group[k] = w.ResetGroup;
                windowOf[k] = wi;
                var dt = time[k] - w.ChargeTimeS;
                step[k] = w.Sees switch
                {
                    ChargeSight.None => 0.0,
                    ChargeSight.Transfer => dt <= 0 ? 0.0 : poleHz is double fp ? -double.ExpM1(-2 * Math.PI * fp * dt) : 1.0,
                    _ => dt / cycle.ReferenceTimeS!.Value,
                };
                exposure[k] = w.Sees == ChargeSight.Ramp ? Math.Max(0, dt) : double.NaN;
            }
        }

        return new SampleGrid(index, time, step, rateHz, group, cycle.GroupCount, windows, windowOf, exposure, cycle.AsTwoWindow());
    }

    /// <summary>
    /// The step response at every sample of the cycle (0 .. <paramref name="pixelSamples"/>-1): each window's samples by
    /// <see cref="FromCycle"/>'s rule, 0 outside the windows (those samples carry no weight).
    /// </summary>
    public static double[] StepAtEverySample(double rateHz, CycleSpec cycle, double? poleHz, int pixelSamples)
    {
        var grid = FromCycle(rateHz, cycle, poleHz);
        var step = new double[pixelSamples];
        for (var i = 0; i < grid.Count; i++)
        {
            step[grid.SampleIndex[i]] = grid.Step[i];
        }

        return step;
    }
}
