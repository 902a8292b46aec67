using CoefGen.Core.Readout;

namespace CoefGen.Core.Weights;

/// <summary>
/// The weighted samples of one pixel cycle in time order: every window of the cycle (a classic file: the reset
/// window, then the signal window), each sample with its step response s_k and its reset group.
/// Index i of every weight vector refers to entry i here.
/// </summary>
public sealed partial class SampleGrid
{
    private SampleGrid(int[] sampleIndex, double[] timeS, double[] step, int resetCount, double rateHz)
    {
        SampleIndex = sampleIndex;
        TimeS = timeS;
        Step = step;
        ResetCount = resetCount;
        RateHz = rateHz;
        Group = new int[sampleIndex.Length];
        GroupCount = 1;
        Windows = [new GridWindow(0, resetCount, ChargeSight.None, 0, 0), new GridWindow(resetCount, sampleIndex.Length - resetCount, ChargeSight.Transfer, 0, 0)];
    }

    /// <summary>Index of each weighted sample within the pixel cycle (strictly increasing).</summary>
    public IReadOnlyList<int> SampleIndex { get; }

    /// <summary>Sample instant t_k = index / rate, seconds from the start of the cycle.</summary>
    public IReadOnlyList<double> TimeS { get; }

    /// <summary>Step response s_k: 0 before the transfer, 1 when settled.</summary>
    public IReadOnlyList<double> Step { get; }

    /// <summary>Number of reset-window samples (they come first); for a general cycle, the samples of its first window.</summary>
    public int ResetCount { get; }

    public int SignalCount => SampleIndex.Count - ResetCount;

    public int Count => SampleIndex.Count;

    public double RateHz { get; }

    /// <summary>Classic two-window grids only: sample i lies in the signal window.</summary>
    public bool IsSignal(int i) => i >= ResetCount;

    /// <summary>True when every signal sample has s = 1 exactly and every reset sample s = 0.</summary>
    public bool IsSettled
    {
        get
        {
            for (var i = 0; i < Count; i++)
            {
                if (Step[i] != (IsSignal(i) ? 1.0 : 0.0))
                {
                    return false;
                }
            }

            return true;
        }
    }

    /// <summary>Builds the grid from a validated description.</summary>
    public static SampleGrid FromDescription(ReadoutDescription d)
    {
        ArgumentNullException.ThrowIfNull(d);
        var t = d.Timing;
        if (t.Cycle is not null)
        {
            return FromCycle(d.Adc.RateHz, t.Cycle, t.Step == StepModel.Pole ? d.Noise.FrontEndPoleHz : null);
        }

        double? pole = t.Step == StepModel.Pole ? d.Noise.FrontEndPoleHz : null;
        return Create(d.Adc.RateHz, t.Reset, t.Signal, t.TransferTimeS, pole);
    }

    /// <summary>Builds a grid directly (tests, sweeps). <paramref name="poleHz"/> null gives the ideal step.</summary>
    public static SampleGrid Create(double rateHz, SampleWindow reset, SampleWindow signal, double transferTimeS, double? poleHz)
    {
        ArgumentNullException.ThrowIfNull(reset);
        ArgumentNullException.ThrowIfNull(signal);
        if (!(rateHz > 0) || reset.Count < 1 || signal.Count < 1 || reset.End > signal.Start || reset.Start < 0)
        {
            throw new ArgumentException("windows must be non-empty, reset before signal, rate > 0");
        }

        var n = reset.Count + signal.Count;
        var index = new int[n];
        var time = new double[n];
        var step = new double[n];
        for (var i = 0; i < n; i++)
        {
            index[i] = i < reset.Count ? reset.Start + i : signal.Start + (i - reset.Count);
            time[i] = index[i] / rateHz;
            var dt = time[i] - transferTimeS;
            step[i] = dt <= 0 ? 0.0 : poleHz is double fp ? -double.ExpM1(-2 * Math.PI * fp * dt) : 1.0;
        }

        return new SampleGrid(index, time, step, reset.Count, rateHz);
    }
}
