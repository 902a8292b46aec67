using System.Globalization;
using System.Text.RegularExpressions;
using CoefGen.Core.Tests.Vectors;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// The open synthesis suite (yosys, Debian 12's 0.23) on what `vectors` writes: the reference Verilog datapath
/// for a generic gate target and three FPGA family mappings, and the emitted SV package and Verilog include as
/// plain inputs without any macro. Asserted: no latch in any mapping, the coefficient multiply in the family's
/// hard multiply-accumulate block, and the packages parse. One shipped example (the CPU is shared; about 25 s).
/// </summary>
public partial class YosysSynthesisTests
{
    private static readonly TimeSpan Timeout = TimeSpan.FromMinutes(5);

    /// <summary>(yosys pass, the cell that holds a hard multiply on that family; null for the generic target).</summary>
    public static TheoryData<string, string?> Mappings => new()
    {
        { "synth", null },
        { "synth_xilinx", "DSP48E1" },
        { "synth_ice40 -dsp", "SB_MAC16" },
        { "synth_ecp5", "MULT18X18D" },
    };

    [Theory]
    [MemberData(nameof(Mappings))]
    public void Reference_datapath_synthesises_without_latches_and_multiplies_in_a_hard_block(string pass, string? multiplierCell)
    {
        var yosys = Tools.Require("yosys");
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, ExampleDesigns.Load("fast_imaging.toml"), 1);
        var top = prefix + "_datapath";
        ToolRunner.RunOk(yosys, dir.Path, Timeout, "-q", "-p",
            $"read_verilog -I. {top}.v; {pass} -top {top}; check -assert; tee -q -o stat.txt stat");
        var cells = Cells(File.ReadAllText(Path.Combine(dir.Path, "stat.txt")));
        TestContext.Current.TestOutputHelper?.WriteLine($"{pass}: " + string.Join(", ", cells.Select(c => $"{c.Key} {c.Value}")));
        Assert.NotEmpty(cells);
        Assert.DoesNotContain(cells.Keys, c => c.Contains("LATCH", StringComparison.OrdinalIgnoreCase) || c is "LDCE" or "LDPE");
        if (multiplierCell is not null)
        {
            Assert.True(cells.GetValueOrDefault(multiplierCell) >= 1, $"no {multiplierCell}: " + string.Join(", ", cells.Keys));
        }
        else
        {
            Assert.DoesNotContain(cells.Keys, c => c.StartsWith("$mul", StringComparison.Ordinal));
        }
    }

    [Fact]
    public void Sv_package_and_verilog_include_parse_without_any_macro()
    {
        var yosys = Tools.Require("yosys");
        using var dir = new TempDir();
        var d = ExampleDesigns.Load("slowscan_spectro.toml").Datapath;
        var pkg = Emitted.Write(dir, d, "sv-package");
        var inc = Emitted.Write(dir, d, "verilog-include");
        var prefix = Path.GetFileNameWithoutExtension(pkg).Replace("_coefs_pkg", "", StringComparison.Ordinal);
        var ib = Emitted.IndexBits(d.Coefficients.Count);
        dir.Write("pkg_top.sv", $"module pkg_top(input [{ib - 1}:0] i, output signed [{d.CoefBits - 1}:0] o);\n" +
            $"  assign o = {prefix}_coefs_pkg::coef_at({{{32 - ib}'d0, i}});\nendmodule\n");
        dir.Write("inc_top.v", $"module inc_top(input [{ib - 1}:0] i, output signed [{d.CoefBits - 1}:0] o);\n" +
            $"`include \"{inc}\"\n  assign o = {prefix}_coef_at({{{32 - ib}'d0, i}});\nendmodule\n");
        ToolRunner.RunOk(yosys, dir.Path, Timeout, "-q", "-p", $"read_verilog -sv {pkg} pkg_top.sv; hierarchy -check -top pkg_top; proc; check -assert");
        ToolRunner.RunOk(yosys, dir.Path, Timeout, "-q", "-p", $"read_verilog -I. inc_top.v; hierarchy -check -top inc_top; proc; check -assert");

        // Negative control: the array form is what yosys rejects, so the default form is what makes it parse.
        var arrays = ToolRunner.Run(yosys, dir.Path, Timeout, "-q", "-p", $"read_verilog -sv -DCOEFGEN_SV_ARRAYS {pkg}");
        Assert.NotEqual(0, arrays.ExitCode);
    }

    internal static Dictionary<string, int> Cells(string stat)
    {
        var last = stat.LastIndexOf("Number of cells:", StringComparison.Ordinal);
        Assert.True(last >= 0, stat);
        var cells = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var line in stat[last..].Split('\n').Skip(1))
        {
            var m = CellLine().Match(line);
            if (!m.Success)
            {
                break;
            }

            cells[m.Groups[1].Value] = int.Parse(m.Groups[2].Value, CultureInfo.InvariantCulture);
        }

        return cells;
    }

    [GeneratedRegex(@"^\s+(\S+)\s+(\d+)\s*$")]
    private static partial Regex CellLine();
}
