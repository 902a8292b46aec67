namespace CoefGen.Cli.Tests.Vectors;

public class VectorsAndVerifyCommandTests
{
    private const string Example = "slowscan_spectro.toml";

    private static string Generate(int pixels = 60, string seed = "5")
    {
        var dir = RepoPaths.TempDir();
        var r = CliRunner.Run("vectors", RepoPaths.Example(Example), "--out", dir, "--pixels", pixels.ToString(System.Globalization.CultureInfo.InvariantCulture), "--seed", seed);
        Assert.True(r.ExitCode == 0, r.Error);
        return dir;
    }

    private static string[] ExpectedOutputs(string dir) =>
        File.ReadAllLines(Path.Combine(dir, "expected.txt")).Select(l => l.Split(' ')[0]).ToArray();

    private static string Dump(string dir, IEnumerable<string> lines)
    {
        var path = Path.Combine(dir, "dut.txt");
        File.WriteAllText(path, string.Join("\n", lines) + "\n");
        return path;
    }

    private static CliRunner.Result Verify(string dir, string dump, params string[] extra) =>
        CliRunner.Run(["verify", RepoPaths.Example(Example), "--vectors", dir, "--dut", dump, .. extra]);

    [Fact]
    public void Vectors_twice_with_the_same_seed_write_identical_bytes()
    {
        var a = Generate();
        var b = Generate();
        var names = Directory.GetFiles(a).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToArray();
        Assert.Contains("manifest.json", names);
        Assert.Contains("red_ch0_datapath.vhd", names);
        Assert.Contains("red_ch0_tb.v", names);
        Assert.Equal(names, Directory.GetFiles(b).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToArray());
        foreach (var n in names)
        {
            Assert.Equal(File.ReadAllBytes(Path.Combine(a, n!)), File.ReadAllBytes(Path.Combine(b, n!)));
        }

        var c = Generate(seed: "6");
        Assert.NotEqual(File.ReadAllBytes(Path.Combine(a, "stimulus.hex")), File.ReadAllBytes(Path.Combine(c, "stimulus.hex")));
    }

    [Fact]
    public void Verify_accepts_the_expected_outputs_as_decimal_and_as_hex()
    {
        var dir = Generate();
        var r = Verify(dir, Dump(dir, ExpectedOutputs(dir)));
        Assert.True(r.ExitCode == 0, r.Output + r.Error);
        Assert.Contains("compared 60 pixels (decimal", r.Output, StringComparison.Ordinal);
        var hex = Verify(dir, Path.Combine(dir, "expected_out.hex"));
        Assert.True(hex.ExitCode == 0, hex.Output + hex.Error);
        Assert.Contains("(hex dump", hex.Output, StringComparison.Ordinal);
    }

    [Fact]
    public void A_one_LSB_change_is_a_mismatch_naming_pixel_expected_got_and_difference()
    {
        var dir = Generate();
        var lines = ExpectedOutputs(dir);
        var expected = long.Parse(lines[17], System.Globalization.CultureInfo.InvariantCulture);
        lines[17] = (expected + 1).ToString(System.Globalization.CultureInfo.InvariantCulture);
        var r = Verify(dir, Dump(dir, lines));
        Assert.Equal(1, r.ExitCode);
        Assert.Contains("MISMATCH in 1 of 60 pixels", r.Output, StringComparison.Ordinal);
        Assert.Matches($@"\s17\s+{expected}\s+{expected + 1}\s+\+1", r.Output);
        Assert.Contains("numbered from 0", r.Output, StringComparison.Ordinal); // line 18 of the dump is pixel 17
    }

    [Fact]
    public void Many_mismatches_list_the_first_20_and_count_the_rest()
    {
        var dir = Generate();
        var r = Verify(dir, Dump(dir, ExpectedOutputs(dir).Select(l => (long.Parse(l, System.Globalization.CultureInfo.InvariantCulture) - 2).ToString(System.Globalization.CultureInfo.InvariantCulture))));
        Assert.Equal(1, r.ExitCode);
        Assert.Contains("... and 40 more", r.Output, StringComparison.Ordinal);
        Assert.Equal(20, r.Output.Split('\n').Count(l => l.TrimEnd().EndsWith(" -2", StringComparison.Ordinal)));
    }

    [Fact]
    public void A_dump_with_the_wrong_count_is_bad_input()
    {
        var dir = Generate();
        var r = Verify(dir, Dump(dir, ExpectedOutputs(dir).Skip(1)));
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("CG4014", r.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void An_unparsable_dump_line_is_bad_input_with_its_line_number()
    {
        var dir = Generate();
        var lines = ExpectedOutputs(dir);
        lines[8] = "XXXX";
        var dump = Dump(dir, lines);
        var r = Verify(dir, dump);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains($"{dump}:9:1: error CG4012", r.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Vectors_of_another_readout_file_are_bad_input()
    {
        var dir = Generate();
        var r = CliRunner.Run("verify", RepoPaths.Example("fast_imaging.toml"), "--vectors", dir, "--dut", Dump(dir, ExpectedOutputs(dir)));
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("CG4003", r.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_pixel_count_of_zero_is_bad_input()
    {
        var r = CliRunner.Run("vectors", RepoPaths.Example(Example), "--out", RepoPaths.TempDir(), "--pixels", "0");
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("CG4020", r.Error, StringComparison.Ordinal);
    }
}
