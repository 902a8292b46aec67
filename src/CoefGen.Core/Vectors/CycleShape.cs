using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Vectors;

/// <summary>Builds the codes of one pixel cycle: levels in ADU, the ideal ADC's quantisation and clipping, the readout's coding.</summary>
/// <param name="pixelSamples">Samples in the cycle.</param>
/// <param name="sampleIndex">Cycle sample of each weight, time order.</param>
/// <param name="weights">The integer weight of each of them (only its sign is used, to put the window extremes).</param>
/// <param name="twoWindow">The classic reset and signal windows, or null for a general cycle.</param>
/// <param name="adc">The ADC.</param>
/// <param name="baselineAdu">DC level.</param>
/// <param name="step">Step response at every cycle sample.</param>
internal sealed class CycleShape(int pixelSamples, IReadOnlyList<int> sampleIndex, IReadOnlyList<long> weights, (SampleWindow Reset, SampleWindow Signal)? twoWindow,
    AdcSpec adc, double baselineAdu, IReadOnlyList<double> step)
{
    private readonly bool[] _weighted = WeightedMask(pixelSamples, sampleIndex);

    /// <summary>The shape of a one-stage integer design's cycle.</summary>
    public static CycleShape Of(IntegerDesign design, AdcSpec adc, double baselineAdu, IReadOnlyList<double> step) =>
        new(design.PixelSamples, design.SampleIndex, design.Coefficients, design.Windows is null ? (design.Reset!, design.Signal!) : null, adc, baselineAdu, step);

    /// <summary>Bottom and top rail as the ADC writes them.</summary>
    public long Low => ToCode(adc.MinCode);

    public long High => ToCode(adc.MaxCode);

    public long[] Fill(Func<int, long> code) => [.. Enumerable.Range(0, pixelSamples).Select(code)];

    /// <summary>Noise-free cycle with charge q (ADU).</summary>
    public long[] Clean(double chargeAdu) => Fill(k => Quantise(Level(k, chargeAdu)));

    /// <summary>
    /// Reset window at one code, signal window at another, the rest at the baseline. For a general cycle: samples with
    /// a negative coefficient at the first code, with a positive one at the second (the same extreme for two windows).
    /// </summary>
    public long[] Windows(long reset, long signal)
    {
        var baseline = Quantise(baselineAdu);
        if (twoWindow is not var (resetWindow, signalWindow))
        {
            var codes = Fill(_ => baseline);
            for (var i = 0; i < sampleIndex.Count; i++)
            {
                codes[sampleIndex[i]] = weights[i] < 0 ? reset : signal;
            }

            return codes;
        }

        return Fill(k => resetWindow.Contains(k) ? reset : signalWindow.Contains(k) ? signal : baseline);
    }

    /// <summary>Weighted samples at the baseline, the others alternating between the rails.</summary>
    public long[] OutsideRails()
    {
        var baseline = Quantise(baselineAdu);
        return Fill(k => _weighted[k] ? baseline : k % 2 == 0 ? Low : High);
    }

    /// <summary>The given codes at the weighted samples (time order), the baseline elsewhere.</summary>
    public long[] WithWeighted(IReadOnlyList<long> weightedCodes)
    {
        var codes = Clean(0.0);
        for (var i = 0; i < weightedCodes.Count; i++)
        {
            codes[sampleIndex[i]] = weightedCodes[i];
        }

        return codes;
    }

    /// <summary>Charge q plus analog noise (V, one per weighted sample) plus the ADC's own white noise, then quantised.</summary>
    public long[] Noisy(double chargeAdu, double[] analogNoiseV, Xoshiro256StarStar rng)
    {
        var codes = Clean(chargeAdu);
        for (var i = 0; i < sampleIndex.Count; i++)
        {
            var k = sampleIndex[i];
            var adcNoise = adc.NoiseLsb > 0 ? adc.NoiseLsb * rng.NextGaussian() : 0.0;
            codes[k] = Quantise(Level(k, chargeAdu) + (analogNoiseV[i] / adc.LsbV) + adcNoise);
        }

        return codes;
    }

    private double Level(int k, double chargeAdu) => baselineAdu + (chargeAdu * step[k]);

    /// <summary>Nearest code (ties up), clipped to the rails.</summary>
    private long Quantise(double adu)
    {
        var v = Math.Floor(adu + 0.5);
        var signed = v <= adc.MinCode ? adc.MinCode : v >= adc.MaxCode ? adc.MaxCode : (long)v;
        return ToCode(signed);
    }

    private long ToCode(long signed) => BitExactModel.ToCode(signed, adc.Bits, adc.Coding);

    private static bool[] WeightedMask(int pixelSamples, IReadOnlyList<int> sampleIndex)
    {
        var mask = new bool[pixelSamples];
        foreach (var k in sampleIndex)
        {
            mask[k] = true;
        }

        return mask;
    }
}
