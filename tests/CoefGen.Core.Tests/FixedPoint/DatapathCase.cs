using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;
using FsCheck;
using FsCheck.Fluent;

namespace CoefGen.Core.Tests.FixedPoint;

/// <summary>A whole design (random weights, widths that can overflow, every mode) plus input patterns that hit the rails.</summary>
internal sealed record DatapathCase(DesignCase Weights, int AdcBits, AdcCoding Coding, int AccSlack, AccumulatorMode Acc, RoundingMode Rounding,
    NormalizeMode Normalize, int OutputBits, long[][] Inputs)
{
    public IntegerDesign Build()
    {
        var g = Weights.Grid;
        var coef = Math.Min(Weights.CoefBits, 25);
        var s = FixedPointFixtures.Settings(coef, coef + AdcBits + AccSlack, Acc, Rounding, Normalize, AdcBits, null, OutputBits);
        return FixedPointFixtures.Design(g, Weights.Weights, Weights.Covariance(g), s, FixedPointFixtures.Adc(AdcBits, Coding));
    }

    /// <summary>Signed samples mapped to the ADC's codes.</summary>
    public long[] Codes(int pattern) => [.. Inputs[pattern].Select(x => BitExactModel.ToCode(x, AdcBits, Coding))];

    public override string ToString() => $"{Weights}, adc {AdcBits} {Coding}, acc slack {AccSlack} {Acc}, {Rounding}, {Normalize}, out {OutputBits}";

    public static Arbitrary<DatapathCase> Arbitrary()
    {
        var gen =
            from w in DesignCase.Arbitrary().Generator
            from adc in Gen.Elements(4, 8, 12, 16)
            from coding in Gen.Elements(AdcCoding.TwosComplement, AdcCoding.OffsetBinary)
            from slack in Gen.Elements(0, 1, 2, 3, 5, 8, 16)
            from acc in Gen.Elements(AccumulatorMode.Wrap, AccumulatorMode.Saturate)
            from rounding in Gen.Elements(RoundingMode.HalfUp, RoundingMode.HalfEven, RoundingMode.Truncate)
            from normalize in Gen.Elements(NormalizeMode.Shift, NormalizeMode.Exact)
            from outBits in Gen.Elements(6, 12, 32, 64)
            from inputs in Gen.ArrayOf(Samples(adc, w.ResetCount + w.SignalCount), 12)
            select new DatapathCase(w, adc, coding, slack, acc, rounding, normalize, outBits, inputs);
        return gen.ToArbitrary();
    }

    /// <summary>Samples at the rails, near zero, or anywhere; whole patterns at one rail too.</summary>
    private static Gen<long[]> Samples(int bits, int n)
    {
        var max = (1 << (bits - 1)) - 1;
        var min = -max - 1;
        var one = Gen.Frequency((3, Gen.Elements(min, max)), (1, Gen.Elements(-1, 0, 1)), (3, Gen.Choose(min, max)));
        return Gen.Frequency(
            (6, Gen.ArrayOf(one.Select(v => (long)v), n)),
            (1, Gen.Elements(min, max).Select(v => Enumerable.Repeat((long)v, n).ToArray())));
    }
}
