using CoefGen.Core.Readout;

namespace CoefGen.Core.Weights;

/// <summary>
/// The weighted samples of one pixel cycle in time order: every window of the cycle (a classic file: the reset
/// window, then the signal window), each sample with its step response s_k and its reset group.
/// Index i of every weight vector refers to entry i here.
/// </summary>
public sealed partial class SampleGrid
{
    /// <summary>Index of each weighted sample within the pixel cycle (strictly increasing).</summary>
    public IReadOnlyList<int> SampleIndex { get; }

    /// <summary>Sample instant t_k = index / rate, seconds from the start of the cycle.</summary>
    public IReadOnlyList<double> TimeS { get; }

    /// <summary>Step response s_k: 0 before the transfer, 1 when settled.</summary>
    public IReadOnlyList<double> Step { get; }

    public int Count => SampleIndex.Count;

    public double RateHz { get; }

    /// <summary>True when every charge-seeing sample has s = 1 exactly and every other sample s = 0.</summary>
    public bool IsSettled
    {
        get
        {
            for (var i = 0; i < Count; i++)
            {
                if (Step[i] != (SightOf(i) == ChargeSight.None ? 0.0 : 1.0))
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
        return FromCycle(d.Adc.RateHz, t.Cycle, t.Step == StepModel.Pole ? d.Noise.FrontEndPoleHz : null);
    }

    /// <summary>
    /// Builds the two-window grid of a reset and a signal window directly (tests, sweeps) through the cycle path.
    /// <paramref name="poleHz"/> null gives the ideal step. A transfer before the end of the reset window makes the
    /// reset window see the step too (s follows the transfer rule in both windows).
    /// </summary>
    public static SampleGrid Create(double rateHz, SampleWindow reset, SampleWindow signal, double transferTimeS, double? poleHz)
    {
        ArgumentNullException.ThrowIfNull(reset);
        ArgumentNullException.ThrowIfNull(signal);
        if (!(rateHz > 0) || reset.Count < 1 || signal.Count < 1 || reset.End > signal.Start || reset.Start < 0)
        {
            throw new ArgumentException("windows must be non-empty, reset before signal, rate > 0");
        }

        var resetSees = (reset.End - 1) / rateHz - transferTimeS <= 0 ? ChargeSight.None : ChargeSight.Transfer;
        return FromCycle(rateHz, new TwoWindowCycle(reset, signal, transferTimeS).ToCycle(resetSees), poleHz);
    }
}
