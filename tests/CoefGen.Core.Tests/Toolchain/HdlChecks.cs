using CoefGen.Core.Emit;
using CoefGen.Core.FixedPoint;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>The tool runs shared by the normal-size and the large-design HDL tests.</summary>
public static class HdlChecks
{
    public static void Vhdl(IntegerDesign d, IntegerDesign? vectorsFrom = null)
    {
        var ghdl = Tools.Require("ghdl");
        using var dir = new TempDir();
        var pkgFile = Emitted.Write(dir, d, "vhdl-package");
        var pkg = Path.GetFileNameWithoutExtension(pkgFile);
        dir.Write("tb.vhd", HdlBenches.VhdlBench(pkg));
        dir.Write("coefs.txt", Vectors.VhdlVectors(vectorsFrom ?? d));
        Directory.CreateDirectory(Path.Combine(dir.Path, "w"));
        ToolRunner.RunOk(ghdl, dir.Path, Emitted.Timeout, "-a", "--std=08", "-Werror", "--workdir=w", pkgFile);
        ToolRunner.RunOk(ghdl, dir.Path, Emitted.Timeout, "-a", "--std=08", "-Werror", "--workdir=w", "tb.vhd");
        ToolRunner.RunOk(ghdl, dir.Path, Emitted.Timeout, "-e", "--std=08", "--workdir=w", "tb");
        Finish(vectorsFrom, ghdl, dir.Path, "-r", "--std=08", "--workdir=w", "tb", "-gVEC_FILE=coefs.txt");
    }

    public static void SystemVerilog(IntegerDesign d, IntegerDesign? vectorsFrom = null)
    {
        var verilator = Tools.Require("verilator");
        var iverilog = Tools.Require("iverilog");
        var vvp = Tools.Require("vvp");
        using var dir = new TempDir();
        var pkgFile = Emitted.Write(dir, d, "sv-package");
        var pkg = Path.GetFileNameWithoutExtension(pkgFile);
        var n = d.Coefficients.Count;
        var ib = Emitted.IndexBits(n);
        var wrapper = HdlBenches.LintWrapper("lint_top", "", File.ReadAllText(Path.Combine(dir.Path, pkgFile)), pkg + "::",
            [$"  input logic [{ib - 1}:0] idx", $"  output {pkg}::coef_t o_coef_at", "  output logic [31:0] o_sample_index_at"],
            [$"assign o_COEF = 64'({pkg}::COEF[idx]);", $"assign o_SAMPLE_INDEX = 64'({pkg}::SAMPLE_INDEX[idx]);", $"assign o_coef_at = {pkg}::coef_at(int'(idx));",
             $"assign o_sample_index_at = {pkg}::sample_index_at(int'(idx));"]);
        dir.Write("lint_top.sv", wrapper);
        ToolRunner.RunOk(verilator, dir.Path, Emitted.Timeout, "--lint-only", "-Wall", "+define+COEFGEN_SV_ARRAYS", "--top-module", "lint_top", pkgFile, "lint_top.sv");

        // The default (case-based) form lints too, with only the functions used (Verilator's case-function lint is slow above a few thousand).
        if (n <= 4096)
        {
            dir.Write("lint_fn.sv", HdlBenches.LintWrapper("lint_fn", "", "", pkg + "::",
            [$"  input logic [{ib - 1}:0] idx", $"  output {pkg}::coef_t o_coef_at", "  output logic [31:0] o_sample_index_at"],
                [$"assign o_coef_at = {pkg}::coef_at(int'(idx));", $"assign o_sample_index_at = {pkg}::sample_index_at(int'(idx));"]));
            ToolRunner.RunOk(verilator, dir.Path, Emitted.Timeout, "--lint-only", "-Wall", "--top-module", "lint_fn", pkgFile, "lint_fn.sv");
        }

        dir.Write("tb.sv", HdlBenches.SvBench(pkg, d.CoefBits, n));
        dir.Write("coefs.hex", Vectors.CoefHex(vectorsFrom ?? d));
        dir.Write("index.hex", Vectors.IndexHex(vectorsFrom ?? d));
        ToolRunner.RunOk(iverilog, dir.Path, Emitted.Timeout, "-g2012", "-o", "tb.vvp", pkgFile, "tb.sv");
        Finish(vectorsFrom, vvp, dir.Path, "-n", "tb.vvp");
    }

    public static void Verilog(IntegerDesign d, IntegerDesign? vectorsFrom = null)
    {
        var verilator = Tools.Require("verilator");
        var iverilog = Tools.Require("iverilog");
        var vvp = Tools.Require("vvp");
        using var dir = new TempDir();
        var inc = Emitted.Write(dir, d, "verilog-include");
        var prefix = IdentifierPrefix.FromName(d.Name);
        var n = d.Coefficients.Count;
        var ib = Emitted.IndexBits(n);
        var wrapper = HdlBenches.LintWrapper("lint_top", "", File.ReadAllText(Path.Combine(dir.Path, inc)), "",
            [$"  input logic [{ib - 1}:0] idx", $"  output logic signed [{d.CoefBits - 1}:0] o_coef_at", "  output logic [31:0] o_sample_index_at"],
            [$"`include \"{inc}\"", $"assign o_coef_at = {prefix}_coef_at(int'(idx));", $"assign o_sample_index_at = {prefix}_sample_index_at(int'(idx));"]);
        dir.Write("lint_top.sv", wrapper);
        ToolRunner.RunOk(verilator, dir.Path, Emitted.Timeout, "--lint-only", "-Wall", "-I.", "--top-module", "lint_top", "lint_top.sv");

        dir.Write("tb.v", HdlBenches.VerilogBench(inc, prefix, d.CoefBits, n));
        dir.Write("coefs.hex", Vectors.CoefHex(vectorsFrom ?? d));
        dir.Write("index.hex", Vectors.IndexHex(vectorsFrom ?? d));
        ToolRunner.RunOk(iverilog, dir.Path, Emitted.Timeout, "-g2005", "-I.", "-o", "tb.vvp", "tb.v");
        Finish(vectorsFrom, vvp, dir.Path, "-n", "tb.vvp");
    }

    /// <summary>The last (simulation) step must PASS, or, with tampered vectors, fail with a non-zero exit and no PASS line.</summary>
    private static void Finish(IntegerDesign? tampered, string exe, string dir, params string[] args)
    {
        if (tampered is null)
        {
            ToolRunner.RunPass(exe, dir, Emitted.Timeout, args);
            return;
        }

        var r = ToolRunner.Run(exe, dir, Emitted.Timeout, args);
        Assert.NotEqual(0, r.ExitCode);
        Assert.DoesNotContain("PASS", r.StdOut.Split('\n').Select(l => l.Trim()));
    }
}
