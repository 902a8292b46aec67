using System.Numerics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Tests.Vectors;

/// <summary>How a wrong datapath differs from the design it claims to implement.</summary>
public enum Mutation
{
    None,
    HalfUpRounding,
    HalfEvenRounding,
    FloorTruncation,
    TowardZeroTruncation,
    NoOffsetBinaryFlip,
    OutputWraps,
    AccumulatorWraps,
    CoefficientPlusOne,
}

/// <summary>
/// A test-only datapath written from the arithmetic documented on <see cref="IntegerDesign"/> (BigInteger,
/// independent of BitExactModel) that can be built wrong in one way: the fake DUT whose dump `verify` must reject.
/// </summary>
public sealed record MutantDatapath(IntegerDesign Design, Mutation Mutation, int CoefficientIndex = 0)
{
    public (long Output, long Accumulator) Run(IReadOnlyList<long> cycleCodes)
    {
        var d = Design;
        var accMin = -(BigInteger.One << (d.AccBits - 1));
        var accMax = -accMin - 1;
        BigInteger acc = 0;
        for (var k = 0; k < d.Coefficients.Count; k++)
        {
            BigInteger x = cycleCodes[d.SampleIndex[k]];
            if (d.Coding == AdcCoding.OffsetBinary)
            {
                // Correct: code - 2^(B-1) (the MSB flipped). Wrong: the code's bits read as two's complement unflipped.
                x = Mutation == Mutation.NoOffsetBinaryFlip ? Wrap(x, d.AdcBits) : x - (BigInteger.One << (d.AdcBits - 1));
            }

            var c = d.Coefficients[k] + (Mutation == Mutation.CoefficientPlusOne && k == CoefficientIndex ? 1 : 0);
            acc += c * x;
            acc = d.Accumulator == AccumulatorMode.Saturate && Mutation != Mutation.AccumulatorWraps
                ? BigInteger.Clamp(acc, accMin, accMax)
                : Wrap(acc, d.AccBits);
        }

        var q = Round(acc * d.PostMultiplier, d.Shift);
        var outMin = -(BigInteger.One << (d.OutputBits - 1));
        var output = Mutation == Mutation.OutputWraps ? Wrap(q, d.OutputBits) : BigInteger.Clamp(q, outMin, -outMin - 1);
        return ((long)output, (long)acc);
    }

    private BigInteger Round(BigInteger v, int shift)
    {
        if (shift == 0)
        {
            return v;
        }

        var div = BigInteger.One << shift;
        var floor = BigInteger.Divide(v - (v.Sign < 0 ? div - 1 : 0), div);   // floor for either sign
        var rem = v - (floor * div);                                         // 0 <= rem < div
        var half = div / 2;
        var mode = Mutation switch
        {
            Mutation.HalfUpRounding => RoundingMode.HalfUp,
            Mutation.HalfEvenRounding => RoundingMode.HalfEven,
            Mutation.FloorTruncation => RoundingMode.Truncate,
            _ => Design.Rounding,
        };
        if (Mutation == Mutation.TowardZeroTruncation)
        {
            return BigInteger.Divide(v, div);   // C-style division: toward zero
        }

        return mode switch
        {
            RoundingMode.HalfUp => rem >= half ? floor + 1 : floor,
            RoundingMode.HalfEven => rem > half || (rem == half && !floor.IsEven) ? floor + 1 : floor,
            _ => floor,
        };
    }

    private static BigInteger Wrap(BigInteger v, int bits) => Toolchain.ReferenceArithmetic.Wrap(v, bits);
}
