using System.Globalization;
using System.Security.Cryptography;
using System.Text.Json;
using System.Text.RegularExpressions;
using CoefGen.Core.Formatting;

namespace CoefGen.Cli.Tests;

/// <summary>The terminal text fixes of issue 14, one test each (each failed before the fix).</summary>
public partial class TextFixTests
{
    private static readonly string Fast = RepoPaths.Example("fast_imaging.toml");

    [GeneratedRegex(@"\d(\.\d+)?[eE][+-]?\d")]
    private static partial Regex ENotation();

    [Fact]
    public void Terminal_summaries_print_no_e_notation_and_no_internal_check_names()
    {
        foreach (var example in new[] { "fast_imaging.toml", "slowscan_spectro.toml", "ir_measured.toml", "capture_bench.toml" })
        {
            var r = CliRunner.Run("design", RepoPaths.Example(example));
            Assert.True(r.ExitCode == 0, r.Error);
            var body = string.Join("\n", r.Output.Split('\n').Skip(1)); // the first line carries the file's hex SHA-256
            Assert.DoesNotMatch(ENotation(), body);
            Assert.DoesNotContain("accumulator_final", body, StringComparison.Ordinal);
            Assert.DoesNotContain("accumulator final", body, StringComparison.Ordinal);
            Assert.DoesNotContain("post multiply", body, StringComparison.Ordinal);
            Assert.Contains("final accumulator sum", body, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Sweep_axis_values_are_in_si_units()
    {
        var r = CliRunner.Run("sweep", Fast, "--vary", "adc.rate_hz=40M,80M");
        Assert.True(r.ExitCode == 0, r.Error);
        Assert.Contains("40 MHz", r.Output, StringComparison.Ordinal);
        Assert.DoesNotMatch(ENotation(), r.Output);
    }

    [Fact]
    public void An_invalid_sweep_point_has_a_short_row_and_its_diagnostic_once()
    {
        var r = CliRunner.Run("sweep", Fast, "--vary", "timing.signal.count=28,400");
        Assert.Equal(0, r.ExitCode);
        // The readout's path is as long as the checkout's location: measure the rows without it.
        var rows = r.Output.Replace(Path.GetFullPath(Fast), "FILE", StringComparison.Ordinal).Replace(Fast, "FILE", StringComparison.Ordinal);
        Assert.All(rows.Split('\n'), l => Assert.True(l.Length < 200, $"{l.Length} characters: {l}"));
        Assert.Equal(1, Regex.Count(r.Output, "ends after the pixel cycle"));
        Assert.Contains("invalid: CG1201 (point 1)", r.Output, StringComparison.Ordinal);
    }

    [Fact]
    public void A_sweep_without_a_valid_point_exits_2_and_says_so()
    {
        var r = CliRunner.Run("sweep", Fast, "--vary", "timing.signal.count=400,500");
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("none of the 2 points is a valid design", r.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_start_step_stop_range_that_gives_one_value_is_refused_with_the_other_reading()
    {
        var r = CliRunner.Run("sweep", Fast, "--vary", "timing.signal.count=4:10:30");
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("4:30:10", r.Error, StringComparison.Ordinal);
        Assert.Equal(0, CliRunner.Run("sweep", Fast, "--vary", "timing.signal.count=20:28:4").ExitCode); // a real START:STOP:STEP still runs
    }

    [Fact]
    public void Csv_and_plot_say_what_they_wrote()
    {
        var dir = RepoPaths.TempDir();
        var csv = Path.Combine(dir, "s.csv");
        var svg = Path.Combine(dir, "s.svg");
        var r = CliRunner.Run("sweep", Fast, "--vary", "adc.rate_hz=40M,80M", "--csv", csv, "--plot", svg);
        Assert.True(r.ExitCode == 0, r.Error);
        Assert.Contains($"wrote {csv} (2 points", r.Output, StringComparison.Ordinal);
        Assert.Contains($"wrote {svg} (read noise against adc.rate_hz)", r.Output, StringComparison.Ordinal);
        Assert.Contains(">40 MHz<", File.ReadAllText(svg), StringComparison.Ordinal); // the plot's ticks are in SI units too
        var json = CliRunner.Run("sweep", Fast, "--vary", "adc.rate_hz=40M,80M", "--csv", csv, "--json");
        using var _ = JsonDocument.Parse(json.Output); // stdout stays one JSON document
        Assert.Contains($"wrote {csv}", json.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void The_target_search_never_shows_a_trial_above_the_target_with_the_targets_own_digits()
    {
        // Take a trial whose noise is just above its own 4-figure rounding and make that rounding the target.
        using var doc = JsonDocument.Parse(CliRunner.Run("sweep", Fast, "--target-noise-e", "2.2", "--json").Output);
        var trial = doc.RootElement.GetProperty("target_noise").GetProperty("trials").EnumerateArray()
            .Select(t => (Reset: t.GetProperty("reset_count").GetInt32(), Noise: t.GetProperty("schemes")[1].GetProperty("noise_e_rms").GetDouble()))
            .First(t => t.Noise > double.Parse(Human.Num(t.Noise), CultureInfo.InvariantCulture));
        var target = Human.Num(trial.Noise);
        var r = CliRunner.Run("sweep", Fast, "--target-noise-e", target);
        Assert.True(r.ExitCode == 0, r.Error);
        var row = r.Output.Split('\n').Single(l => Regex.IsMatch(l, $@"^\s+>?\s+{trial.Reset}\s+6\s+{trial.Reset}\s"));
        Assert.EndsWith("above", row.TrimEnd(), StringComparison.Ordinal);
        Assert.DoesNotContain($" {target} ", row, StringComparison.Ordinal);
        Assert.DoesNotContain("bisection", r.Output, StringComparison.Ordinal);
    }

    [Fact]
    public void Fit_explains_the_model_column_and_pastes_frequencies_in_the_readout_style()
    {
        var r = CliRunner.Run("fit", RepoPaths.Example("capture_bench_idle.i16"), "--readout", RepoPaths.Example("capture_bench.toml"));
        Assert.True(r.ExitCode == 0, r.Error);
        Assert.Matches("front_end_pole_hz = \"[0-9.]+ MHz\"", r.Output);
        Assert.Matches("flicker_corner_hz = \"[0-9.]+ kHz\"", r.Output);
        Assert.Contains("fitted model e-: predicted from the fitted white + 1/f + pole model alone; it leaves out the interference line", r.Output, StringComparison.Ordinal);
        Assert.DoesNotMatch(ENotation(), r.Output);
    }

    [Fact]
    public void A_mistyped_command_is_named_briefly_and_exits_2()
    {
        var r = CliRunner.Run("desing", Fast);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("did you mean 'design'", r.Error, StringComparison.Ordinal);
        Assert.DoesNotContain("Commands:", r.Output + r.Error, StringComparison.Ordinal);
        var option = CliRunner.Run("design", Fast, "--jsno");
        Assert.Equal(2, option.ExitCode);
        Assert.Contains("did you mean '--json'", option.Error, StringComparison.Ordinal);
        Assert.Equal(0, CliRunner.Run("--help").ExitCode);
    }

    [Fact]
    public void The_vector_manifest_hashes_every_file_written_beside_it()
    {
        var dir = RepoPaths.TempDir();
        var r = CliRunner.Run("vectors", Fast, "--out", dir, "-n", "40");
        Assert.True(r.ExitCode == 0, r.Error);
        using var manifest = JsonDocument.Parse(File.ReadAllText(Path.Combine(dir, "manifest.json")));
        var listed = manifest.RootElement.GetProperty("files").EnumerateArray().ToDictionary(f => f.GetProperty("name").GetString()!, f => f.GetProperty("sha256").GetString());
        var written = Directory.GetFiles(dir).Select(Path.GetFileName).Where(n => n != "manifest.json").ToList();
        Assert.True(written.Count > 6, $"{written.Count} files");
        Assert.Equal(written.Order(StringComparer.Ordinal), listed.Keys.Order(StringComparer.Ordinal));
        foreach (var name in written)
        {
            Assert.Equal(Convert.ToHexStringLower(SHA256.HashData(File.ReadAllBytes(Path.Combine(dir, name!)))), listed[name!]);
        }
    }
}
