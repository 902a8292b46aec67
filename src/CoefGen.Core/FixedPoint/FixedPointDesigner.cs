using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.FixedPoint;

/// <summary>
/// Real weights to a complete <see cref="IntegerDesign"/>: quantised coefficients, gain realisation (shift, or
/// post-multiplier M and shift), output fraction bits, width proof, gain error and noise penalty. Pure.
/// </summary>
public static class FixedPointDesigner
{
    /// <summary>Output rounding may raise the read noise by less than this fraction (1 %).</summary>
    public const double OutputNoiseBudget = 0.01;

    public static IntegerDesign Design(string name, SampleGrid grid, IReadOnlyList<double> h, SampledCovariance r, AdcSpec adc,
        FixedPointSettings settings, int pixelSamples, bool rejectDrift = false,
        Func<IReadOnlyList<double>, double>? noiseVariance = null)
    {
        ArgumentNullException.ThrowIfNull(name);
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(h);
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(adc);
        ArgumentNullException.ThrowIfNull(settings);
        if (grid.SampleIndex[^1] >= pixelSamples)
        {
            throw new ArgumentException("grid and pixel cycle disagree");
        }

        if (settings.SampleBits < adc.Bits)
        {
            throw new ArgumentException("sample width below the ADC bits");
        }

        // Shift mode keeps the gain a pure shift even when the signal samples are not fully settled: the
        // residual settling error then shows up as a (reported) gain error instead of a post-multiplier.
        var powerOfTwo = settings.Normalize == NormalizeMode.Shift;
        var q = Quantiser.Quantise(h, grid, r, settings.CoefBits, powerOfTwo, rejectDrift);
        var c = q.Coefficients;

        // The noise that sets the output fraction bits, the penalty and the predicted output noise: the
        // model's, or the capture's when the design runs on a capture (the refinement above uses the model).
        var variance = noiseVariance ?? r.QuadraticForm;
        var sigmaReal = Math.Sqrt(variance(h)) / Math.Abs(Gain(h.Select(v => v), grid));
        var scaled = c.Select(v => Math.ScaleB(v, -q.P)).ToArray();
        var gainInt = Gain(scaled, grid);
        var sigmaInt = Math.Sqrt(variance(scaled)) / Math.Abs(gainInt);
        var sigmaIntAdu = sigmaInt / adc.LsbV;

        var f = settings.OutputFracBits ?? Math.Min(RecommendedFracBits(sigmaIntAdu), settings.OutputBits - 1);
        long m;
        int shift;
        double gainErrorPpm;
        if (powerOfTwo)
        {
            // The charge windows sum to exactly 2^P (IntegerSumPins), so with settled steps out = acc / 2^(P - F)
            // has gain 2^F per ADU exactly; what is left is reported as the gain error.
            (m, shift) = f <= q.P ? (1L, q.P - f) : (1L << (f - q.P), 0);
            gainErrorPpm = (gainInt - 1) * 1e6;
        }
        else
        {
            (m, shift) = PostMultiplier(c, adc, settings, f, Math.ScaleB(gainInt, q.P));
            gainErrorPpm = ((gainInt * m / Math.ScaleB(1.0, shift - q.P) / Math.ScaleB(1.0, f)) - 1) * 1e6;
        }

        var postBits = m == 1 ? 0 : TwosComplement.RequiredBits(m, m);
        var proof = WidthProver.Prove(c, adc.Bits, adc.Coding, settings, m, shift, postBits);
        var outSigma = sigmaIntAdu * (1 + (gainErrorPpm * 1e-6)) * Math.ScaleB(1.0, f);
        return new IntegerDesign
        {
            Name = name,
            Coefficients = c,
            SampleIndex = grid.SampleIndex,
            PixelSamples = pixelSamples,
            Reset = grid.TwoWindow?.Reset,
            Signal = grid.TwoWindow?.Signal,
            AdcBits = adc.Bits,
            Coding = adc.Coding,
            SampleBits = settings.SampleBits,
            CoefBits = settings.CoefBits,
            ProductBits = settings.CoefBits + settings.SampleBits,
            AccBits = settings.AccBits,
            Accumulator = settings.Accumulator,
            OutputBits = settings.OutputBits,
            OutputFracBits = f,
            Rounding = settings.Rounding,
            Normalize = powerOfTwo ? NormalizeMode.Shift : NormalizeMode.Exact,
            P = q.P,
            PostMultiplier = m,
            Shift = shift,
            PostMultiplierBits = postBits,
            Proof = proof,
            GainErrorPpm = gainErrorPpm,
            NoisePenaltyPercent = 100 * ((sigmaInt / sigmaReal) - 1),
            PredictedNoiseOutputLsb = Math.Sqrt((outSigma * outSigma) + (1.0 / 12)),
            Windows = grid.TwoWindow is null ? grid.Windows : null,
            GroupCount = grid.GroupCount,
            ReadCount = grid.Windows.Max(w => w.Read) + 1,
        };
    }

    /// <summary>
    /// Smallest F with sqrt(sigma^2 + (2^-F)^2 / 12) / sigma - 1 &lt; 1 %: output rounding (LSB_out^2 / 12,
    /// PHYSICS.md §6) then raises the read noise by under 1 %. <paramref name="sigmaAdu"/> in ADU rms.
    /// </summary>
    public static int RecommendedFracBits(double sigmaAdu)
    {
        for (var f = 0; f < 62; f++)
        {
            var lsb = Math.ScaleB(1.0, -f);
            if (Math.Sqrt(1 + (lsb * lsb / (12 * sigmaAdu * sigmaAdu))) - 1 < OutputNoiseBudget)
            {
                return f;
            }
        }

        return 62;
    }

    /// <summary>
    /// M / 2^Shift ~ 2^F / G with G = sum c s (accumulator counts per ADU): M as wide as the post-multiplier
    /// operand and the acc x M register both allow, so the relative gain error is below 2^-(bits-2).
    /// </summary>
    private static (long M, int Shift) PostMultiplier(IReadOnlyList<long> c, AdcSpec adc, FixedPointSettings s, int f, double g)
    {
        var accBits = WidthProver.Prove(c, adc.Bits, adc.Coding, s, 1, 0, 0).Checks.Single(x => x.Name == "accumulator_final").RequiredBits;
        var bits = Math.Max(2, Math.Min(s.PostMultiplierBits, s.PostProductBits - accBits));
        var maxM = (1L << (bits - 1)) - 1;
        var k = Math.ScaleB(1.0, f) / g;
        var shift = Math.Clamp((int)Math.Floor(Math.Log2(maxM / k)), 0, 120);
        var m = (long)Math.Round(Math.ScaleB(k, shift), MidpointRounding.ToEven);
        while (m > maxM && shift > 0)
        {
            shift--;
            m = (long)Math.Round(Math.ScaleB(k, shift), MidpointRounding.ToEven);
        }

        return (Math.Max(1, m), shift);
    }

    private static double Gain(IEnumerable<double> w, SampleGrid grid) => w.Select((v, k) => v * grid.Step[k]).Sum();
}
