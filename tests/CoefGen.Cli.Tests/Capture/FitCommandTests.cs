namespace CoefGen.Cli.Tests.Capture;

public sealed class FitCommandTests
{
    private static string Readout => RepoPaths.Example("capture_bench.toml");

    [Fact]
    public void Fit_of_the_example_capture_prints_values_a_noise_section_and_the_validation_and_writes_csv_and_svg()
    {
        var dir = RepoPaths.TempDir();
        var r = CliRunner.Run("fit", RepoPaths.Example("capture_bench_idle.i16"), "--readout", Readout, "--out", dir);
        Assert.Equal(0, r.ExitCode);
        Assert.Contains("[[noise.source]]", r.Output);
        Assert.Contains("optimal (capture)", r.Output);
        Assert.StartsWith("frequency_hz,", File.ReadAllText(Path.Combine(dir, "fit_spectrum.csv")));
        Assert.StartsWith("<svg", File.ReadAllText(Path.Combine(dir, "fit_spectrum.svg")));
    }

    [Fact]
    public void Fit_json_is_deterministic()
    {
        var a = CliRunner.Run("fit", RepoPaths.Example("capture_bench_idle.i16"), "--readout", Readout, "--json");
        var b = CliRunner.Run("fit", RepoPaths.Example("capture_bench_idle.i16"), "--readout", Readout, "--json");
        Assert.Equal(0, a.ExitCode);
        Assert.Equal(a.Output, b.Output);
        Assert.Contains("\"schema\": \"coefgen.fit/1\"", a.Output);
    }

    [Fact]
    public void A_truncated_raw_capture_exits_2_with_CG5001()
    {
        var path = Path.Combine(RepoPaths.TempDir(), "cut.i16");
        File.WriteAllBytes(path, File.ReadAllBytes(RepoPaths.Example("capture_bench_idle.i16"))[..^3]);
        var r = CliRunner.Run("fit", path, "--readout", Readout);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("CG5001", r.Error);
    }

    [Fact]
    public void A_non_numeric_csv_value_exits_2_with_its_line()
    {
        var path = Path.Combine(RepoPaths.TempDir(), "bad.csv");
        var rows = Enumerable.Range(0, 20).Select(i => string.Join(",", Enumerable.Repeat(i == 3 ? "x" : "5", 40)));
        File.WriteAllText(path, string.Join("\n", rows) + "\n");
        var r = CliRunner.Run("fit", path, "--readout", Readout);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("bad.csv:4:1: error CG5002", r.Error);
    }

    [Fact]
    public void A_csv_row_of_the_wrong_length_exits_2_with_CG5003()
    {
        var path = Path.Combine(RepoPaths.TempDir(), "short.csv");
        var rows = Enumerable.Range(0, 20).Select(i => string.Join(",", Enumerable.Repeat("5", i == 9 ? 12 : 40)));
        File.WriteAllText(path, string.Join("\n", rows) + "\n");
        var r = CliRunner.Run("fit", path, "--readout", Readout);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("short.csv:10:1: error CG5003", r.Error);
    }
}
