using System.Globalization;
using System.Text.Json;
using CoefGen.Core.Study;

namespace CoefGen.Cli.Tests.Study;

public class SweepCommandTests
{
    private static readonly string Fast = RepoPaths.Example("fast_imaging.toml");

    [Fact]
    public void Sweep_values_equal_single_design_runs_at_the_same_points_exactly()
    {
        var sweep = CliRunner.Run("sweep", Fast, "--vary", "noise.source[0].flicker_corner_hz=10k:1M:x10", "--vary", "adc.noise_lsb=0.2,0.8", "--json");
        Assert.True(sweep.ExitCode == 0, sweep.Error);
        using var doc = JsonDocument.Parse(sweep.Output);
        var points = doc.RootElement.GetProperty("points");
        Assert.Equal(6, points.GetArrayLength());
        var dir = RepoPaths.TempDir();
        var baseText = File.ReadAllText(Fast);
        foreach (var p in points.EnumerateArray())
        {
            var values = p.GetProperty("values").EnumerateArray().Select(v => v.GetDouble()).ToArray();
            var axes = new[] { new SweepAxis("noise.source[0].flicker_corner_hz", [values[0]]), new SweepAxis("adc.noise_lsb", [values[1]]) };
            var path = Path.Combine(dir, $"p{p.GetProperty("index").GetInt32().ToString(CultureInfo.InvariantCulture)}.toml");
            File.WriteAllText(path, Sweep.PointText(baseText, axes, values, out _));
            var design = CliRunner.Run("design", path, "--json");
            Assert.True(design.ExitCode == 0, design.Error);
            using var d = JsonDocument.Parse(design.Output);
            var schemes = d.RootElement.GetProperty("schemes");
            for (var i = 0; i < 3; i++)
            {
                var s = p.GetProperty("schemes")[i];
                Assert.Equal(schemes[i].GetProperty("noise_e_rms").GetDouble(), s.GetProperty("noise_e_rms").GetDouble());
                Assert.Equal(schemes[i].GetProperty("noise_adu_rms").GetDouble(), s.GetProperty("noise_adu_rms").GetDouble());
            }

            var fp = d.RootElement.GetProperty("fixed_point");
            Assert.Equal(fp.GetProperty("gain_error_ppm").GetDouble(), p.GetProperty("gain_error_ppm").GetDouble());
            Assert.Equal(fp.GetProperty("noise_penalty_percent").GetDouble(), p.GetProperty("noise_penalty_percent").GetDouble());
            Assert.Equal(fp.GetProperty("proof").GetProperty("safe").GetBoolean(), p.GetProperty("safe").GetBoolean());
        }
    }

    [Fact]
    public void An_invalid_point_shows_its_diagnostic_in_its_row_and_the_rest_still_run()
    {
        var r = CliRunner.Run("sweep", Fast, "--vary", "timing.signal.count=28,40");
        Assert.Equal(0, r.ExitCode);
        Assert.Contains("invalid: CG", r.Output, StringComparison.Ordinal);
        Assert.Contains("2 points, 1 valid", r.Output, StringComparison.Ordinal);
    }

    [Fact]
    public void Csv_and_plot_are_deterministic_and_the_plot_has_axes_and_a_legend()
    {
        var dir = RepoPaths.TempDir();
        string Once(string tag)
        {
            var r = CliRunner.Run("sweep", Fast, "--vary", "adc.rate_hz=40M:160M:x2", "--csv", Path.Combine(dir, tag + ".csv"), "--plot", Path.Combine(dir, tag + ".svg"));
            Assert.True(r.ExitCode == 0, r.Error);
            return File.ReadAllText(Path.Combine(dir, tag + ".csv")) + File.ReadAllText(Path.Combine(dir, tag + ".svg"));
        }

        var a = Once("a");
        Assert.Equal(a, Once("b"));
        var svg = File.ReadAllText(Path.Combine(dir, "a.svg"));
        Assert.Contains("adc.rate_hz (Hz)", svg, StringComparison.Ordinal);
        Assert.Contains("read noise (e- rms)", svg, StringComparison.Ordinal);
        Assert.Contains("boxcar", svg, StringComparison.Ordinal);
        Assert.Equal(4, File.ReadAllLines(Path.Combine(dir, "a.csv")).Length); // header + 3 points
    }

    [Fact]
    public void The_recommended_window_count_meets_the_target_and_one_fewer_does_not()
    {
        const double target = 3.0;
        var r = CliRunner.Run("sweep", Fast, "--target-noise-e", "3", "--scheme", "boxcar", "--json");
        Assert.True(r.ExitCode == 0, r.Error);
        using var doc = JsonDocument.Parse(r.Output);
        var t = doc.RootElement.GetProperty("target_noise");
        var n = t.GetProperty("window_count").GetInt32();
        Assert.True(t.GetProperty("monotone").GetBoolean());
        double NoiseAt(int count) => t.GetProperty("trials").EnumerateArray()
            .First(x => x.GetProperty("reset_count").GetInt32() == count).GetProperty("schemes")[0].GetProperty("noise_e_rms").GetDouble();
        Assert.True(NoiseAt(n) <= target, $"N = {n}: {NoiseAt(n)}");
        Assert.True(NoiseAt(n - 1) > target, $"N - 1 = {n - 1}: {NoiseAt(n - 1)}");

        // The same layout through `design` gives the same number (the search is not a model of its own).
        var baseText = File.ReadAllText(Fast);
        var layout = new WindowLayout(6, n, 40 - 34, 46 - 40, n, 80 - 74);
        var path = Path.Combine(RepoPaths.TempDir(), "n.toml");
        File.WriteAllText(path, layout.Apply(baseText, out _));
        using var design = JsonDocument.Parse(CliRunner.Run("design", path, "--json").Output);
        Assert.Equal(NoiseAt(n), design.RootElement.GetProperty("schemes")[0].GetProperty("noise_e_rms").GetDouble());
    }

    [Fact]
    public void The_pixel_time_split_is_no_worse_than_its_neighbours_or_the_file()
    {
        var r = CliRunner.Run("sweep", Fast, "--split-pixel-time", "--json");
        Assert.True(r.ExitCode == 0, r.Error);
        using var doc = JsonDocument.Parse(r.Output);
        var s = doc.RootElement.GetProperty("split_pixel_time");
        static double Chosen(JsonElement trial) => trial.GetProperty("schemes")[1].GetProperty("noise_e_rms").GetDouble(); // weighted is the file's scheme
        var best = Chosen(s.GetProperty("best")[0]);
        Assert.All(s.GetProperty("neighbours").EnumerateArray().Where(x => x.GetProperty("valid").GetBoolean()), x => Assert.True(Chosen(x) >= best));
        using var design = JsonDocument.Parse(CliRunner.Run("design", Fast, "--json").Output);
        Assert.True(best <= design.RootElement.GetProperty("schemes")[1].GetProperty("noise_e_rms").GetDouble());
    }

    [Fact]
    public void A_bad_vary_spec_exits_2_with_a_message()
    {
        var r = CliRunner.Run("sweep", Fast, "--vary", "adc.rate_hz=1:2");
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("--vary", r.Error, StringComparison.Ordinal);
    }
}
