using System.Globalization;
using System.Numerics;
using System.Text;
using CoefGen.Core.Emit;
using CoefGen.Core.FixedPoint.TwoStage;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Tests.Cycle;
using CoefGen.Core.Tests.Emit;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// The two-stage templates (form = "two-stage"): the C header compiles strictly and its _apply equals
/// <see cref="TwoStageBitExactModel"/> and the independent BigInteger reference on random, rail and worst-case inputs;
/// the HDL packages analyse, lint and return every table entry.
/// </summary>
public class TwoStageToolchainTests
{
    public static TheoryData<string> Names => TwoStageCases.Names;

    private static string Render(TempDir dir, TemplateModel model, string builtin)
    {
        Assert.True(BuiltinTemplates.TryGet(builtin, out var t));
        var name = t.DefaultOutputName(model.Prefix);
        dir.Write(name, BuiltinRender.Render(model, builtin));
        return name;
    }

    [Theory]
    [MemberData(nameof(Names))]
    public void C_apply_equals_the_bit_exact_model_and_the_BigInteger_reference(string name)
    {
        var gcc = Tools.Require("gcc");
        var r = TwoStageCases.Named(name);
        var d = r.TwoStage!.Quantised;
        Assert.True(d.Proof.Safe);
        var model = TwoStageCases.Model(r);
        using var dir = new TempDir();
        var header = Render(dir, model, "two-stage-c-header");
        Assert.Contains($"{model.Prefix}_apply_reads", File.ReadAllText(Path.Combine(dir.Path, header)), StringComparison.Ordinal);
        dir.Write("harness.c", CHarness.Source(header, model.Prefix));

        var mode = r.FixedPointSettings.Accumulator;
        var sb = new StringBuilder();
        var outputs = new HashSet<long>();
        foreach (var cycle in TwoStageCases.Cycles(r, 200, seed: 5))
        {
            var grid = TwoStageCases.GridCodes(r, cycle);
            var run = TwoStageBitExactModel.Run(d, grid, mode);
            Assert.Equal(TwoStageCases.Reference(d, grid), (BigInteger)run.Output);
            outputs.Add(run.Output);
            sb.Append(run.Output.ToString(CultureInfo.InvariantCulture));
            foreach (var c in cycle)
            {
                sb.Append(' ').Append(c.ToString(CultureInfo.InvariantCulture));
            }

            sb.Append('\n');
        }

        // The worst cases reach the proved output extremes: the vectors are not all near zero.
        var output = d.Proof.Checks.Single(c => c.Name == "output");
        Assert.Contains(outputs, o => o == output.MinValue || o == output.MaxValue);
        dir.Write("vectors.txt", sb.ToString());
        ToolRunner.RunOk(gcc, dir.Path, Emitted.Timeout, "-std=c99", "-Wall", "-Wextra", "-Wpedantic", "-Werror", "-O2", "-o", "h_c", "harness.c");
        ToolRunner.RunPass(Path.Combine(dir.Path, "h_c"), dir.Path, Emitted.Timeout, "vectors.txt");

        // Negative control: the same harness fails when one expected output is off by one.
        var lines = sb.ToString().Split('\n');
        var first = lines[0].Split(' ');
        first[0] = (long.Parse(first[0], CultureInfo.InvariantCulture) + 1).ToString(CultureInfo.InvariantCulture);
        lines[0] = string.Join(' ', first);
        dir.Write("tampered.txt", string.Join('\n', lines));
        Assert.NotEqual(0, ToolRunner.Run(Path.Combine(dir.Path, "h_c"), dir.Path, Emitted.Timeout, "tampered.txt").ExitCode);
    }

    [Fact]
    public void Vhdl_package_analyses_with_Werror_and_returns_every_table_entry() => Vhdl(TwoStageCases.Skipper(), tamper: false);

    [Fact]
    public void Vhdl_bench_fails_when_one_read_weight_differs() => Vhdl(TwoStageCases.Skipper(), tamper: true);

    [Fact]
    public void Sv_package_and_Verilog_include_lint_in_Verilator_and_return_every_entry_in_Icarus()
    {
        var verilator = Tools.Require("verilator");
        var iverilog = Tools.Require("iverilog");
        var vvp = Tools.Require("vvp");
        var r = TwoStageCases.SharedReset();
        var d = r.TwoStage!.Quantised;
        var model = TwoStageCases.Model(r);
        var p = model.Prefix;
        using var dir = new TempDir();
        var pkgFile = Render(dir, model, "two-stage-sv-package");
        var pkg = Path.GetFileNameWithoutExtension(pkgFile);
        var inc = Render(dir, model, "two-stage-verilog-include");
        var bits = r.FixedPointSettings.CoefBits;
        string[] ports = ["  input logic [7:0] idx", $"  output logic signed [{bits - 1}:0] o_table", $"  output logic signed [{bits - 1}:0] o_weight", "  output logic [31:0] o_offset"];
        dir.Write("lint_sv.sv", HdlBenches.LintWrapper("lint_sv", "", File.ReadAllText(Path.Combine(dir.Path, pkgFile)), pkg + "::", ports,
            [$"assign o_table = {pkg}::table_at(int'(idx));", $"assign o_weight = {pkg}::read_weight_at(int'(idx));", $"assign o_offset = {pkg}::read_offset_at(int'(idx));"]));
        ToolRunner.RunOk(verilator, dir.Path, Emitted.Timeout, "--lint-only", "-Wall", "--top-module", "lint_sv", pkgFile, "lint_sv.sv");
        dir.Write("lint_vh.sv", HdlBenches.LintWrapper("lint_vh", "", File.ReadAllText(Path.Combine(dir.Path, inc)), "", ports,
            [$"`include \"{inc}\"", $"assign o_table = {p}_table_at(int'(idx));", $"assign o_weight = {p}_read_weight_at(int'(idx));", $"assign o_offset = {p}_read_offset_at(int'(idx));"]));
        ToolRunner.RunOk(verilator, dir.Path, Emitted.Timeout, "--lint-only", "-Wall", "-I.", "--top-module", "lint_vh", "lint_vh.sv");

        // Icarus: every entry read back through the include's functions equals the design's (expected values written here).
        var layout = r.TwoStage.Layout;
        var checks = new StringBuilder();
        void Check(string fn, int i, long v) => checks.Append($"    if ({fn}({i}) !== {v}) begin errors = errors + 1; $display(\"FAIL {fn}({i})\"); end\n");
        for (var i = 0; i < d.Table.Count; i++)
        {
            Check($"{p}_table_at", i, d.Table[i]);
            Check($"{p}_read_offset_at", i, layout.Offsets[i]);
        }

        for (var j = 0; j < d.ReadWeights.Count; j++)
        {
            Check($"{p}_read_weight_at", j, d.ReadWeights[j]);
        }

        dir.Write("tb.v", $$"""
            module tb;
            `include "{{inc}}"
              integer errors;
              initial begin
                errors = 0;
            {{checks}}    if (errors == 0) $display("PASS"); else $display("FAIL %0d", errors);
                $finish;
              end
            endmodule

            """);
        ToolRunner.RunOk(iverilog, dir.Path, Emitted.Timeout, "-g2005", "-I.", "-o", "tb.vvp", "tb.v");
        ToolRunner.RunPass(vvp, dir.Path, Emitted.Timeout, "-n", "tb.vvp");
    }

    private static void Vhdl(DesignResult r, bool tamper)
    {
        var ghdl = Tools.Require("ghdl");
        var d = r.TwoStage!.Quantised;
        var model = TwoStageCases.Model(r);
        using var dir = new TempDir();
        var pkgFile = Render(dir, model, "two-stage-vhdl-package");
        var pkg = Path.GetFileNameWithoutExtension(pkgFile);
        var weights = d.ReadWeights.ToArray();
        if (tamper)
        {
            weights[3] += 1;
        }

        var checks = new StringBuilder();
        for (var i = 0; i < d.Table.Count; i++)
        {
            checks.Append($"    if to_integer(table_at({i})) /= {d.Table[i]} or READ_OFFSET({i}) /= {r.TwoStage.Layout.Offsets[i]} then errors := errors + 1; end if;\n");
        }

        for (var j = 0; j < weights.Length; j++)
        {
            checks.Append($"    if to_integer(read_weight_at({j})) /= {weights[j]} then errors := errors + 1; end if;\n");
        }

        dir.Write("tb.vhd", $"""
            library ieee;
            use ieee.numeric_std.all;
            use std.env.all;
            use work.{pkg}.all;

            entity tb is
            end entity tb;

            architecture sim of tb is
            begin
              process
                variable errors : natural := 0;
              begin
            {checks}    if errors = 0 then
                  report "PASS";
                  stop(0);
                else
                  report "FAIL " & integer'image(errors);
                  stop(1);
                end if;
                wait;
              end process;
            end architecture sim;

            """);
        Directory.CreateDirectory(Path.Combine(dir.Path, "w"));
        ToolRunner.RunOk(ghdl, dir.Path, Emitted.Timeout, "-a", "--std=08", "-Werror", "--workdir=w", pkgFile);
        ToolRunner.RunOk(ghdl, dir.Path, Emitted.Timeout, "-a", "--std=08", "--workdir=w", "tb.vhd");
        ToolRunner.RunOk(ghdl, dir.Path, Emitted.Timeout, "-e", "--std=08", "--workdir=w", "tb");
        if (!tamper)
        {
            ToolRunner.RunPass(ghdl, dir.Path, Emitted.Timeout, "-r", "--std=08", "--workdir=w", "tb");
            return;
        }

        var run = ToolRunner.Run(ghdl, dir.Path, Emitted.Timeout, "-r", "--std=08", "--workdir=w", "tb");
        Assert.NotEqual(0, run.ExitCode);
        Assert.DoesNotContain("PASS", run.StdOut + run.StdErr, StringComparison.Ordinal);
    }
}
