using System.Numerics;
using CoefGen.Core.Emit;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Tests.Emit;

/// <summary>Hand-built integer designs (the quantiser is another stage; these only need to be self-consistent).</summary>
public static class TestDesigns
{
    public static readonly Provenance Provenance =
        new("coefgen", "0.1.0", "red_ch0.toml", new string('a', 64), "optimal", 3.25, 1.0625);

    /// <summary>The fixed design behind the golden files: 4 reset and 4 signal samples, P = 10, shift 8.</summary>
    public static IntegerDesign Fixed() => Make(
        "Red Ch0", [-150, -362, -362, -150], [200, 312, 312, 200], p: 10, fracBits: 2, pixelSamples: 16, resetStart: 2, signalStart: 9);

    /// <summary>
    /// A design with the given arithmetic; reset weights are the negated signal weights (so they sum to
    /// zero), the signal weights sum to 2^p. Widths default to a comfortable 14-bit ADC datapath.
    /// </summary>
    public static IntegerDesign Make(
        string name, long[] reset, long[] signal, int p, int fracBits, int pixelSamples, int resetStart, int signalStart,
        int adcBits = 14, int coefBits = 18, int accBits = 40, int outputBits = 24, RoundingMode rounding = RoundingMode.HalfUp,
        AccumulatorMode accumulator = AccumulatorMode.Wrap, AdcCoding coding = AdcCoding.TwosComplement,
        long postMultiplier = 1, int postMultiplierBits = 0)
    {
        var coefs = reset.Concat(signal).ToArray();
        var index = Enumerable.Range(resetStart, reset.Length).Concat(Enumerable.Range(signalStart, signal.Length)).ToArray();
        var shift = p - fracBits + (postMultiplierBits > 0 ? postMultiplierBits - 1 : 0);
        var proof = new WidthProof
        {
            Checks =
            [
                new WidthCheck("coefficient", coefs.Min(), coefs.Max(), Bits(coefs.Min(), coefs.Max()), coefBits, true, null),
                new WidthCheck("accumulator_final", -(BigInteger.One << 30), BigInteger.One << 30, 32, accBits, accumulator == AccumulatorMode.Wrap, null),
            ],
            Advice = [],
        };
        return new IntegerDesign
        {
            Name = name,
            Coefficients = coefs,
            SampleIndex = index,
            PixelSamples = pixelSamples,
            Reset = new SampleWindow(resetStart, reset.Length),
            Signal = new SampleWindow(signalStart, signal.Length),
            AdcBits = adcBits,
            Coding = coding,
            SampleBits = adcBits,
            CoefBits = coefBits,
            ProductBits = coefBits + adcBits,
            AccBits = accBits,
            Accumulator = accumulator,
            OutputBits = outputBits,
            OutputFracBits = fracBits,
            Rounding = rounding,
            Normalize = postMultiplierBits > 0 ? NormalizeMode.Exact : NormalizeMode.Shift,
            P = p,
            PostMultiplier = postMultiplier,
            Shift = shift,
            PostMultiplierBits = postMultiplierBits,
            Proof = proof,
            GainErrorPpm = 0.0,
            NoisePenaltyPercent = 0.125,
            PredictedNoiseOutputLsb = 4.5,
        };
    }

    /// <summary>Random signal weights summing to 2^p (last one repairs the sum), reset weights summing to -2^p.</summary>
    public static (long[] Reset, long[] Signal) RandomWeights(int resetCount, int signalCount, int p, int seed)
    {
        var rng = new Random(seed);
        static long[] Spread(Random rng, int n, long total)
        {
            var w = new long[n];
            var mean = total / n;
            for (var i = 0; i < n - 1; i++)
            {
                var spread = Math.Max(1, mean / 2);
                w[i] = mean + rng.NextInt64(-spread, spread + 1);
            }

            w[n - 1] = total - w.Take(n - 1).Sum();
            return w;
        }

        var total = 1L << p;
        return (Spread(rng, resetCount, total).Select(v => -v).ToArray(), Spread(rng, signalCount, total));
    }

    private static int Bits(long min, long max)
    {
        var b = 1;
        while (min < -(1L << (b - 1)) || max > (1L << (b - 1)) - 1)
        {
            b++;
        }

        return b;
    }
}
