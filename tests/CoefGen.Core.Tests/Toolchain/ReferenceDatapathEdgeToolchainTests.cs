using CoefGen.Core.FixedPoint;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Tests.Vectors;
using CoefGen.Core.Vectors;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// The reference datapath (Verilog in Icarus on 300 pixels, VHDL in GHDL on the first 50 for three variants) matches
/// the bit-exact model with zero mismatches on designs built to reach the branches the shipped examples never take:
/// an output a few ADU wide (rail and charge pixels saturate), a shift of 1..3 bits after the accumulator (exact
/// rounding ties on a third of the pixels), every rounding mode, both ADC codings, a wrapping accumulator at the
/// narrowest width the resolver accepts and a saturating one a bit below its proven partial-sum width (the sums
/// really wrap or clip), and post-multipliers that are not powers of two. The proof calls every variant unsafe (the
/// output is too narrow on purpose); the pipeline and the generator still produce vectors. Each test asserts from
/// the expected data that its branches occurred; negative controls show that a wrong rounding or accumulator mode fails.
/// </summary>
public class ReferenceDatapathEdgeToolchainTests
{
    private const string Fast = "fast_imaging.toml";
    private const string Slow = "slowscan_spectro.toml";

    // Offset binary (fast) and two's complement (slow); every rounding mode with both accumulators; three post-multiplier designs.
    private static readonly Dictionary<string, EdgeVariant> Variants = new(StringComparer.Ordinal)
    {
        ["fast_half_up_wrap_narrow"] = new(Fast, "half-up", "wrap", false, 1, 4, true, false),
        ["fast_half_even_saturate_narrow"] = new(Fast, "half-even", "saturate", false, 1, 4, true, true),
        ["fast_truncate_saturate"] = new(Fast, "truncate", "saturate", false, 2, 5, false, false),
        ["slow_half_up_saturate_narrow"] = new(Slow, "half-up", "saturate", false, 2, 5, true, true),
        ["slow_half_even_wrap_narrow"] = new(Slow, "half-even", "wrap", false, 1, 5, true, false),
        ["slow_truncate_wrap"] = new(Slow, "truncate", "wrap", false, 3, 5, false, false),
        ["slow_exact_half_up_saturate_narrow_ties"] = new(Slow, "half-up", "saturate", true, -9, 5, true, true, CoefBits: 10),
        ["slow_exact_half_even_wrap"] = new(Slow, "half-even", "wrap", true, 9, 6, false, false, CoefBits: 10),
        ["fast_exact_truncate_saturate_narrow"] = new(Fast, "truncate", "saturate", true, 9, 5, true, false, CoefBits: 10),
    };

    public static TheoryData<string> Names => [.. Variants.Keys];

    [Theory]
    [MemberData(nameof(Names))]
    public void Reference_datapath_matches_the_model_through_output_saturation_rounding_ties_and_accumulator_limits(string variant)
    {
        var (v, r, probe) = Build(variant);
        var d = r.Datapath;
        AssertResolved(v, probe, d);

        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, r, EdgeVariant.IcarusPixels);
        var set = GoldenVectorGenerator.Generate(r, new VectorOptions(EdgeVariant.IcarusPixels, Seed: 11));
        var (written, diags) = ExpectedOutputs.Parse(File.ReadAllText(Path.Combine(dir.Path, VectorFileNames.ExpectedDecimal)), "expected.txt", set.Pixels.Count);
        Assert.Empty(diags);
        Assert.Equal(set.Pixels.Select(p => p.Expected.Output), written!);

        var all = EdgeBranchCounts.Of(d, set.Pixels);
        TestContext.Current.TestOutputHelper?.WriteLine($"{v}: P {d.P}, shift {d.Shift}, M {d.PostMultiplier}, out {d.OutputBits}.{d.OutputFracBits}, acc {d.AccBits}, safe {d.Proof.Safe}: {all}");
        AssertBranchesOccur(v, d, all);
        ReferenceBench.AssertPass(ReferenceBench.Icarus(dir, prefix), EdgeVariant.IcarusPixels);
        AssertLintClean(dir, prefix);

        if (v.Ghdl)
        {
            var first = EdgeBranchCounts.Of(d, set.Pixels.Take(EdgeVariant.GhdlPixels).ToArray());
            TestContext.Current.TestOutputHelper?.WriteLine($"first {EdgeVariant.GhdlPixels} (GHDL): {first}");
            Assert.True(first.OutputHigh > 0 && first.OutputLow > 0, first.ToString());
            Assert.True(!v.NarrowAccumulator || first.AccumulatorWrapped > 0, first.ToString());
            ReferenceBench.AssertPass(ReferenceBench.Ghdl(dir, prefix, EdgeVariant.GhdlPixels), EdgeVariant.GhdlPixels);
        }
    }

    public static TheoryData<string, string> Tamperings => new()
    {
        { "fast_half_even_saturate_narrow", "half-up" },
        { "slow_half_up_saturate_narrow", "half-even" },
        { "slow_truncate_wrap", "half-up" },
        { "fast_half_even_saturate_narrow", "wrap" },
    };

    /// <summary>
    /// Negative control: the datapath rendered with another rounding mode, or a wrapping accumulator, fails on the
    /// vectors of the true design, so the ties and clips above are really seen by the bench.
    /// </summary>
    [Theory]
    [MemberData(nameof(Tamperings))]
    public void A_datapath_rendered_with_the_wrong_rounding_or_accumulator_mode_fails_on_the_edge_vectors(string variant, string wrongMode)
    {
        var (_, r, _) = Build(variant);
        var tampered = ModeNames.ParseRounding(wrongMode) is RoundingMode rounding
            ? r.Datapath with { Rounding = rounding }
            : r.Datapath with { Accumulator = ModeNames.ParseAccumulator(wrongMode)!.Value };
        Assert.NotEqual(r.Datapath, tampered);
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, r, EdgeVariant.IcarusPixels, tampered);
        ReferenceBench.AssertFail(ReferenceBench.Icarus(dir, prefix));
    }

    /// <summary>The edited example, run twice: a probe (full accumulator) for P and the partial-sum width, then the variant.</summary>
    internal static (EdgeVariant Variant, DesignResult Result, IntegerDesign Probe) Build(string variant)
    {
        var v = Variants[variant];
        var example = ExampleDesigns.Load(v.Example).Datapath;
        var probe = ExampleDesigns.FromText(v.ProbeToml(example.CoefBits, example.AdcBits), "probe_" + variant + ".toml").Datapath;
        var r = ExampleDesigns.FromText(v.Toml(probe.P, example.CoefBits, example.AdcBits, PartialSumBits(probe)), "edge_" + variant + ".toml");
        return (v, r, probe);
    }

    /// <summary>The resolver accepted every override as written and the design has the intended shape.</summary>
    private static void AssertResolved(EdgeVariant v, IntegerDesign probe, IntegerDesign d)
    {
        Assert.Equal(ModeNames.ParseRounding(v.Rounding), d.Rounding);
        Assert.Equal(ModeNames.ParseAccumulator(v.Accumulator), d.Accumulator);
        Assert.Equal(v.Exact ? NormalizeMode.Exact : NormalizeMode.Shift, d.Normalize);
        Assert.Equal(d.OutputFracBits + v.OutputRangeAdu + 1, d.OutputBits);
        var narrow = d.Accumulator == AccumulatorMode.Wrap ? d.CoefBits + d.SampleBits : PartialSumBits(probe) - 1;
        Assert.Equal(v.NarrowAccumulator ? narrow : probe.AccBits, d.AccBits);
        Assert.Equal(v.CoefBits ?? probe.CoefBits, d.CoefBits);
        Assert.Equal(probe.Coefficients, d.Coefficients);
        Assert.Equal(d.P - v.FracBelowP, d.OutputFracBits);
        if (v.Exact)
        {
            Assert.True(d.PostMultiplierBits > 0 && d.PostMultiplier > 1, $"M = {d.PostMultiplier}");
            // A real multiplier, not a shift in disguise.
            Assert.False(long.IsPow2(d.PostMultiplier), $"M = {d.PostMultiplier}");
        }
        else
        {
            Assert.Equal(v.FracBelowP, d.Shift);
            Assert.Equal(1, d.PostMultiplier);
        }

        // The narrow accumulator is below what the proof needs; the pipeline and the generator still go ahead.
        Assert.Equal(!v.NarrowAccumulator, d.Proof.Checks.Where(c => c.Name.StartsWith("accumulator", StringComparison.Ordinal)).All(c => c.Fits));
        if (v.NarrowAccumulator && (d.Accumulator == AccumulatorMode.Saturate || d.Proof.Checks.Single(c => c.Name == "accumulator_final").Required))
        {
            Assert.False(d.Proof.Safe);
        }
    }

    /// <summary>The template branches these widths select (product as wide as the accumulator, a 1-bit half-even shift) lint clean too.</summary>
    private static void AssertLintClean(TempDir dir, string prefix)
    {
        var r = ToolRunner.Run(Tools.Require("verilator"), dir.Path, Emitted.Timeout, "--lint-only", "-Wall", "-I" + dir.Path, prefix + "_datapath.v");
        var noise = (r.StdOut + "\n" + r.StdErr).Split('\n')
            .Where(l => l.StartsWith("%Warning", StringComparison.Ordinal) || l.StartsWith("%Error", StringComparison.Ordinal));
        Assert.True(r.ExitCode == 0 && !noise.Any(), r.Describe());
    }

    private static int PartialSumBits(IntegerDesign d) => d.Proof.Checks.Single(c => c.Name == "accumulator_partial").RequiredBits;

    private static void AssertBranchesOccur(EdgeVariant v, IntegerDesign d, EdgeBranchCounts n)
    {
        var text = v + ": " + n;
        Assert.True(n.OutputHigh > 0 && n.OutputLow > 0, "both output rails: " + text);
        Assert.True(n.OutputHigh + n.OutputLow < n.Pixels / 2, "most noise pixels inside the output range: " + text);
        if (d.Shift <= 4)
        {
            // Ties both ways: odd and even truncated quotient (half-even), negative and positive (half-up, truncate).
            Assert.True(n.TiesOddQuotient > 0 && n.Ties - n.TiesOddQuotient > 0, "ties with odd and even quotient: " + text);
            Assert.True(n.NegativeTies > 0 && n.Ties - n.NegativeTies > 0, "negative and positive ties: " + text);
        }

        if (!v.NarrowAccumulator)
        {
            Assert.True(n.AccumulatorWrapped == 0 && n.AccumulatorClipped == 0, "a full-width accumulator is exact: " + text);
        }
        else if (v.Accumulator == "saturate")
        {
            Assert.True(n.AccumulatorClipped > 0, "the saturating accumulator clipped: " + text);
        }
        else
        {
            Assert.True(n.AccumulatorWrapped > 0 && n.AccumulatorClipped == 0, "the wrapping accumulator wrapped: " + text);
        }
    }
}
