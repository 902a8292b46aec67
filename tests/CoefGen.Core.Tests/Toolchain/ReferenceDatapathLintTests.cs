using CoefGen.Core.Pipeline;
using CoefGen.Core.Tests.Vectors;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// The reference Verilog datapath lints clean under Verilator -Wall (WIDTH, UNUSED*, every other default-off
/// warning): exit 0 and not one %Warning or %Error line. Covered: two's complement + wrap + half-up (slowscan),
/// offset binary + saturate + half-even (fast imaging), the measured-noise IR design, and a post-multiplier with
/// truncation (fast imaging with normalize = "exact"). Only the include's unused localparams are waived, in the template.
/// </summary>
public class ReferenceDatapathLintTests
{
    public static TheoryData<string> Examples => ["slowscan_spectro.toml", "fast_imaging.toml", "ir_measured.toml"];

    [Theory]
    [MemberData(nameof(Examples))]
    public void Verilog_datapath_lints_clean_under_verilator_Wall(string example) =>
        AssertLintClean(ExampleDesigns.Load(example));

    [Fact]
    public void Verilog_datapath_with_post_multiplier_and_truncation_lints_clean_under_verilator_Wall()
    {
        var r = PostMultiplierExample.FastExactTruncate();
        AssertLintClean(r);
    }

    /// <summary>reset.start = 0: the window test must not compare an unsigned counter with 0 (Verilator UNSIGNED).</summary>
    [Fact]
    public void Verilog_datapath_with_the_reset_window_at_sample_0_lints_clean_and_simulates()
    {
        var toml = File.ReadAllText(ExampleDesigns.ExamplePath("slowscan_spectro.toml"))
            .Replace("[timing.reset]\nstart_ns = 700", "[timing.reset]\nstart_ns = 0", StringComparison.Ordinal);
        var r = ExampleDesigns.FromText(toml, "slow_reset0.toml");
        Assert.Equal(0, r.Datapath.Reset!.Start);
        AssertLintClean(r);
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, r, 40);
        ReferenceBench.AssertPass(ReferenceBench.Icarus(dir, prefix), 40);
    }

    /// <summary>Negative control: the same check sees a width mismatch once one is put into the rendered datapath.</summary>
    [Fact]
    public void The_lint_check_catches_an_implicit_widening()
    {
        var verilator = Tools.Require("verilator");
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, ExampleDesigns.Load("fast_imaging.toml"), 1);
        var file = Path.Combine(dir.Path, prefix + "_datapath.v");
        var text = File.ReadAllText(file);
        const string Explicit = "wire signed [48:0] mq = $signed({{1{m[47]}}, m});";
        Assert.Contains(Explicit, text, StringComparison.Ordinal);
        File.WriteAllText(file, text.Replace(Explicit, "wire signed [48:0] mq = m;", StringComparison.Ordinal));
        var r = Lint(verilator, dir, prefix);
        Assert.NotEqual(0, r.ExitCode);
        Assert.Contains("%Warning-WIDTH", r.StdOut + r.StdErr, StringComparison.Ordinal);
    }

    internal static void AssertLintClean(DesignResult result)
    {
        var verilator = Tools.Require("verilator");
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, result, 1);
        var r = Lint(verilator, dir, prefix);
        Assert.True(r.ExitCode == 0, r.Describe());
        var noise = (r.StdOut + "\n" + r.StdErr).Split('\n')
            .Where(l => l.StartsWith("%Warning", StringComparison.Ordinal) || l.StartsWith("%Error", StringComparison.Ordinal));
        Assert.True(!noise.Any(), r.Describe());
    }

    private static ToolResult Lint(string verilator, TempDir dir, string prefix) =>
        ToolRunner.Run(verilator, dir.Path, Emitted.Timeout, "--lint-only", "-Wall", "-I" + dir.Path, prefix + "_datapath.v");
}
