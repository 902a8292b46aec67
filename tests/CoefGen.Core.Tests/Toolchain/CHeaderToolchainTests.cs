using System.Numerics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;
using CoefGen.Core.Tests.Emit;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>The C header compiles strictly as C99 and C++17, and its _apply equals the big-integer reference.</summary>
public class CHeaderToolchainTests
{
    public static TheoryData<RoundingMode, AccumulatorMode, AdcCoding> Modes()
    {
        var data = new TheoryData<RoundingMode, AccumulatorMode, AdcCoding>();
        foreach (var r in Enum.GetValues<RoundingMode>())
        {
            foreach (var a in Enum.GetValues<AccumulatorMode>())
            {
                foreach (var c in Enum.GetValues<AdcCoding>())
                {
                    data.Add(r, a, c);
                }
            }
        }

        return data;
    }

    /// <summary>A deliberately tight datapath: a 16-bit accumulator and 10-bit output so extremes wrap, saturate and clip; shift 4 so ties are common.</summary>
    public static IntegerDesign Tight(RoundingMode r, AccumulatorMode a, AdcCoding c, long postMultiplier = 1, int postMultiplierBits = 0, int coefBits = 18)
    {
        var (reset, signal) = TestDesigns.RandomWeights(4, 4, 6, seed: 7);
        return TestDesigns.Make("tight", reset, signal, p: 6, fracBits: 2, pixelSamples: 12, resetStart: 1, signalStart: 7,
            adcBits: 12, coefBits: coefBits, accBits: 16, outputBits: 10, rounding: r, accumulator: a, coding: c,
            postMultiplier: postMultiplier, postMultiplierBits: postMultiplierBits);
    }

    [Theory]
    [MemberData(nameof(Modes))]
    public void C_apply_matches_the_reference_for_every_rounding_accumulator_and_coding(RoundingMode r, AccumulatorMode a, AdcCoding c) =>
        CompileAndCompare(Tight(r, a, c));

    [Fact]
    public void C_apply_matches_the_reference_with_a_post_multiplier() =>
        CompileAndCompare(Tight(RoundingMode.HalfEven, AccumulatorMode.Saturate, AdcCoding.OffsetBinary, postMultiplier: -3, postMultiplierBits: 3));

    [Fact]
    public void C_apply_matches_the_reference_with_64_bit_coefficients()
    {
        var (reset, signal) = TestDesigns.RandomWeights(3, 5, 36, seed: 3);
        CompileAndCompare(TestDesigns.Make("wide", reset, signal, p: 36, fracBits: 4, pixelSamples: 10, resetStart: 0, signalStart: 4,
            adcBits: 14, coefBits: 40, accBits: 58, outputBits: 30, rounding: RoundingMode.HalfUp));
    }

    private static void CompileAndCompare(IntegerDesign d)
    {
        var gcc = Tools.Require("gcc");
        var gxx = Tools.Require("g++");
        using var dir = new TempDir();
        var header = Emitted.Write(dir, d, "c-header");
        var prefix = Core.Emit.IdentifierPrefix.FromName(d.Name);
        dir.Write("harness.c", CHarness.Source(header, prefix));
        var cycles = Vectors.Codes(d, 2000, seed: 11);
        AssertExercisesEdges(d, cycles);
        dir.Write("vectors.txt", Vectors.ExpectedFile(d, cycles));

        ToolRunner.RunOk(gcc, dir.Path, Emitted.Timeout, "-std=c99", "-Wall", "-Wextra", "-Wpedantic", "-Werror", "-O2", "-o", "h_c", "harness.c");
        ToolRunner.RunOk(gxx, dir.Path, Emitted.Timeout, "-std=c++17", "-Wall", "-Wextra", "-Werror", "-O2", "-x", "c++", "-o", "h_cpp", "harness.c");
        ToolRunner.RunPass(Path.Combine(dir.Path, "h_c"), dir.Path, Emitted.Timeout, "vectors.txt");
        ToolRunner.RunPass(Path.Combine(dir.Path, "h_cpp"), dir.Path, Emitted.Timeout, "vectors.txt");
    }

    /// <summary>Guards against a vacuous pass: the vectors must reach the accumulator limits and (when rounding matters) ties.</summary>
    private static void AssertExercisesEdges(IntegerDesign d, List<long[]> cycles)
    {
        var offset = d.Coding == AdcCoding.OffsetBinary ? 1L << (d.AdcBits - 1) : 0;
        var limit = BigInteger.One << (d.AccBits - 1);
        var sums = cycles.Select(c => d.Coefficients.Select((k, i) => (BigInteger)k * (c[d.SampleIndex[i]] - offset)).Aggregate(BigInteger.Zero, (s, v) => s + v)).ToList();
        if (d.AccBits <= 16)
        {
            Assert.Contains(sums, s => s >= limit || s < -limit);
            var scale = BigInteger.One << d.Shift;
            Assert.Contains(sums, s => BigInteger.Remainder(BigInteger.Abs(s * d.PostMultiplier), scale) == scale / 2);
        }
    }
}
