using CoefGen.Core.FixedPoint;
using CoefGen.Core.Tests.Emit;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// 2 x 4096 coefficients through every tool. Forms chosen: C and VHDL use arrays; the SV package keeps
/// the case-based coef_at (Icarus has no other in-package form) next to the COEF array that Verilator
/// lints; timings are written to the test output.
/// </summary>
public class LargeDesignToolchainTests
{
    private static IntegerDesign Large()
    {
        var (reset, signal) = TestDesigns.RandomWeights(4096, 4096, 16, seed: 5);
        return TestDesigns.Make("big_ch", reset, signal, p: 16, fracBits: 2, pixelSamples: 8400, resetStart: 100, signalStart: 4200,
            adcBits: 16, coefBits: 18, accBits: 48, outputBits: 24);
    }

    [Fact]
    public void Large_C_header_compiles_and_matches_the_reference() => CHeaderLarge(Large());

    [Fact]
    public void Large_VHDL_package_analyses_and_reads_back() => HdlChecks.Vhdl(Large());

    [Fact]
    public void Large_SV_package_lints_and_simulates() => HdlChecks.SystemVerilog(Large());

    [Fact]
    public void Large_Verilog_include_lints_and_simulates() => HdlChecks.Verilog(Large());

    private static void CHeaderLarge(IntegerDesign d)
    {
        var gcc = Tools.Require("gcc");
        using var dir = new TempDir();
        var header = Emitted.Write(dir, d, "c-header");
        dir.Write("harness.c", CHarness.Source(header, "big_ch"));
        dir.Write("vectors.txt", Vectors.ExpectedFile(d, Vectors.Codes(d, 50, seed: 2)));
        ToolRunner.RunOk(gcc, dir.Path, Emitted.Timeout, "-std=c99", "-Wall", "-Wextra", "-Wpedantic", "-Werror", "-O2", "-o", "h", "harness.c");
        ToolRunner.RunPass(Path.Combine(dir.Path, "h"), dir.Path, Emitted.Timeout, "vectors.txt");
    }
}
