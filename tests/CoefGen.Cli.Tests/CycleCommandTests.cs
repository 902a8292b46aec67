using System.Text.Json;

namespace CoefGen.Cli.Tests;

public class CycleCommandTests
{
    private static string Cycle(string name) => RepoPaths.Example(Path.Combine("cycles", name));

    [Theory]
    [InlineData("skipper_reads.toml", "128 windows in 64 reset groups, 64 repeated reads")]
    [InlineData("fowler_ir.toml", "2 windows in 1 reset group")]
    [InlineData("up_the_ramp.toml", "32 windows in 1 reset group, 32 repeated reads")]
    [InlineData("cms_rows.toml", "8 windows in 4 reset groups, 4 repeated reads")]
    [InlineData("skipper_two_stage.toml", "400 windows in 200 reset groups, 200 repeated reads")]
    public void Design_of_each_cycle_example_lists_its_windows_and_a_safe_proof(string example, string cycleLine)
    {
        var r = CliRunner.Run("design", Cycle(example));
        Assert.True(r.ExitCode == 0, r.Error);
        Assert.Contains(cycleLine, r.Output, StringComparison.Ordinal);
        Assert.Contains("boxcar (window means, least squares)", r.Output, StringComparison.Ordinal);
        Assert.Contains("SAFE for every input", r.Output, StringComparison.Ordinal);
    }

    [Fact]
    public void Ramp_design_prints_the_noise_against_signal_level()
    {
        var r = CliRunner.Run("design", Cycle("up_the_ramp.toml"));
        Assert.True(r.ExitCode == 0, r.Error);
        Assert.Contains("Noise against signal level", r.Output, StringComparison.Ordinal);
        Assert.Contains("shot noise", r.Output, StringComparison.Ordinal);
    }

    [Fact]
    public void Design_of_repeated_reads_prints_the_proved_two_stage_integer_form_in_text_and_json()
    {
        var text = CliRunner.Run("design", Cycle("skipper_reads.toml"));
        Assert.True(text.ExitCode == 0, text.Error);
        Assert.Contains("two-stage proof SAFE for every input", text.Output, StringComparison.Ordinal);
        Assert.Contains("noise penalty against the real two-stage weights", text.Output, StringComparison.Ordinal);
        var json = CliRunner.Run("design", Cycle("skipper_reads.toml"), "--json");
        Assert.True(json.ExitCode == 0, json.Error);
        using var doc = JsonDocument.Parse(json.Output);
        var integer = doc.RootElement.GetProperty("two_stage").GetProperty("integer");
        Assert.True(integer.GetProperty("proof").GetProperty("safe").GetBoolean());
        Assert.Equal(0L, integer.GetProperty("per_read_table").EnumerateArray().Sum(v => v.GetInt64()));
        Assert.Equal(64, integer.GetProperty("read_weights").GetArrayLength());
        using var plain = JsonDocument.Parse(CliRunner.Run("design", Cycle("cms_rows.toml"), "--json").Output);
        Assert.Equal(plain.RootElement.TryGetProperty("two_stage", out _), TwoStageExpected("cms_rows"));
    }

    // cms_rows has several reads per row time: it has a two-stage form exactly when the text design prints one.
    private static bool TwoStageExpected(string name) => CliRunner.Run("design", Cycle(name + ".toml")).Output.Contains("Two-stage form", StringComparison.Ordinal);

    [Fact]
    public void Design_json_of_a_cycle_carries_its_windows_and_groups()
    {
        var r = CliRunner.Run("design", Cycle("cms_rows.toml"), "--json");
        Assert.True(r.ExitCode == 0, r.Error);
        using var doc = JsonDocument.Parse(r.Output);
        var cycle = doc.RootElement.GetProperty("readout").GetProperty("timing").GetProperty("cycle");
        Assert.Equal(4, cycle.GetProperty("group_count").GetInt32());
        Assert.Equal(8, cycle.GetProperty("windows").GetArrayLength());
        Assert.Equal(240, doc.RootElement.GetProperty("samples").GetProperty("group").GetArrayLength());
    }

    [Fact]
    public void A_repetition_past_the_cycle_exits_2_with_a_located_error_and_writes_nothing()
    {
        var dir = RepoPaths.TempDir();
        var path = Path.Combine(dir, "bad.toml");
        File.WriteAllText(path, File.ReadAllText(Cycle("cms_rows.toml")).Replace("times = 4", "times = 5", StringComparison.Ordinal));
        var r = CliRunner.Run("emit", path, "-o", Path.Combine(dir, "out"));
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("bad.toml:", r.Error, StringComparison.Ordinal);
        Assert.Contains("CG1252", r.Error, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", r.Error, StringComparison.Ordinal);
        Assert.False(Directory.Exists(Path.Combine(dir, "out")));
    }

    [Fact]
    public void Report_of_a_cycle_lists_its_windows_and_sweeps_take_the_read_count()
    {
        var dir = RepoPaths.TempDir();
        var r = CliRunner.Run("report", Cycle("cms_rows.toml"), "-o", dir);
        Assert.True(r.ExitCode == 0, r.Error);
        var md = File.ReadAllText(Path.Combine(dir, "report.md"));
        Assert.Contains("window 'signal#3' (charge after its transfer, reset group 3) start", md, StringComparison.Ordinal);

        var sweep = CliRunner.Run("sweep", Cycle("cms_rows.toml"), "--vary", "timing.repeat.times=1,4", "--json");
        Assert.True(sweep.ExitCode == 0, sweep.Error);
        using var doc = JsonDocument.Parse(sweep.Output);
        Assert.Equal(2, doc.RootElement.GetProperty("points").GetArrayLength());
    }

    [Fact]
    public void Window_searches_refuse_a_cycle_with_a_located_error()
    {
        // cms_rows' read is a pedestal and a signal window, which --split-pixel-time now splits; a ramp has no such split.
        var r = CliRunner.Run("sweep", Cycle("up_the_ramp.toml"), "--split-pixel-time");
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("CG1255", r.Error, StringComparison.Ordinal);
    }
}
