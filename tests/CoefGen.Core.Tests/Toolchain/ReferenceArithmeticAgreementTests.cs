using System.Numerics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;
using CoefGen.Core.Tests.Emit;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// The toolchain tests' big-integer reference and BitExactModel are two independent implementations of the
/// arithmetic on IntegerDesign; they must agree bit for bit, so every C/HDL comparison against the reference is
/// also a comparison against the model that writes the golden vectors.
/// </summary>
public class ReferenceArithmeticAgreementTests
{
    public static TheoryData<RoundingMode, AccumulatorMode, AdcCoding, bool> ModesWithPostMultiplier()
    {
        var data = new TheoryData<RoundingMode, AccumulatorMode, AdcCoding, bool>();
        foreach (var r in Enum.GetValues<RoundingMode>())
        {
            foreach (var a in Enum.GetValues<AccumulatorMode>())
            {
                foreach (var c in Enum.GetValues<AdcCoding>())
                {
                    data.Add(r, a, c, false);
                    data.Add(r, a, c, true);
                }
            }
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(ModesWithPostMultiplier))]
    public void Reference_and_bit_exact_model_agree_on_a_tight_datapath_where_sums_wrap_clip_and_tie(
        RoundingMode r, AccumulatorMode a, AdcCoding c, bool postMultiplier)
    {
        var d = postMultiplier
            ? CHeaderToolchainTests.Tight(r, a, c, postMultiplier: -3, postMultiplierBits: 3)
            : CHeaderToolchainTests.Tight(r, a, c);
        var cycles = Vectors.Codes(d, 3000, seed: 21);
        AssertAgree(d, cycles);

        // Not vacuous: the 16-bit accumulator overflows, the 10-bit output saturates, and exact ties reach the rounding.
        var results = cycles.Select(cycle => (Exact: ExactSum(d, cycle), Ref: ReferenceArithmetic.Evaluate(d, cycle))).ToList();
        Assert.Contains(results, x => x.Exact != x.Ref.Accumulator);
        Assert.Contains(results, x => x.Ref.OutputSaturated);
        var scale = BigInteger.One << d.Shift;
        Assert.Contains(results, x => BigInteger.Remainder(BigInteger.Abs(x.Ref.Accumulator * d.PostMultiplier), scale) == scale / 2);
        if (a == AccumulatorMode.Saturate)
        {
            Assert.Contains(results, x => x.Ref.AccumulatorClipped);
        }
    }

    [Theory]
    [MemberData(nameof(ModesWithPostMultiplier))]
    public void Reference_and_bit_exact_model_agree_on_wide_datapaths(RoundingMode r, AccumulatorMode a, AdcCoding c, bool postMultiplier)
    {
        // 40-bit coefficients into a 58-bit accumulator, and the widest the model allows: 32 x 16 into 64 bits
        // with a 32-bit post-multiplier (acc * M needs 96 bits of the model's Int128).
        var (reset, signal) = TestDesigns.RandomWeights(3, 5, 36, seed: 3);
        var wide = TestDesigns.Make("wide", reset, signal, p: 36, fracBits: 4, pixelSamples: 10, resetStart: 0, signalStart: 4,
            adcBits: 14, coefBits: 40, accBits: 58, outputBits: 30, rounding: r, accumulator: a, coding: c,
            postMultiplier: postMultiplier ? 1_000_003 : 1, postMultiplierBits: postMultiplier ? 21 : 0);
        AssertAgree(wide, Vectors.Codes(wide, 1000, seed: 5));

        var (r2, s2) = TestDesigns.RandomWeights(6, 6, 29, seed: 9);
        var widest = TestDesigns.Make("widest", r2, s2, p: 29, fracBits: 8, pixelSamples: 14, resetStart: 1, signalStart: 8,
            adcBits: 16, coefBits: 32, accBits: 64, outputBits: 40, rounding: r, accumulator: a, coding: c,
            postMultiplier: postMultiplier ? -2_147_483_647 : 1, postMultiplierBits: postMultiplier ? 32 : 0);
        AssertAgree(widest, Vectors.Codes(widest, 1000, seed: 6));
    }

    [Property(MaxTest = 200)]
    public Property Reference_and_bit_exact_model_agree_on_random_datapaths() =>
        Prop.ForAll(Gen.Choose(0, int.MaxValue).ToArbitrary(), s =>
        {
            var d = RandomDesign(new Random(s));
            foreach (var cycle in Vectors.Codes(d, 40, seed: s))
            {
                var model = BitExactModel.RunCycle(d, cycle);
                var reference = ReferenceArithmetic.Evaluate(d, cycle);
                if (model.Accumulator != reference.Accumulator || model.Output != reference.Output
                    || model.AccumulatorClipped != reference.AccumulatorClipped || model.OutputSaturated != reference.OutputSaturated)
                {
                    return false;
                }
            }

            return true;
        });

    /// <summary>Random widths, window sizes, modes and post-multiplier within the model's documented limits (coefficients and samples up to 32 bits, accumulator up to 64).</summary>
    private static IntegerDesign RandomDesign(Random rng)
    {
        var adcBits = rng.Next(2, 17);
        var p = rng.Next(1, 30);
        var resetCount = rng.Next(1, 9);
        var signalCount = rng.Next(1, 9);
        var (reset, signal) = TestDesigns.RandomWeights(resetCount, signalCount, p, rng.Next());
        var coefBits = Math.Max(2, reset.Concat(signal).Max(v => TwosComplementBits(v)));
        var accBits = rng.Next(Math.Min(64, coefBits + adcBits) / 2 + 1, 65);
        var outputBits = rng.Next(2, 48);
        var fracBits = rng.Next(0, Math.Min(p, outputBits - 1) + 1);
        var pmBits = rng.Next(2) == 0 ? 0 : rng.Next(2, 33);
        var pm = pmBits == 0 ? 1 : rng.NextInt64(-(1L << (pmBits - 1)), 1L << (pmBits - 1));
        var gap = rng.Next(0, 4);
        var resetStart = rng.Next(0, 3);
        var signalStart = resetStart + resetCount + gap;
        return TestDesigns.Make("random", reset, signal, p, fracBits, pixelSamples: signalStart + signalCount + rng.Next(0, 3),
            resetStart, signalStart, adcBits, coefBits, accBits, outputBits,
            rounding: Enum.GetValues<RoundingMode>()[rng.Next(3)],
            accumulator: Enum.GetValues<AccumulatorMode>()[rng.Next(2)],
            coding: Enum.GetValues<AdcCoding>()[rng.Next(2)],
            postMultiplier: pm, postMultiplierBits: pmBits);
    }

    private static int TwosComplementBits(long v)
    {
        var b = 1;
        while (v < -(1L << (b - 1)) || v > (1L << (b - 1)) - 1)
        {
            b++;
        }

        return b;
    }

    private static void AssertAgree(IntegerDesign d, List<long[]> cycles)
    {
        foreach (var cycle in cycles)
        {
            var model = BitExactModel.RunCycle(d, cycle);
            var reference = ReferenceArithmetic.Evaluate(d, cycle);
            Assert.Equal(reference.Accumulator, (BigInteger)model.Accumulator);
            Assert.Equal(reference.Output, (BigInteger)model.Output);
            Assert.Equal(reference.AccumulatorClipped, model.AccumulatorClipped);
            Assert.Equal(reference.OutputSaturated, model.OutputSaturated);
        }
    }

    private static BigInteger ExactSum(IntegerDesign d, long[] cycle)
    {
        var offset = d.Coding == AdcCoding.OffsetBinary ? 1L << (d.AdcBits - 1) : 0;
        return d.Coefficients.Select((k, i) => (BigInteger)k * (cycle[d.SampleIndex[i]] - offset)).Aggregate(BigInteger.Zero, (s, v) => s + v);
    }
}
