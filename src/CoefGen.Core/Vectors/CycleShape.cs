using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Vectors;

/// <summary>Builds the codes of one pixel cycle: levels in ADU, the ideal ADC's quantisation and clipping, the readout's coding.</summary>
internal sealed class CycleShape(IntegerDesign design, AdcSpec adc, double baselineAdu, IReadOnlyList<double> step)
{
    private readonly bool[] _weighted = WeightedMask(design);

    public IntegerDesign Design => design;

    /// <summary>Bottom and top rail as the ADC writes them.</summary>
    public long Low => ToCode(adc.MinCode);

    public long High => ToCode(adc.MaxCode);

    public long[] Fill(Func<int, long> code) => [.. Enumerable.Range(0, design.PixelSamples).Select(code)];

    /// <summary>Noise-free cycle with charge q (ADU).</summary>
    public long[] Clean(double chargeAdu) => Fill(k => Quantise(Level(k, chargeAdu)));

    /// <summary>
    /// Reset window at one code, signal window at another, the rest at the baseline. For a general cycle: samples with
    /// a negative coefficient at the first code, with a positive one at the second (the same extreme for two windows).
    /// </summary>
    public long[] Windows(long reset, long signal)
    {
        var baseline = Quantise(baselineAdu);
        if (design.Windows is not null)
        {
            var codes = Fill(_ => baseline);
            for (var i = 0; i < design.SampleIndex.Count; i++)
            {
                codes[design.SampleIndex[i]] = design.Coefficients[i] < 0 ? reset : signal;
            }

            return codes;
        }

        return Fill(k => design.Reset!.Contains(k) ? reset : design.Signal!.Contains(k) ? signal : baseline);
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
            codes[design.SampleIndex[i]] = weightedCodes[i];
        }

        return codes;
    }

    /// <summary>Charge q plus analog noise (V, one per weighted sample) plus the ADC's own white noise, then quantised.</summary>
    public long[] Noisy(double chargeAdu, double[] analogNoiseV, Xoshiro256StarStar rng)
    {
        var codes = Clean(chargeAdu);
        for (var i = 0; i < design.SampleIndex.Count; i++)
        {
            var k = design.SampleIndex[i];
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

    private static bool[] WeightedMask(IntegerDesign d)
    {
        var mask = new bool[d.PixelSamples];
        foreach (var k in d.SampleIndex)
        {
            mask[k] = true;
        }

        return mask;
    }
}
