using CoefGen.Core.Pipeline;
using CoefGen.Core.Tests.Vectors;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// The pipelined datapath (ref-pipeline.v / .vhd) against the same golden vectors as the clear one, in Icarus on
/// 300 pixels and GHDL on the first 50 (numeric_std is slow there), with in_valid
/// and out_ready each low on 25 % of clocks (deterministic seed): zero mismatches on offset binary + saturate +
/// half-even (fast imaging), two's complement + wrap + half-up (slowscan), the 64-bit accumulator of ir_measured,
/// and a post-multiplier with truncation; the clear datapath runs on the same files, so both give the same outputs.
/// The bench also checks out_last every 7th result, the documented latency with no stalls, and clear_flags.
/// Negative controls: a corrupted coefficient and a corrupted expected value fail. Verilator -Wall lints it clean;
/// GHDL analyses it with -Werror.
/// </summary>
public class PipelineDatapathToolchainTests
{
    private const int Pixels = 300;
    private const int GhdlPixels = 50;

    public static TheoryData<string> Examples => ["fast_imaging.toml", "slowscan_spectro.toml", "ir_measured.toml"];

    [Theory]
    [MemberData(nameof(Examples))]
    public void Pipelined_datapath_matches_the_clear_one_with_random_stalls(string example)
    {
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, ExampleDesigns.Load(example), Pixels);
        ReferenceBench.AssertPass(ReferenceBench.Icarus(dir, prefix), Pixels);
        var stalled = Icarus(dir, prefix);
        ReferenceBench.AssertPass(stalled, Pixels);
        // The proof holds for these designs: no partial sum or output ever leaves its range.
        Assert.Contains("FLAGS acc_clip=0 out_sat=0", stalled.StdOut, StringComparison.Ordinal);
        ReferenceBench.AssertPass(Icarus(dir, prefix, "+stall=0"), Pixels);
        AssertLintClean(dir, prefix);
        var ghdl = Ghdl(dir, prefix, GhdlPixels);
        ReferenceBench.AssertPass(ghdl, GhdlPixels);
        Assert.Contains("FLAGS acc_clip=0 out_sat=0", ghdl.StdOut, StringComparison.Ordinal);
    }

    [Fact]
    public void Post_multiplier_and_truncation_match_with_stalls_and_from_the_hex_image()
    {
        var r = PostMultiplierExample.FastExactTruncate();
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, r, Pixels);
        ReferenceBench.AssertPass(Icarus(dir, prefix, "+seed=7"), Pixels);
        ReferenceBench.AssertPass(Icarus(dir, prefix, "+seed=7", coefHex: true), Pixels);
        AssertLintClean(dir, prefix);
        ReferenceBench.AssertPass(Ghdl(dir, prefix, 30, "-gCOEF_HEX=true"), 30);
    }

    /// <summary>A general cycle (correlated multiple sampling, 4 pairs): the coefficient index comes from the sample-index table.</summary>
    [Fact]
    public void General_cycle_matches_with_random_stalls()
    {
        var r = ExampleDesigns.Load(Path.Combine("cycles", "cms_rows.toml"));
        Assert.NotNull(r.Datapath.Windows);
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, r, Pixels);
        ReferenceBench.AssertPass(Icarus(dir, prefix), Pixels);
        ReferenceBench.AssertPass(Ghdl(dir, prefix, GhdlPixels), GhdlPixels);
        AssertLintClean(dir, prefix);
    }

    /// <summary>An output a few ADU wide and an accumulator below its proven width: both sticky flags set (and cleared).</summary>
    [Fact]
    public void Saturating_variant_matches_and_raises_both_sticky_flags()
    {
        var (_, r, _) = ReferenceDatapathEdgeToolchainTests.Build("fast_half_even_saturate_narrow");
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, r, Pixels);
        var run = Icarus(dir, prefix);
        ReferenceBench.AssertPass(run, Pixels);
        Assert.Contains("FLAGS acc_clip=1 out_sat=1", run.StdOut, StringComparison.Ordinal);
        var ghdl = Ghdl(dir, prefix, GhdlPixels);
        ReferenceBench.AssertPass(ghdl, GhdlPixels);
        Assert.Contains("FLAGS acc_clip=1 out_sat=1", ghdl.StdOut, StringComparison.Ordinal);
    }

    [Fact]
    public void A_corrupted_coefficient_expected_value_or_hex_image_fails_the_pipelined_bench()
    {
        var r = ExampleDesigns.Load("slowscan_spectro.toml");
        var coefs = r.Datapath.Coefficients.ToArray();
        coefs[^1] += 1;
        using (var dir = new TempDir())
        {
            var prefix = ReferenceBench.Write(dir, r, 40, r.Datapath with { Coefficients = coefs });
            ReferenceBench.AssertFail(Icarus(dir, prefix));
            ReferenceBench.AssertFail(Icarus(dir, prefix, coefHex: true));
            ReferenceBench.AssertFail(Ghdl(dir, prefix, 40));
        }

        using (var dir = new TempDir())
        {
            var prefix = ReferenceBench.Write(dir, r, 40);
            var file = Path.Combine(dir.Path, "expected_out.hex");
            var lines = File.ReadAllLines(file);
            var word = Convert.ToUInt64(lines[17], 16) ^ 1;
            lines[17] = word.ToString("x" + lines[17].Length, System.Globalization.CultureInfo.InvariantCulture);
            File.WriteAllLines(file, lines);
            ReferenceBench.AssertFail(Icarus(dir, prefix));
        }

        // Only the hex image corrupted: the benches that load it fail, the one reading the include passes.
        using (var dir = new TempDir())
        {
            var prefix = ReferenceBench.Write(dir, r, 40);
            var file = Path.Combine(dir.Path, prefix + "_coefs.hex");
            var lines = File.ReadAllLines(file);
            Assert.Equal(r.Datapath.Coefficients.Count, lines.Length);
            lines[0] = (Convert.ToUInt64(lines[0], 16) ^ 1).ToString("x" + lines[0].Length, System.Globalization.CultureInfo.InvariantCulture);
            File.WriteAllLines(file, lines);
            ReferenceBench.AssertPass(Icarus(dir, prefix), 40);
            ReferenceBench.AssertFail(Icarus(dir, prefix, coefHex: true));
            ReferenceBench.AssertFail(Ghdl(dir, prefix, 40, "-gCOEF_HEX=true"));
        }
    }

    /// <summary>The pipelined bench in Icarus; coefHex loads the ROM from the $readmemh image instead of the case function.</summary>
    private static ToolResult Icarus(TempDir dir, string prefix, string plusArg = "+stall=25", bool coefHex = false)
    {
        var iverilog = Tools.Require("iverilog");
        var vvp = Tools.Require("vvp");
        ToolRunner.RunOk(iverilog, dir.Path, Emitted.Timeout, "-g2005-sv", "-I", ".", "-o", "pipe.vvp",
            $"-P{prefix}_pipeline_tb.COEF_HEX={(coefHex ? 1 : 0)}", prefix + "_pipeline.v", prefix + "_pipeline_tb.v");
        return ToolRunner.Run(vvp, dir.Path, Emitted.Timeout, "-n", "pipe.vvp", plusArg);
    }

    private static ToolResult Ghdl(TempDir dir, string prefix, int pixels, string generic = "-gSTALL_PERCENT=25")
    {
        var ghdl = Tools.Require("ghdl");
        Directory.CreateDirectory(Path.Combine(dir.Path, "work"));
        ToolRunner.RunOk(ghdl, dir.Path, Emitted.Timeout, "-a", "--std=08", "-Werror", "--workdir=work",
            prefix + "_coefs_pkg.vhd", prefix + "_pipeline.vhd", prefix + "_pipeline_tb.vhd");
        return ToolRunner.Run(ghdl, dir.Path, Emitted.Timeout, "-r", "--std=08", "--workdir=work", prefix + "_pipeline_tb", $"-gMAX_PIXELS={pixels}", generic);
    }

    private static void AssertLintClean(TempDir dir, string prefix)
    {
        var verilator = Tools.Require("verilator");
        var r = ToolRunner.Run(verilator, dir.Path, Emitted.Timeout, "--lint-only", "-Wall", "-I" + dir.Path, prefix + "_pipeline.v");
        Assert.True(r.ExitCode == 0, r.Describe());
        Assert.DoesNotContain("%Warning", r.StdOut + r.StdErr, StringComparison.Ordinal);
    }
}
