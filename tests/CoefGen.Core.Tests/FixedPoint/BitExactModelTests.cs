using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace CoefGen.Core.Tests.FixedPoint;

public class BitExactModelTests
{
    [Property(MaxTest = 120)]
    public Property Bit_exact_model_equals_a_big_integer_reference_for_every_mode_and_rail_input() =>
        Prop.ForAll(DatapathCase.Arbitrary(), dc =>
        {
            var d = dc.Build();
            for (var p = 0; p < dc.Inputs.Length; p++)
            {
                var codes = dc.Codes(p);
                var got = BitExactModel.Run(d, codes);
                var (acc, output, _) = FixedPointFixtures.Reference(d, codes);
                if (got.Accumulator != acc || got.Output != output)
                {
                    return false;
                }
            }

            return true;
        });

    [Fact]
    public void A_wrapping_4_bit_accumulator_gets_6_plus_5_minus_7_right_where_a_saturating_one_gives_0()
    {
        // PHYSICS.md §6: 6 + 5 = 11 wraps to -5, -5 - 7 = -12 wraps to 4 (the true sum); saturating clips 11 to 7, 7 - 7 = 0.
        long[] codes = [6, 5, 7];
        Assert.Equal(4, BitExactModel.Run(Manual([1, 1, -1], 4, AccumulatorMode.Wrap), codes).Accumulator);
        var sat = BitExactModel.Run(Manual([1, 1, -1], 4, AccumulatorMode.Saturate), codes);
        Assert.Equal(0, sat.Accumulator);
        Assert.True(sat.AccumulatorClipped);
    }

    [Theory]
    [InlineData(RoundingMode.HalfUp, -5, 1, -2)]
    [InlineData(RoundingMode.HalfUp, 5, 1, 3)]
    [InlineData(RoundingMode.HalfEven, 5, 1, 2)]
    [InlineData(RoundingMode.HalfEven, 7, 1, 4)]
    [InlineData(RoundingMode.HalfEven, -5, 1, -2)]
    [InlineData(RoundingMode.Truncate, -5, 1, -3)]
    [InlineData(RoundingMode.Truncate, 5, 2, 1)]
    public void Rounding_shift_follows_its_definition(RoundingMode mode, long value, int shift, long expected)
    {
        // Half-up (v + 2^(S-1)) >> S sends -2.5 to -2 (TOOLCHAIN.md, signed shift notes); truncate is floor.
        Assert.Equal((Int128)expected, BitExactModel.RoundShift(value, shift, mode));
    }

    [Fact]
    public void Whole_cycle_convenience_picks_the_weighted_samples()
    {
        var d = Manual([-1, 1], 8, AccumulatorMode.Wrap) with { SampleIndex = [1, 3], PixelSamples = 5 };
        Assert.Equal(30, BitExactModel.RunCycle(d, [99, 10, 99, 40, 99]).Output);
    }

    [Fact]
    public void Offset_binary_codes_are_centred_by_flipping_the_msb()
    {
        Assert.Equal(-128, BitExactModel.ToSample(0, 8, AdcCoding.OffsetBinary));
        Assert.Equal(127, BitExactModel.ToSample(255, 8, AdcCoding.OffsetBinary));
        Assert.Throws<ArgumentOutOfRangeException>(() => BitExactModel.ToSample(-1, 8, AdcCoding.OffsetBinary));
    }

    internal static IntegerDesign Manual(long[] c, int accBits, AccumulatorMode mode) => new()
    {
        Name = "manual",
        Coefficients = c,
        SampleIndex = [.. Enumerable.Range(0, c.Length)],
        PixelSamples = c.Length,
        Reset = new SampleWindow(0, 1),
        Signal = new SampleWindow(1, c.Length - 1),
        AdcBits = 8,
        Coding = AdcCoding.TwosComplement,
        SampleBits = 8,
        CoefBits = 4,
        ProductBits = 12,
        AccBits = accBits,
        Accumulator = mode,
        OutputBits = 16,
        OutputFracBits = 0,
        Rounding = RoundingMode.HalfUp,
        Normalize = NormalizeMode.Shift,
        P = 0,
        PostMultiplier = 1,
        Shift = 0,
        PostMultiplierBits = 0,
        Proof = new WidthProof { Checks = [], Advice = [] },
        GainErrorPpm = 0,
        NoisePenaltyPercent = 0,
        PredictedNoiseOutputLsb = 0,
    };
}
