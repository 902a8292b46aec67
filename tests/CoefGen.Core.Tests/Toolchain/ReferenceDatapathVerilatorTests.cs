using CoefGen.Core.Tests.Vectors;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// The same Verilog testbench that runs in Icarus also builds with verilator --binary (~3-9 s per build) and
/// passes against the golden vectors: one example (offset binary + saturate + half-even), plus a negative control.
/// </summary>
public class ReferenceDatapathVerilatorTests
{
    private const int Pixels = 300;

    [Fact]
    public void Verilog_testbench_built_by_verilator_matches_every_golden_output()
    {
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, ExampleDesigns.Load("fast_imaging.toml"), Pixels);
        ReferenceBench.AssertPass(BuildAndRun(dir, prefix), Pixels);
    }

    /// <summary>One coefficient off by one in the emitted tables, vectors from the true design: $fatal, exit 134.</summary>
    [Fact]
    public void Verilog_testbench_built_by_verilator_fails_on_a_corrupted_coefficient()
    {
        var r = ExampleDesigns.Load("fast_imaging.toml");
        var coefs = r.Datapath.Coefficients.ToArray();
        coefs[10] += 1;
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, r, 40, r.Datapath with { Coefficients = coefs });
        ReferenceBench.AssertFail(BuildAndRun(dir, prefix));
    }

    private static ToolResult BuildAndRun(TempDir dir, string prefix)
    {
        var verilator = Tools.Require("verilator");
        ToolRunner.RunOk(verilator, dir.Path, TimeSpan.FromMinutes(3), "--binary", "-I" + dir.Path, "--top-module", prefix + "_tb",
            "-o", "tb_verilator", prefix + "_datapath.v", prefix + "_tb.v");
        return ToolRunner.Run(Path.Combine(dir.Path, "obj_dir", "tb_verilator"), dir.Path, Emitted.Timeout);
    }
}
