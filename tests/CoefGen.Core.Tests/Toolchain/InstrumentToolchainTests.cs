using System.Globalization;
using System.Text;
using CoefGen.Core.Emit;
using CoefGen.Core.Instrument;
using CoefGen.Core.Tests.Emit;
using CoefGen.Core.Tests.Instrument;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// The combined packages of the example instrument (16 tables) compile with gcc -Werror, GHDL -Werror, Verilator -Wall and
/// Icarus, and hold exactly each table's numbers: the C reference function against the big-integer reference per table,
/// the HDL packages entry by entry against vectors written from the designs.
/// </summary>
public class InstrumentToolchainTests
{
    private static InstrumentDesign D => ExampleInstrument.Shipped;

    [Fact]
    public void C_tables_apply_matches_the_reference_in_every_table()
    {
        var gcc = Tools.Require("gcc");
        using var dir = new TempDir();
        var header = InstrumentRender.Write(dir, "instrument-c-header");
        var sb = new StringBuilder();
        foreach (var t in D.Tables)
        {
            var d = t.Result.Datapath;
            foreach (var codes in Vectors.Codes(d, 40, seed: 5 + t.Index))
            {
                sb.Append(CultureInfo.InvariantCulture, $"{t.Index} {ReferenceArithmetic.Apply(d, codes)} {d.PixelSamples}");
                foreach (var c in codes)
                {
                    sb.Append(' ').Append(c.ToString(CultureInfo.InvariantCulture));
                }

                sb.Append('\n');
            }
        }

        dir.Write("vectors.txt", sb.ToString());
        dir.Write("harness.c", $$"""
            #include <stdio.h>
            #include "{{header}}"

            int main(int argc, char **argv)
            {
                FILE *f;
                long n = 0, bad = 0;
                int32_t codes[CAM4_MAX_PIXEL_SAMPLES];
                if (argc != 2 || (f = fopen(argv[1], "r")) == NULL) {
                    return 2;
                }
                for (;;) {
                    int t, count, i;
                    long long expect, c;
                    if (fscanf(f, "%d %lld %d", &t, &expect, &count) != 3) {
                        break;
                    }
                    if (count != CAM4_PIXEL_SAMPLES[t]) {
                        return 3;
                    }
                    for (i = 0; i < count; ++i) {
                        if (fscanf(f, "%lld", &c) != 1) {
                            return 2;
                        }
                        codes[i] = (int32_t)c;
                    }
                    if ((long long)cam4_tables_apply(t, codes) != expect) {
                        ++bad;
                    }
                    ++n;
                }
                fclose(f);
                if (CAM4_TABLE_INDEX[CAM4_MODE_FAST][CAM4_CHANNEL_B] != 13 || n != {{D.Tables.Count * 47}} || bad != 0) {
                    printf("FAIL %ld of %ld\n", bad, n);
                    return 1;
                }
                printf("PASS %ld\n", n);
                return 0;
            }

            """);
        ToolRunner.RunOk(gcc, dir.Path, Emitted.Timeout, "-std=c99", "-Wall", "-Wextra", "-Wpedantic", "-Werror", "-O1", "-o", "h", "harness.c");
        ToolRunner.RunPass(Path.Combine(dir.Path, "h"), dir.Path, Emitted.Timeout, "vectors.txt");
    }

    /// <summary>One line per table entry: table, k, coefficient, sample index (padding included: coefficient 0, index 0).</summary>
    private static string Entries()
    {
        var sb = new StringBuilder();
        var max = D.MaxCoefficientCount;
        foreach (var t in D.Tables)
        {
            var d = t.Result.Datapath;
            for (var k = 0; k < max; k++)
            {
                var (c, i) = k < d.Coefficients.Count ? (d.Coefficients[k], d.SampleIndex[k]) : (0L, 0);
                sb.Append(CultureInfo.InvariantCulture, $"{t.Index} {k} {c} {i} {d.Coefficients.Count} {d.Shift}\n");
            }
        }

        return sb.ToString();
    }

    [Fact]
    public void Vhdl_package_analyses_and_holds_every_entry_of_every_table()
    {
        var ghdl = Tools.Require("ghdl");
        using var dir = new TempDir();
        var pkg = InstrumentRender.Write(dir, "instrument-vhdl-package");
        dir.Write("entries.txt", Entries());
        dir.Write("tb.vhd", """
            library ieee;
            use ieee.std_logic_1164.all;
            use ieee.numeric_std.all;
            use std.textio.all;
            use work.cam4_tables_pkg.all;

            entity tb is
            end entity tb;

            architecture sim of tb is
            begin
              process
                file f : text;
                variable l : line;
                variable t, k, c, i, n, s : integer;
                variable errors : natural := 0;
                variable lines : natural := 0;
              begin
                file_open(f, "entries.txt", read_mode);
                while not endfile(f) loop
                  readline(f, l);
                  read(l, t); read(l, k); read(l, c); read(l, i); read(l, n); read(l, s);
                  if coef_at(t, k) /= to_signed(c, COEF_BITS) or SAMPLE_INDEX(t, k) /= i or COEF_COUNT(t) /= n or SHIFT(t) /= s then
                    errors := errors + 1;
                  end if;
                  lines := lines + 1;
                end loop;
                if TABLE_INDEX(MODE_FAST, CHANNEL_B) /= 13 or lines /= TABLE_COUNT * MAX_COEF_COUNT then
                  errors := errors + 1;
                end if;
                assert errors = 0 report "FAIL " & integer'image(errors) & " mismatches" severity failure;
                report "PASS";
                wait;
              end process;
            end architecture sim;

            """);
        Directory.CreateDirectory(Path.Combine(dir.Path, "w"));
        ToolRunner.RunOk(ghdl, dir.Path, Emitted.Timeout, "-a", "--std=08", "-Werror", "--workdir=w", pkg);
        ToolRunner.RunOk(ghdl, dir.Path, Emitted.Timeout, "-a", "--std=08", "-Werror", "--workdir=w", "tb.vhd");
        ToolRunner.RunOk(ghdl, dir.Path, Emitted.Timeout, "-e", "--std=08", "--workdir=w", "tb");
        ToolRunner.RunPass(ghdl, dir.Path, Emitted.Timeout, "-r", "--std=08", "--workdir=w", "tb");
    }

    [Fact]
    public void Sv_package_lints_in_verilator_and_holds_every_entry_in_icarus()
    {
        var verilator = Tools.Require("verilator");
        var iverilog = Tools.Require("iverilog");
        var vvp = Tools.Require("vvp");
        using var dir = new TempDir();
        var pkg = InstrumentRender.Write(dir, "instrument-sv-package");
        dir.Write("lint_top.sv", """
            module lint_top (
              input logic [1:0] mode,
              input logic [1:0] channel,
              input logic [7:0] k,
              output cam4_tables_pkg::coef_t o_coef,
              output logic [31:0] o_index,
              output logic [31:0] o_count,
              output logic [31:0] o_shift,
              output cam4_tables_pkg::constant_t o_pm,
              output cam4_tables_pkg::constant_t o_rc
            );
              int t;
              assign t = cam4_tables_pkg::table_index_at(int'(mode), int'(channel));
              assign o_coef = cam4_tables_pkg::coef_at(t, int'(k));
              assign o_index = 32'(cam4_tables_pkg::sample_index_at(t, int'(k)));
              assign o_count = 32'(cam4_tables_pkg::coef_count_at(t));
              assign o_shift = 32'(cam4_tables_pkg::shift_at(t));
              assign o_pm = cam4_tables_pkg::post_multiplier_at(t);
              assign o_rc = cam4_tables_pkg::rounding_constant_at(t);
            endmodule

            """);
        // Package constants a wrapper does not read are not a defect of the package.
        ToolRunner.RunOk(verilator, dir.Path, Emitted.Timeout, "--lint-only", "-Wall", "-Wno-UNUSEDPARAM", "--top-module", "lint_top", pkg, "lint_top.sv");

        dir.Write("entries.txt", Entries());
        dir.Write("tb.sv", """
            module tb;
              integer f, r, t, k, c, i, n, s, errors, lines;
              initial begin
                errors = 0;
                lines = 0;
                f = $fopen("entries.txt", "r");
                while (!$feof(f)) begin
                  r = $fscanf(f, "%d %d %d %d %d %d\n", t, k, c, i, n, s);
                  if (r == 6) begin
                    if (cam4_tables_pkg::coef_at(t, k) !== c[cam4_tables_pkg::COEF_BITS-1:0] || cam4_tables_pkg::sample_index_at(t, k) != i
                        || cam4_tables_pkg::coef_count_at(t) != n || cam4_tables_pkg::shift_at(t) != s) errors = errors + 1;
                    lines = lines + 1;
                  end
                end
                if (cam4_tables_pkg::table_index_at(cam4_tables_pkg::MODE_FAST, cam4_tables_pkg::CHANNEL_B) != 13) errors = errors + 1;
                if (lines != cam4_tables_pkg::TABLE_COUNT * cam4_tables_pkg::MAX_COEF_COUNT) errors = errors + 1;
                if (errors != 0) $fatal(1, "FAIL %0d mismatches", errors);
                $display("PASS");
                $finish;
              end
            endmodule

            """);
        ToolRunner.RunOk(iverilog, dir.Path, Emitted.Timeout, "-g2012", "-o", "tb.vvp", pkg, "tb.sv");
        ToolRunner.RunPass(vvp, dir.Path, Emitted.Timeout, "-n", "tb.vvp");
    }
}
