using System.Numerics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Tests.FixedPoint;

/// <summary>Small builders shared by the fixed-point tests: grids, covariances, designs and a BigInteger reference.</summary>
internal static class FixedPointFixtures
{
    public const double LsbV = 2.0 / 65536;

    public static AdcSpec Adc(int bits = 16, AdcCoding coding = AdcCoding.TwosComplement) => new(1e6, bits, 2.0, coding, 0.5);

    /// <summary>Reset window at 0..n-1, signal window after a gap of two samples; ideal step (settled).</summary>
    public static SampleGrid Grid(int resetCount, int signalCount) =>
        SampleGrid.Create(1e6, new SampleWindow(0, resetCount), new SampleWindow(resetCount + 2, signalCount), (resetCount + 1) / 1e6, null);

    /// <summary>White noise only (sigma^2 per sample on the diagonal).</summary>
    public static SampledCovariance White(SampleGrid g, double variance = 1e-8) => new(g.SampleIndex, [], variance);

    /// <summary>AR(1)-like analog noise C(k) = a^2 rho^k plus a white diagonal.</summary>
    public static SampledCovariance Ar1(SampleGrid g, double rho, double analog, double digital)
    {
        var maxLag = g.SampleIndex[^1] - g.SampleIndex[0];
        var lag = Enumerable.Range(0, maxLag + 1).Select(k => analog * Math.Pow(rho, k)).ToArray();
        return new SampledCovariance(g.SampleIndex, [new CovarianceComponent("ar1", lag)], digital);
    }

    /// <summary>Differential averager: -1/N over the reset window, +1/N over the signal window.</summary>
    public static double[] Boxcar(SampleGrid g) =>
        [.. Enumerable.Range(0, g.Count).Select(k => (g.WindowOf(k) == 1) ? 1.0 / g.Windows[1].Count : -1.0 / g.Windows[0].Count)];

    public static FixedPointSettings Settings(int coefBits = 18, int accBits = 48, AccumulatorMode acc = AccumulatorMode.Wrap,
        RoundingMode rounding = RoundingMode.HalfUp, NormalizeMode normalize = NormalizeMode.Shift, int sampleBits = 16, int? frac = null, int outputBits = 32) => new()
    {
        TargetName = "test",
        CoefBits = coefBits,
        SampleBits = sampleBits,
        AccBits = accBits,
        Accumulator = acc,
        OutputBits = outputBits,
        OutputFracBits = frac,
        Rounding = rounding,
        Normalize = normalize,
        PostMultiplierBits = 18,
        PostProductBits = 64,
        MaxCoefficients = 1 << 16,
    };

    public static IntegerDesign Design(SampleGrid g, double[] h, SampledCovariance r, FixedPointSettings s, AdcSpec? adc = null)
    {
        var a = adc ?? Adc(s.SampleBits);
        return FixedPointDesigner.Design("t", g, h, r, a, s, g.SampleIndex[^1] + 1);
    }

    /// <summary>Independent reference of the datapath in BigInteger, written from the IntegerDesign doc comment.</summary>
    public static (BigInteger Acc, BigInteger Out, BigInteger TrueSum) Reference(IntegerDesign d, IReadOnlyList<long> codes)
    {
        BigInteger acc = 0, sum = 0;
        var modulus = BigInteger.Pow(2, d.AccBits);
        var top = BigInteger.Pow(2, d.AccBits - 1);
        for (var k = 0; k < codes.Count; k++)
        {
            BigInteger x = d.Coding == AdcCoding.OffsetBinary ? codes[k] - (1L << (d.AdcBits - 1)) : codes[k];
            sum += d.Coefficients[k] * x;
            acc += d.Coefficients[k] * x;
            if (d.Accumulator == AccumulatorMode.Wrap)
            {
                acc = ((acc % modulus) + modulus) % modulus;
                if (acc >= top)
                {
                    acc -= modulus;
                }
            }
            else
            {
                acc = BigInteger.Min(top - 1, BigInteger.Max(-top, acc));
            }
        }

        var m = acc * d.PostMultiplier;
        var div = BigInteger.Pow(2, d.Shift);
        var floor = FloorDiv(m, div);
        BigInteger o = d.Rounding switch
        {
            RoundingMode.Truncate => floor,
            RoundingMode.HalfUp => FloorDiv(m + (div / 2), div),
            _ => HalfEven(m, div, floor),
        };
        if (d.Shift == 0)
        {
            o = m;
        }

        var oTop = BigInteger.Pow(2, d.OutputBits - 1);
        o = BigInteger.Min(oTop - 1, BigInteger.Max(-oTop, o));
        return (acc, o, sum);
    }

    private static BigInteger HalfEven(BigInteger m, BigInteger div, BigInteger floor)
    {
        var twiceRem = 2 * (m - (floor * div));
        return twiceRem > div || (twiceRem == div && !floor.IsEven) ? floor + 1 : floor;
    }

    private static BigInteger FloorDiv(BigInteger a, BigInteger b)
    {
        var q = BigInteger.DivRem(a, b, out var r);
        return r.Sign < 0 ? q - 1 : q;
    }
}
