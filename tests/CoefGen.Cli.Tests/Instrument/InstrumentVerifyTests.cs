namespace CoefGen.Cli.Tests.Instrument;

/// <summary>`verify INSTRUMENT --vectors DIR --dut-dir DUMPS`: every table's dump against its own vectors.</summary>
public class InstrumentVerifyTests
{
    /// <summary>The example instrument's vectors (40 pixels) and, as the DUT dumps, each table's own expected outputs.</summary>
    private static (string Instrument, string Vectors, string Dumps) Prepared()
    {
        var dir = InstrumentCommandTests.CopyExample();
        var instrument = Path.Combine(dir, "cam4.toml");
        var vectors = Path.Combine(dir, "v");
        var r = CliRunner.Run("vectors", instrument, "--out", vectors, "--pixels", "40");
        Assert.True(r.ExitCode == 0, r.Error);
        var dumps = Directory.CreateDirectory(Path.Combine(dir, "dumps")).FullName;
        foreach (var table in Directory.GetDirectories(vectors))
        {
            File.Copy(Path.Combine(table, "expected_out.hex"), Path.Combine(dumps, Path.GetFileName(table) + ".txt"));
        }

        return (instrument, vectors, dumps);
    }

    [Fact]
    public void Every_table_matching_exits_0_and_one_changed_output_in_one_table_exits_1_naming_that_table_only()
    {
        var (instrument, vectors, dumps) = Prepared();
        var ok = CliRunner.Run("verify", instrument, "--vectors", vectors, "--dut-dir", dumps);
        Assert.True(ok.ExitCode == 0, ok.Output + ok.Error);
        Assert.Equal(16, ok.Output.Split('\n').Count(l => l.Contains(" match, 40 pixels (outputs)", StringComparison.Ordinal)));
        Assert.Contains("all 16 tables match", ok.Output, StringComparison.Ordinal);
        Assert.Equal(ok.Output, CliRunner.Run("verify", instrument, "--vectors", vectors, "--dut-dir", dumps).Output);

        // Flip the lowest bit of pixel 7 of binned/c: that table, and only it, mismatches in one pixel.
        var dump = Path.Combine(dumps, "binned_c.txt");
        var lines = File.ReadAllLines(dump);
        var word = Convert.ToUInt64(lines[7], 16) ^ 1;
        lines[7] = word.ToString("x" + lines[7].Length.ToString(System.Globalization.CultureInfo.InvariantCulture), System.Globalization.CultureInfo.InvariantCulture);
        File.WriteAllLines(dump, lines);
        var bad = CliRunner.Run("verify", instrument, "--vectors", vectors, "--dut-dir", dumps);
        Assert.Equal(1, bad.ExitCode);
        Assert.Matches(@"binned/c\s+MISMATCH, 1 outputs of 40 pixels differ", bad.Output);
        Assert.Equal(15, bad.Output.Split('\n').Count(l => l.Contains(" match, 40 pixels", StringComparison.Ordinal)));
        Assert.Contains("table binned/c:\n", bad.Output, StringComparison.Ordinal);
        Assert.Matches(@"\n\s+7\s+-?\d+\s+-?\d+\s+[+-]1\n", bad.Output);
        Assert.Contains("1 of 16 tables mismatch", bad.Output, StringComparison.Ordinal);
    }

    [Fact]
    public void A_missing_dump_or_the_wrong_options_or_a_bad_instrument_is_a_located_error_exit_2()
    {
        var (instrument, vectors, dumps) = Prepared();
        File.Delete(Path.Combine(dumps, "normal_c.txt"));
        var missing = CliRunner.Run("verify", instrument, "--vectors", vectors, "--dut-dir", dumps);
        Assert.Equal(2, missing.ExitCode);
        Assert.Contains("normal_c.txt: error CG", missing.Error, StringComparison.Ordinal);
        Assert.Contains("file not found", missing.Error, StringComparison.Ordinal);
        Assert.Matches(@"normal/c\s+bad input", missing.Output);
        Assert.DoesNotContain("   at ", missing.Error, StringComparison.Ordinal);

        var dut = CliRunner.Run("verify", instrument, "--vectors", vectors, "--dut", Path.Combine(dumps, "slow_a.txt"));
        Assert.Equal(2, dut.ExitCode);
        Assert.Contains("--dut-dir: error CG0010", dut.Error, StringComparison.Ordinal);

        var readout = CliRunner.Run("verify", RepoPaths.Example("fast_imaging.toml"), "--vectors", vectors, "--dut-dir", dumps);
        Assert.Equal(2, readout.ExitCode);
        Assert.Contains("--dut-dir: error CG0010", readout.Error, StringComparison.Ordinal);

        File.WriteAllText(instrument, File.ReadAllText(instrument).Replace("timing.pixel_ns = 4000", "timing.pixle_ns = 4000", StringComparison.Ordinal));
        var typo = CliRunner.Run("verify", instrument, "--vectors", vectors, "--dut-dir", dumps);
        Assert.Equal(2, typo.ExitCode);
        Assert.Matches(@"cam4\.toml:\d+:\d+: error CG", typo.Error);
        Assert.Equal("", typo.Output);
    }
}
