using System.Text.Json;

namespace CoefGen.Cli.Tests;

public class DesignCommandTests
{
    [Theory]
    [InlineData("slowscan_spectro.toml")]
    [InlineData("fast_imaging.toml")]
    [InlineData("ir_measured.toml")]
    public void Design_of_each_shipped_example_prints_all_three_schemes_and_a_safe_proof(string example)
    {
        var r = CliRunner.Run("design", RepoPaths.Example(example));
        Assert.True(r.ExitCode == 0, r.Error);
        Assert.Contains("boxcar", r.Output, StringComparison.Ordinal);
        Assert.Contains("weighted (", r.Output, StringComparison.Ordinal);
        Assert.Contains("optimal", r.Output, StringComparison.Ordinal);
        Assert.Contains("Noise budget", r.Output, StringComparison.Ordinal);
        Assert.Contains("SAFE for every input", r.Output, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("slowscan_spectro.toml")]
    [InlineData("fast_imaging.toml")]
    [InlineData("ir_measured.toml")]
    public void Design_json_carries_every_weight_and_optimal_is_never_worse(string example)
    {
        var r = CliRunner.Run("design", RepoPaths.Example(example), "--json");
        Assert.True(r.ExitCode == 0, r.Error);
        using var doc = JsonDocument.Parse(r.Output);
        var root = doc.RootElement;
        Assert.Equal("coefgen.design/1", root.GetProperty("schema").GetString());
        var n = root.GetProperty("samples").GetProperty("index").GetArrayLength();
        var schemes = root.GetProperty("schemes").EnumerateArray().ToArray();
        Assert.Equal(["boxcar", "weighted", "optimal"], schemes.Select(s => s.GetProperty("scheme").GetString()!).ToArray());
        var optimal = schemes[2].GetProperty("noise_e_rms").GetDouble();
        foreach (var s in schemes)
        {
            Assert.Equal(n, s.GetProperty("weights").GetArrayLength());
            Assert.True(s.GetProperty("noise_e_rms").GetDouble() >= optimal * (1 - 1e-12));
            var agreement = s.GetProperty("time_frequency_relative_difference").GetDouble();
            Assert.True(agreement < 1e-6, $"time vs frequency domain differ by {agreement}");
        }

        Assert.Equal(n, root.GetProperty("fixed_point").GetProperty("coefficients").GetArrayLength());
    }

    [Fact]
    public void Design_json_is_byte_identical_across_runs()
    {
        var a = CliRunner.Run("design", RepoPaths.Example("slowscan_spectro.toml"), "--json");
        var b = CliRunner.Run("design", RepoPaths.Example("slowscan_spectro.toml"), "--json");
        Assert.Equal(a.Output, b.Output);
    }

    [Fact]
    public void A_missing_readout_file_is_bad_input_with_exit_code_2()
    {
        var r = CliRunner.Run("design", Path.Combine(RepoPaths.TempDir(), "nope.toml"));
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("CG0002", r.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_mistyped_key_is_reported_with_its_line_and_a_suggestion_and_exit_code_2()
    {
        var dir = RepoPaths.TempDir();
        var text = File.ReadAllText(RepoPaths.Example("fast_imaging.toml")).Replace("rate_hz = ", "rate_hzz = ", StringComparison.Ordinal);
        var path = Path.Combine(dir, "bad.toml");
        File.WriteAllText(path, text);
        var line = text.Split('\n').ToList().FindIndex(l => l.StartsWith("rate_hzz", StringComparison.Ordinal)) + 1;
        var r = CliRunner.Run("design", path);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains($"bad.toml:{line}:", r.Error, StringComparison.Ordinal);
        Assert.Contains("CG1001", r.Error, StringComparison.Ordinal);
        Assert.Contains("rate_hz", r.Error, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", r.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Windows_too_far_apart_for_the_lag_tables_are_a_located_error_not_a_hang()
    {
        var dir = RepoPaths.TempDir();
        var text = File.ReadAllText(RepoPaths.Example("fast_imaging.toml"))
            .Replace("pixel_samples = 80", "pixel_samples = 50000000", StringComparison.Ordinal)
            .Replace("transfer_sample = 40", "transfer_sample = 30000000", StringComparison.Ordinal)
            .Replace("start = 46", "start = 40000000", StringComparison.Ordinal);
        var path = Path.Combine(dir, "far.toml");
        File.WriteAllText(path, text);
        var r = CliRunner.Run("design", path);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("CG1207", r.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_signal_window_that_never_sees_the_step_is_a_located_error()
    {
        var dir = RepoPaths.TempDir();
        // One signal sample exactly at the transfer instant: s = 0 there, so there is no gain to the charge.
        var text = File.ReadAllText(RepoPaths.Example("fast_imaging.toml"))
            .Replace("transfer_sample = 40", "transfer_sample = 46", StringComparison.Ordinal)
            .Replace("start = 46\ncount = 28", "start = 46\ncount = 1", StringComparison.Ordinal);
        var path = Path.Combine(dir, "nostep.toml");
        File.WriteAllText(path, text);
        var r = CliRunner.Run("design", path);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("CG1206", r.Error, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", r.Error, StringComparison.Ordinal);
    }
}
