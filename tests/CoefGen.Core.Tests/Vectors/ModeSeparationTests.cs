using CoefGen.Core.FixedPoint;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Vectors;

namespace CoefGen.Core.Tests.Vectors;

/// <summary>
/// Negative controls, in process: fake DUT dumps from <see cref="MutantDatapath"/> (an independent BigInteger
/// datapath built wrong in one way) are compared with the golden vectors exactly as `verify` compares them
/// (outputs, and accumulators when dumped). Every wrong datapath must differ on at least one pixel, the
/// correct one on none. The constructed tie pixels (<see cref="DatapathBranch"/>) are what separates the
/// rounding modes; without them no noise pixel hits a tie (common practice of datapath verification, no source).
/// </summary>
public class ModeSeparationTests
{
    private const int Pixels = 40;

    public static TheoryData<string> Examples => ["fast_imaging.toml", "ir_measured.toml", "slowscan_spectro.toml", "capture_bench.toml"];

    private static (int Outputs, int Accumulators) Mismatches(GoldenVectorSet set, MutantDatapath dut)
    {
        var got = set.Pixels.Select(p => dut.Run(p.Codes)).ToArray();
        var outputs = OutputComparison.Compare([.. set.Pixels.Select(p => p.Expected.Output)], [.. got.Select(g => g.Output)]);
        var accs = OutputComparison.Compare([.. set.Pixels.Select(p => p.Expected.Accumulator)], [.. got.Select(g => g.Accumulator)]);
        return (outputs.Mismatches.Count, accs.Mismatches.Count);
    }

    private static Dictionary<string, int> Branches(GoldenVectorSet set)
    {
        var counts = new VectorCounts();
        foreach (var p in set.Pixels)
        {
            counts.Add(set.Design, p);
        }

        return counts.Branches.ToDictionary(b => b.Branch, b => b.Count);
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Every_wrong_rounding_fails_and_the_correct_datapath_passes_for_each_asked_mode(string example)
    {
        var r = ExampleDesigns.Load(example);
        foreach (var asked in Enum.GetValues<RoundingMode>())
        {
            var design = r.Datapath with { Rounding = asked };
            var set = GoldenVectorGenerator.Generate(r, design, new VectorOptions(Pixels));
            var branches = Branches(set);
            foreach (var tie in new[] { DatapathBranch.TieEvenPositive, DatapathBranch.TieOddPositive, DatapathBranch.TieEvenNegative, DatapathBranch.TieOddNegative })
            {
                Assert.True(branches[tie] > 0, $"{example} {asked}: no {tie} pixel");
            }

            Assert.Equal((0, 0), Mismatches(set, new MutantDatapath(design, Mutation.None)));
            Mutation[] wrong = asked switch
            {
                RoundingMode.HalfUp => [Mutation.HalfEvenRounding, Mutation.FloorTruncation, Mutation.TowardZeroTruncation],
                RoundingMode.HalfEven => [Mutation.HalfUpRounding, Mutation.FloorTruncation, Mutation.TowardZeroTruncation],
                _ => [Mutation.HalfUpRounding, Mutation.HalfEvenRounding, Mutation.TowardZeroTruncation],
            };
            foreach (var m in wrong)
            {
                var (outputs, _) = Mismatches(set, new MutantDatapath(design, m));
                Assert.True(outputs > 0, $"{example}: a datapath with {m} where {asked} is asked passes {set.Pixels.Count} pixels");
            }
        }
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void A_plus_one_error_in_the_first_middle_or_last_coefficient_fails_the_accumulator_comparison(string example)
    {
        var r = ExampleDesigns.Load(example);
        var set = GoldenVectorGenerator.Generate(r, new VectorOptions(Pixels));
        var n = r.Datapath.Coefficients.Count;
        foreach (var k in new[] { 0, n / 2, n - 1 })
        {
            var (outputs, accs) = Mismatches(set, new MutantDatapath(r.Datapath, Mutation.CoefficientPlusOne, k));
            TestContext.Current.TestOutputHelper?.WriteLine($"{example} c[{k}] + 1: {outputs} output and {accs} accumulator mismatches in {set.Pixels.Count} pixels");
            Assert.True(accs > 0, $"{example}: c[{k}] + 1 passes the accumulator comparison");
        }
    }

    [Fact]
    public void A_missing_offset_binary_flip_fails()
    {
        var r = ExampleDesigns.Load("fast_imaging.toml");
        Assert.Equal(CoefGen.Core.Readout.AdcCoding.OffsetBinary, r.Datapath.Coding);
        var set = GoldenVectorGenerator.Generate(r, new VectorOptions(Pixels));
        var (outputs, accs) = Mismatches(set, new MutantDatapath(r.Datapath, Mutation.NoOffsetBinaryFlip));
        Assert.True(outputs > 0 && accs > 0, $"{outputs} output and {accs} accumulator mismatches");
    }

    /// <summary>
    /// On a proven-safe design saturation never happens, so wrap and saturate are the same datapath there; the control
    /// runs on a narrowed copy (output two bits below the proven range, accumulator one bit below the proven partial
    /// sums), where the generator constructs the pixels one step inside and one step outside each limit.
    /// </summary>
    [Theory]
    [MemberData(nameof(Examples))]
    public void Wrap_where_saturate_is_asked_fails_on_the_pixels_just_outside_each_limit(string example)
    {
        var r = ExampleDesigns.Load(example);
        var d = r.Datapath;
        var narrowOut = d with { OutputBits = Required(d, "output") - 2 };
        var set = GoldenVectorGenerator.Generate(r, narrowOut, new VectorOptions(Pixels));
        var kinds = set.Pixels.Select(p => p.Kind).ToHashSet();
        Assert.Contains("target_" + DatapathBranch.OutputSaturatedHigh, kinds);
        Assert.Contains("target_" + DatapathBranch.OutputSaturatedLow, kinds);
        Assert.Contains("target_" + DatapathBranch.OutputMax, kinds);
        Assert.Equal((0, 0), Mismatches(set, new MutantDatapath(narrowOut, Mutation.None)));
        Assert.True(Mismatches(set, new MutantDatapath(narrowOut, Mutation.OutputWraps)).Outputs > 0, "output wraps and passes");

        var narrowAcc = d with { Accumulator = AccumulatorMode.Saturate, AccBits = Required(d, "accumulator_partial") - 1 };
        var accSet = GoldenVectorGenerator.Generate(r, narrowAcc, new VectorOptions(Pixels));
        var accKinds = accSet.Pixels.Select(p => p.Kind).ToHashSet();
        Assert.Contains("target_acc_limit_high_outside", accKinds);
        Assert.Contains("target_acc_limit_low_outside", accKinds);
        Assert.Equal((0, 0), Mismatches(accSet, new MutantDatapath(narrowAcc, Mutation.None)));
        Assert.True(Mismatches(accSet, new MutantDatapath(narrowAcc, Mutation.AccumulatorWraps)).Accumulators > 0, "accumulator wraps and passes");
    }

    [Fact]
    public void Branch_counts_cover_every_pixel_once_per_rounding_branch_and_unreached_targets_give_a_reason()
    {
        var r = ExampleDesigns.Load("slowscan_spectro.toml");
        var set = GoldenVectorGenerator.Generate(r, new VectorOptions(100));
        var b = Branches(set);
        string[] rounding = [DatapathBranch.RoundExact, DatapathBranch.RoundBelowHalf, DatapathBranch.RoundAboveHalf,
            DatapathBranch.TieEvenPositive, DatapathBranch.TieOddPositive, DatapathBranch.TieEvenNegative, DatapathBranch.TieOddNegative];
        Assert.Equal(set.Pixels.Count, rounding.Sum(x => b[x]));

        // The shipped design is proven safe: no input saturates the output or reaches the accumulator's ends.
        Assert.True(r.Datapath.Proof.Safe);
        Assert.Equal(0, b[DatapathBranch.OutputSaturatedHigh] + b[DatapathBranch.OutputSaturatedLow] + b[DatapathBranch.AccumulatorWrapped]);
        Assert.Contains(set.UnreachedBranches, u => u.Target == DatapathBranch.OutputSaturatedHigh && u.Reason.Length > 0);
        Assert.Contains(set.UnreachedBranches, u => u.Target == "acc_limit_high_outside");
        var manifest = VectorFiles.Render(set, "coefgen", "t").Single(f => f.Name == VectorFileNames.Manifest).Text;
        var parsed = VectorManifest.Parse(manifest, "manifest.json").Manifest!;
        Assert.Equal(b.OrderBy(x => x.Key, StringComparer.Ordinal), parsed.Branches.ToDictionary(x => x.Branch, x => x.Count).OrderBy(x => x.Key, StringComparer.Ordinal));
        Assert.Equal(set.UnreachedBranches, parsed.UnreachedBranches);
    }

    private static int Required(IntegerDesign d, string check) => d.Proof.Checks.Single(c => c.Name == check).RequiredBits;
}
