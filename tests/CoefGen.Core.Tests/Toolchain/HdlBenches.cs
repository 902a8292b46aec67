using System.Text;
using System.Text.RegularExpressions;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>Testbenches and lint wrappers for the emitted HDL; each bench prints PASS or fails the run.</summary>
public static partial class HdlBenches
{
    /// <summary>VHDL-2008: every coefficient via coef_at and every SAMPLE_INDEX entry against the vector file.</summary>
    public static string VhdlBench(string pkg) => $$"""
        library ieee;
        use ieee.std_logic_1164.all;
        use ieee.numeric_std.all;
        use std.textio.all;
        use work.{{pkg}}.all;

        entity tb is
          generic (VEC_FILE : string := "coefs.txt");
        end entity tb;

        architecture sim of tb is
        begin
          process
            file f : text;
            variable l : line;
            variable o : line;
            variable v : std_logic_vector(COEF_BITS - 1 downto 0);
            variable idx : integer;
            variable good : boolean;
            variable errors : natural := 0;
            variable n : natural := 0;
          begin
            file_open(f, VEC_FILE, read_mode);
            while not endfile(f) loop
              readline(f, l);
              hread(l, v, good);
              assert good report "bad hex on vector line " & integer'image(n + 1) severity failure;
              read(l, idx, good);
              assert good report "bad index on vector line " & integer'image(n + 1) severity failure;
              if n >= COEF_COUNT or coef_at(n) /= signed(v) or SAMPLE_INDEX(n) /= idx then
                errors := errors + 1;
                report "mismatch at coefficient " & integer'image(n) severity note;
              end if;
              n := n + 1;
            end loop;
            if n /= COEF_COUNT then
              errors := errors + 1;
            end if;
            if errors = 0 then
              write(o, string'("PASS"));
              writeline(output, o);
              std.env.finish(0);
            else
              write(o, string'("FAIL ") & integer'image(errors));
              writeline(output, o);
              std.env.finish(1);
            end if;
            wait;
          end process;
        end architecture sim;

        """;

    /// <summary>SystemVerilog bench: coef_at and sample_index_at against $readmemh files; $fatal(1) on mismatch.</summary>
    public static string SvBench(string pkg, int coefBits, int count) => $$"""
        module tb;
          logic [{{coefBits - 1}}:0] coef_mem [0:{{count - 1}}];
          logic [31:0] index_mem [0:{{count - 1}}];
          integer i;
          integer errors;
          initial begin
            errors = 0;
            $readmemh("coefs.hex", coef_mem);
            $readmemh("index.hex", index_mem);
            for (i = 0; i < {{count}}; i = i + 1) begin
              if ({{pkg}}::coef_at(i) !== $signed(coef_mem[i]) || {{pkg}}::sample_index_at(i) !== $signed(index_mem[i])) begin
                errors = errors + 1;
              end
            end
            if ({{pkg}}::COEF_COUNT != {{count}}) errors = errors + 1;
            if (errors != 0) $fatal(1, "FAIL %0d mismatches", errors);
            $display("PASS");
            $finish;
          end
        endmodule

        """;

    /// <summary>Verilog-2001 bench for the include, same checks.</summary>
    public static string VerilogBench(string include, string prefix, int coefBits, int count) => $$"""
        module tb;
        `include "{{include}}"
          reg [{{coefBits - 1}}:0] coef_mem [0:{{count - 1}}];
          reg [31:0] index_mem [0:{{count - 1}}];
          integer i;
          integer errors;
          initial begin
            errors = 0;
            $readmemh("coefs.hex", coef_mem);
            $readmemh("index.hex", index_mem);
            for (i = 0; i < {{count}}; i = i + 1) begin
              if ({{prefix}}_coef_at(i) !== $signed(coef_mem[i]) || {{prefix}}_sample_index_at(i) !== $signed(index_mem[i])) begin
                errors = errors + 1;
              end
            end
            if ({{prefix.ToUpperInvariant()}}_COEF_COUNT != {{count}}) errors = errors + 1;
            if (errors != 0) $fatal(1, "FAIL %0d mismatches", errors);
            $display("PASS");
            $finish;
          end
        endmodule

        """;

    /// <summary>
    /// A lint wrapper that uses every localparam found in <paramref name="source"/> (so Verilator's
    /// UNUSEDPARAM has nothing to say) plus the given function and array uses.
    /// </summary>
    public static string LintWrapper(string moduleName, string header, string source, string scope, IEnumerable<string> extraPorts, IEnumerable<string> extraAssigns)
    {
        var names = LocalparamName().Matches(source).Select(m => m.Groups[1].Value).Distinct().ToList();
        var sb = new StringBuilder();
        sb.Append(header);
        sb.Append("module ").Append(moduleName).Append(" (\n");
        var ports = names.Select(n => $"  output logic [63:0] o_{n}").Concat(extraPorts).ToList();
        sb.Append(string.Join(",\n", ports)).Append("\n);\n");
        if (scope.Length == 0)
        {
            sb.Append("/* verilator lint_off DECLFILENAME */\n");
        }

        foreach (var n in names.Where(n => n is not ("COEF" or "SAMPLE_INDEX")))
        {
            sb.Append($"  assign o_{n} = 64'({scope}{n});\n");
        }

        foreach (var a in extraAssigns)
        {
            sb.Append("  ").Append(a).Append('\n');
        }

        sb.Append("endmodule\n");
        return sb.ToString();
    }

    [GeneratedRegex(@"localparam\s+(?:[a-z]+\s+)*(?:signed\s+)?(?:\[[^\]]*\]\s*)?(?:[a-z_]+_t\s+)?([A-Z][A-Z0-9_]*)\s*(?:\[[^\]]*\]\s*)?=")]
    private static partial Regex LocalparamName();
}
