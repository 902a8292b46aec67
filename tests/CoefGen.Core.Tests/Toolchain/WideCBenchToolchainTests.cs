using CoefGen.Core.Emit;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Tests.Emit;
using CoefGen.Core.Tests.Vectors;
using CoefGen.Core.Vectors;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// Designs whose accumulator or acc * M does not fit int64_t (the shipped 64-bit ir_measured and variants of it)
/// get the 128-bit C reference: the C bench compiles with -Wall -Wextra -Wpedantic -Werror and matches every output
/// and accumulator of the vectors, on the compiler's __int128 and on the portable two-word path (COEFGEN_C_PORTABLE_WIDE).
/// The vectors hold the constructed ties and limit pixels, so both paths are checked on the branches that differ.
/// </summary>
public class WideCBenchToolchainTests
{
    private const int Pixels = 120;

    public static TheoryData<string> Variants =>
    [
        "shipped", "half-even wrap", "truncate wrap", "half-up saturate", "half-even saturate", "truncate saturate narrow-out",
        "half-even 64-bit output", "half-up M 12345*2^30", "half-even M 3*2^33",
    ];

    private static IntegerDesign Variant(IntegerDesign d, string name)
    {
        int Required(string check) => d.Proof.Checks.Single(c => c.Name == check).RequiredBits;
        return name switch
        {
            "shipped" => d,
            "half-even wrap" => d with { Rounding = RoundingMode.HalfEven },
            "truncate wrap" => d with { Rounding = RoundingMode.Truncate },
            "half-up saturate" => d with { Accumulator = AccumulatorMode.Saturate },
            "half-even saturate" => d with { Rounding = RoundingMode.HalfEven, Accumulator = AccumulatorMode.Saturate },
            "truncate saturate narrow-out" => d with { Rounding = RoundingMode.Truncate, Accumulator = AccumulatorMode.Saturate, OutputBits = Required("output") - 2 },
            "half-even 64-bit output" => d with { Rounding = RoundingMode.HalfEven, OutputBits = 64 },
            // acc * M beyond 64 bits; M's power of two is added to the shift so the output keeps its scale and ties stay reachable.
            "half-up M 12345*2^30" => d with { PostMultiplier = 12345L << 30, PostMultiplierBits = 45, Shift = d.Shift + 30 },
            _ => d with { Rounding = RoundingMode.HalfEven, PostMultiplier = 3L << 33, PostMultiplierBits = 36, Shift = d.Shift + 33 },
        };
    }

    [Theory]
    [MemberData(nameof(Variants))]
    public void The_wide_C_bench_matches_outputs_and_accumulators_on_both_arithmetic_paths(string name)
    {
        var r = ExampleDesigns.Load("ir_measured.toml");
        var d = Variant(r.Datapath, name);
        var model = TemplateModel.Create(d, TestDesigns.Provenance);
        Assert.False(model.Globals["c_apply_supported"] is true, "expected a design beyond int64_t");
        Assert.True(model.Globals["c_apply_wide"] is true);

        using var dir = new TempDir();
        Emitted.Write(dir, d, "c-header");
        var tb = TemplateRenderer.RenderFile(model, Path.Combine(RepoPaths.Templates, "ref-tb.c.scriban"), TestContext.Current.CancellationToken);
        Assert.True(tb.Succeeded, string.Join("\n", tb.Diagnostics));
        dir.Write(model.Prefix + "_tb.c", tb.Text!);
        var set = GoldenVectorGenerator.Generate(r, d, new VectorOptions(Pixels, Seed: 3));
        Assert.DoesNotContain(set.UnreachedBranches, u => u.Target.StartsWith("round_tie", StringComparison.Ordinal));
        foreach (var (file, text) in VectorFiles.Render(set, "coefgen", "test"))
        {
            dir.Write(file, text);
        }

        var gcc = Tools.Require("gcc");
        foreach (var path in new[] { "native", "portable" })
        {
            string[] flags = path == "portable" ? ["-DCOEFGEN_C_PORTABLE_WIDE"] : [];
            ToolRunner.RunOk(gcc, dir.Path, Emitted.Timeout, ["-std=c99", "-Wall", "-Wextra", "-Wpedantic", "-Werror", "-O2", .. flags, "-o", "tb_" + path, model.Prefix + "_tb.c"]);
            ReferenceBench.AssertPass(ToolRunner.Run(Path.Combine(dir.Path, "tb_" + path), dir.Path, Emitted.Timeout), Pixels);
        }

        // Negative control: the same bench against the vectors of a design one rounding mode away fails.
        var other = d with { Rounding = d.Rounding == RoundingMode.HalfUp ? RoundingMode.HalfEven : RoundingMode.HalfUp };
        foreach (var (file, text) in VectorFiles.Render(GoldenVectorGenerator.Generate(r, other, new VectorOptions(Pixels, Seed: 3)), "coefgen", "test"))
        {
            dir.Write(file, text);
        }

        ReferenceBench.AssertFail(ToolRunner.Run(Path.Combine(dir.Path, "tb_portable"), dir.Path, Emitted.Timeout));
    }
}
