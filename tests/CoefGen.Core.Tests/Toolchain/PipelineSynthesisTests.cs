using CoefGen.Core.Tests.Vectors;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// The pipelined datapath of ir_measured (400 coefficients of 24 bits, 64-bit accumulator) through yosys for three
/// FPGA family mappings: no latch, the coefficient ROM in block RAM (its read is registered), the multiply in the
/// family's hard multiply-accumulate block. The clear datapath's asynchronous ROM read gives no block RAM, which is
/// why the pipelined one exists (cell counts of both in README, "Synthesis (yosys)"). About 15 s in all.
/// </summary>
public class PipelineSynthesisTests
{
    private static readonly TimeSpan Timeout = TimeSpan.FromMinutes(5);

    /// <summary>(yosys pass, block RAM cells of that family, hard multiplier cell, ROM from the $readmemh image).</summary>
    public static TheoryData<string, string[], string, bool> Mappings => new()
    {
        { "synth_xilinx", ["RAMB18E1", "RAMB36E1"], "DSP48E1", false },
        { "synth_ecp5", ["DP16KD"], "MULT18X18D", true },
        { "synth_ice40 -dsp", ["SB_RAM40_4K"], "SB_MAC16", false },
    };

    [Theory]
    [MemberData(nameof(Mappings))]
    public void Pipelined_datapath_maps_the_rom_to_block_ram_and_the_multiply_to_a_hard_block(string pass, string[] ramCells, string multiplierCell, bool coefHex)
    {
        var yosys = Tools.Require("yosys");
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, ExampleDesigns.Load("ir_measured.toml"), 1);
        var top = prefix + "_pipeline";
        var chparam = coefHex ? $"chparam -set COEF_HEX 1 {top}; " : "";
        ToolRunner.RunOk(yosys, dir.Path, Timeout, "-q", "-p",
            $"read_verilog -I. {top}.v; {chparam}{pass} -top {top}; check -assert; tee -q -o stat.txt stat");
        var cells = YosysSynthesisTests.Cells(File.ReadAllText(Path.Combine(dir.Path, "stat.txt")));
        TestContext.Current.TestOutputHelper?.WriteLine($"{pass}: " + string.Join(", ", cells.Select(c => $"{c.Key} {c.Value}")));
        Assert.DoesNotContain(cells.Keys, c => c.Contains("LATCH", StringComparison.OrdinalIgnoreCase) || c is "LDCE" or "LDPE");
        Assert.True(ramCells.Sum(c => cells.GetValueOrDefault(c)) >= 1, $"no {string.Join("/", ramCells)}: " + string.Join(", ", cells.Keys));
        Assert.True(cells.GetValueOrDefault(multiplierCell) >= 1, $"no {multiplierCell}: " + string.Join(", ", cells.Keys));
    }
}
