using System.Globalization;
using System.Text;
using CoefGen.Core.Emit;
using CoefGen.Core.Instrument;
using CoefGen.Core.Tests.Emit;
using CoefGen.Core.Tests.Instrument;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// The run-time switching reference datapath of the example instrument: a pixel stream whose table changes between
/// pixels (every table, in an order that changes mode and channel at nearly every pixel, then runs of one table),
/// simulated in Icarus and linted by Verilator; every output equals the big-integer reference of its table.
/// </summary>
public class InstrumentDatapathToolchainTests
{
    private static InstrumentDesign D => ExampleInstrument.Shipped;

    /// <summary>Pixels in stream order: (table, codes); 7 per table interleaved with stride 5 (mode and channel both change), then runs of 3.</summary>
    public static List<(int Table, long[] Codes)> Stream()
    {
        var perTable = D.Tables.Select(t => Vectors.Codes(t.Result.Datapath, 6, seed: 100 + t.Index)).ToArray();
        var n = D.Tables.Count;
        var pixels = new List<(int, long[])>();
        var used = new int[n];
        for (var i = 0; i < n * 7; i++)
        {
            var t = i * 5 % n;
            pixels.Add((t, perTable[t][used[t]++ % perTable[t].Count]));
        }

        for (var t = n - 1; t >= 0; t--)
        {
            for (var r = 0; r < 3; r++)
            {
                pixels.Add((t, perTable[t][used[t]++ % perTable[t].Count]));
            }
        }

        return pixels;
    }

    /// <summary>stimulus.txt (pixel_start, table, code as the ADC writes it, one per clock), expected.txt (table, output per pixel).</summary>
    private static (string Stimulus, string Expected, int Count) Files()
    {
        var stream = Stream();
        var stimulus = new StringBuilder();
        var expected = new StringBuilder();
        var changes = 0;
        for (var i = 0; i < stream.Count; i++)
        {
            var (t, codes) = stream[i];
            var d = D.Tables[t].Result.Datapath;
            changes += i > 0 && D.Tables[stream[i - 1].Table].ModeIndex != D.Tables[t].ModeIndex ? 1 : 0;
            var mask = (1L << d.AdcBits) - 1;
            foreach (var (c, k) in codes.Select((c, k) => (c, k)))
            {
                stimulus.Append(CultureInfo.InvariantCulture, $"{(k == 0 ? 1 : 0)} {t} {c & mask}\n");
            }

            expected.Append(CultureInfo.InvariantCulture, $"{t} {ReferenceArithmetic.Apply(d, codes)}\n");
        }

        Assert.True(changes > 50, "the stream must change mode between pixels");
        return (stimulus.ToString(), expected.ToString(), stream.Count);
    }

    [Fact]
    public void Switching_sv_datapath_has_no_mismatch_across_mode_and_channel_changes()
    {
        var verilator = Tools.Require("verilator");
        var iverilog = Tools.Require("iverilog");
        var vvp = Tools.Require("vvp");
        using var dir = new TempDir();
        var pkg = InstrumentRender.Write(dir, "instrument-sv-package");
        var dp = InstrumentRender.Write(dir, "instrument-sv-datapath");
        ToolRunner.RunOk(verilator, dir.Path, Emitted.Timeout, "--lint-only", "-Wall", "-Wno-UNUSEDPARAM", "--top-module", "cam4_tables_datapath", pkg, dp);

        var (stimulus, expected, count) = Files();
        dir.Write("stimulus.txt", stimulus);
        dir.Write("expected.txt", expected);
        var outBits = D.Settings.OutputBits;
        dir.Write("tb.sv", $$"""
            module tb;
              logic clk = 0, rst = 1, in_valid = 0, pixel_start = 0;
              logic [15:0] table_sel = 0;
              logic [{{D.Tables.Max(t => t.Result.Datapath.AdcBits) - 1}}:0] code = 0;
              logic out_valid;
              logic signed [{{outBits - 1}}:0] out_data;
              logic [15:0] out_table;
              integer fs, fe, r, ps, t, c, et, ev, got, bad;
              cam4_tables_datapath dut (.clk(clk), .rst(rst), .in_valid(in_valid), .pixel_start(pixel_start), .table_sel(table_sel),
                .code(code), .out_valid(out_valid), .out_data(out_data), .out_table(out_table));
              always #5 clk = ~clk;
              always @(posedge clk) if (out_valid) begin
                r = $fscanf(fe, "%d %d\n", et, ev);
                if (r != 2 || out_table != et || out_data != ev) bad = bad + 1;
                got = got + 1;
              end
              initial begin
                got = 0;
                bad = 0;
                fs = $fopen("stimulus.txt", "r");
                fe = $fopen("expected.txt", "r");
                @(negedge clk);
                rst = 0;
                while ($fscanf(fs, "%d %d %d\n", ps, t, c) == 3) begin
                  in_valid = 1;
                  pixel_start = ps[0];
                  table_sel = t[15:0];
                  code = c;
                  @(negedge clk);
                end
                in_valid = 0;
                repeat (4) @(negedge clk);
                if (bad != 0 || got != {{count}}) $fatal(1, "FAIL %0d mismatches, %0d outputs", bad, got);
                $display("PASS %0d pixels", got);
                $finish;
              end
            endmodule

            """);
        ToolRunner.RunOk(iverilog, dir.Path, Emitted.Timeout, "-g2012", "-o", "tb.vvp", pkg, dp, "tb.sv");
        ToolRunner.RunPass(vvp, dir.Path, Emitted.Timeout, "-n", "tb.vvp");
        AssertFailsWhenOneOutputIsWrong(dir, expected, vvp, "-n", "tb.vvp");
    }

    [Fact]
    public void Switching_vhdl_datapath_has_no_mismatch_across_mode_and_channel_changes()
    {
        var ghdl = Tools.Require("ghdl");
        using var dir = new TempDir();
        var pkg = InstrumentRender.Write(dir, "instrument-vhdl-package");
        var dp = InstrumentRender.Write(dir, "instrument-vhdl-datapath");
        var (stimulus, expected, count) = Files();
        dir.Write("stimulus.txt", stimulus);
        dir.Write("expected.txt", expected);
        dir.Write("tb.vhd", $$"""
            library ieee;
            use ieee.std_logic_1164.all;
            use ieee.numeric_std.all;
            use std.textio.all;
            use work.cam4_tables_pkg.all;

            entity tb is
            end entity tb;

            architecture sim of tb is
              signal clk : std_logic := '0';
              signal rst : std_logic := '1';
              signal in_valid : std_logic := '0';
              signal pixel_start : std_logic := '0';
              signal table_sel : natural range 0 to TABLE_COUNT - 1 := 0;
              signal code : std_logic_vector(ADC_BITS - 1 downto 0) := (others => '0');
              signal out_valid : std_logic;
              signal out_data : signed(OUTPUT_BITS - 1 downto 0);
              signal out_table : natural range 0 to TABLE_COUNT - 1;
              signal done : boolean := false;
              signal bad : natural := 0;
              signal got : natural := 0;
            begin
              clk <= not clk after 5 ns when not done;
              dut : entity work.cam4_tables_datapath port map (clk, rst, in_valid, pixel_start, table_sel, code, out_valid, out_data, out_table);

              check : process (clk)
                file fe : text open read_mode is "expected.txt";
                variable l : line;
                variable et, ev : integer;
                variable b : natural := 0;
                variable g : natural := 0;
              begin
                if rising_edge(clk) and out_valid = '1' then
                  readline(fe, l);
                  read(l, et);
                  read(l, ev);
                  if out_table /= et or out_data /= to_signed(ev, OUTPUT_BITS) then
                    b := b + 1;
                  end if;
                  g := g + 1;
                  bad <= b;
                  got <= g;
                end if;
              end process check;

              drive : process
                file fs : text open read_mode is "stimulus.txt";
                variable l : line;
                variable ps, t, c : integer;
              begin
                wait until falling_edge(clk);
                rst <= '0';
                while not endfile(fs) loop
                  readline(fs, l);
                  read(l, ps);
                  read(l, t);
                  read(l, c);
                  in_valid <= '1';
                  pixel_start <= '1' when ps = 1 else '0';
                  table_sel <= t;
                  code <= std_logic_vector(to_unsigned(c, ADC_BITS));
                  wait until falling_edge(clk);
                end loop;
                in_valid <= '0';
                for i in 1 to 4 loop
                  wait until falling_edge(clk);
                end loop;
                assert bad = 0 and got = {{count}} report "FAIL " & integer'image(bad) & " mismatches, " & integer'image(got) & " outputs" severity failure;
                report "PASS";
                done <= true;
                wait;
              end process drive;
            end architecture sim;

            """);
        Directory.CreateDirectory(Path.Combine(dir.Path, "w"));
        foreach (var f in new[] { pkg, dp, "tb.vhd" })
        {
            ToolRunner.RunOk(ghdl, dir.Path, Emitted.Timeout, "-a", "--std=08", "-Werror", "--workdir=w", f);
        }

        ToolRunner.RunOk(ghdl, dir.Path, Emitted.Timeout, "-e", "--std=08", "--workdir=w", "tb");
        ToolRunner.RunPass(ghdl, dir.Path, Emitted.Timeout, "-r", "--std=08", "--workdir=w", "tb");
        AssertFailsWhenOneOutputIsWrong(dir, expected, ghdl, "-r", "--std=08", "--workdir=w", "tb");
    }

    /// <summary>Guards against a vacuous pass: one expected output changed by one LSB must fail the simulation.</summary>
    private static void AssertFailsWhenOneOutputIsWrong(TempDir dir, string expected, string exe, params string[] args)
    {
        var lines = expected.Split('\n');
        var parts = lines[lines.Length / 2].Split(' ');
        lines[lines.Length / 2] = $"{parts[0]} {long.Parse(parts[1], CultureInfo.InvariantCulture) + 1}";
        dir.Write("expected.txt", string.Join('\n', lines));
        var r = ToolRunner.Run(exe, dir.Path, Emitted.Timeout, args);
        Assert.NotEqual(0, r.ExitCode);
        Assert.DoesNotContain("PASS", r.StdOut + r.StdErr, StringComparison.Ordinal);
    }
}
