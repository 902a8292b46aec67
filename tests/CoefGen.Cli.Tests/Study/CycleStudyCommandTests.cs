using System.Globalization;
using System.Text.Json;
using CoefGen.Core.Study;

namespace CoefGen.Cli.Tests.Study;

/// <summary>Reports and sweeps of general cycles: noise against read count, the window searches, ramp keys as sweep axes.</summary>
public class CycleStudyCommandTests
{
    private static string Cycle(string name) => RepoPaths.Example(Path.Combine("cycles", name));

    private static JsonElement Schemes(string readoutPath)
    {
        var r = CliRunner.Run("design", readoutPath, "--json");
        Assert.True(r.ExitCode == 0, r.Error);
        using var doc = JsonDocument.Parse(r.Output);
        return doc.RootElement.GetProperty("schemes").Clone();
    }

    [Fact]
    public void The_report_of_repeated_reads_charts_noise_against_read_count_and_is_deterministic()
    {
        var a = ReportCommandTests.ReportOf(Cycle("cms_rows.toml"), out _);
        var b = ReportCommandTests.ReportOf(Cycle("cms_rows.toml"), out _);
        Assert.Equal(a, b);
        Assert.Contains("<h2>Read noise against read count</h2>", a, StringComparison.Ordinal);
        Assert.Contains("<title>Read noise against read count</title>", a, StringComparison.Ordinal);
        Assert.Contains("4 (this file)", a, StringComparison.Ordinal);
        Assert.Contains("two-stage form", a, StringComparison.Ordinal);
        Assert.DoesNotContain("Read noise against read count", ReportCommandTests.Report("fast_imaging.toml", out _), StringComparison.Ordinal);
    }

    [Fact]
    public void The_read_count_target_meets_the_target_one_read_fewer_does_not_and_design_agrees()
    {
        var path = Cycle("cms_rows.toml");
        var r = CliRunner.Run("sweep", path, "--target-noise-e", "0.6", "--json");
        Assert.True(r.ExitCode == 0, r.Error);
        using var doc = JsonDocument.Parse(r.Output);
        var t = doc.RootElement.GetProperty("target_noise");
        Assert.Equal("timing.repeat.times", t.GetProperty("varies").GetString());
        Assert.True(t.GetProperty("monotone").GetBoolean());
        var n = t.GetProperty("read_count").GetInt32();
        JsonElement Trial(int reads) => t.GetProperty("trials").EnumerateArray().First(x => x.GetProperty("read_count").GetInt32() == reads);
        static double Optimal(JsonElement trial) => trial.GetProperty("schemes")[2].GetProperty("noise_e_rms").GetDouble();
        Assert.True(Optimal(Trial(n)) <= 0.6 && Optimal(Trial(n - 1)) > 0.6, $"N = {n}");

        // The trial is the cycle with N reads, the pixel cycle one read period (96 samples) per read shorter than the file's 4.
        var text = File.ReadAllText(path).Replace("times = 4", $"times = {n.ToString(CultureInfo.InvariantCulture)}", StringComparison.Ordinal)
            .Replace("pixel_samples = 400", $"pixel_samples = {(400 - ((4 - n) * 96)).ToString(CultureInfo.InvariantCulture)}", StringComparison.Ordinal);
        Assert.Equal(400 - ((4 - n) * 96), Trial(n).GetProperty("cycle_pixel_samples").GetInt32());
        var copy = Path.Combine(RepoPaths.TempDir(), "n.toml");
        File.WriteAllText(copy, text);
        Assert.Equal(Schemes(copy)[2].GetProperty("noise_e_rms").GetDouble(), Optimal(Trial(n)));
    }

    [Fact]
    public void The_split_of_one_read_is_no_worse_than_its_neighbours_or_the_file_and_every_read_takes_it()
    {
        var path = Cycle("cms_rows.toml");
        var r = CliRunner.Run("sweep", path, "--split-pixel-time", "--json");
        Assert.True(r.ExitCode == 0, r.Error);
        using var doc = JsonDocument.Parse(r.Output);
        var s = doc.RootElement.GetProperty("split_pixel_time");
        Assert.Equal(96, s.GetProperty("read_period_samples").GetInt32());
        Assert.Equal(4, s.GetProperty("read_count").GetInt32());
        static double Optimal(JsonElement trial) => trial.GetProperty("schemes")[2].GetProperty("noise_e_rms").GetDouble();
        var best = s.GetProperty("best")[0];
        Assert.All(s.GetProperty("neighbours").EnumerateArray().Where(x => x.GetProperty("valid").GetBoolean()), x => Assert.True(Optimal(x) >= Optimal(best)));
        Assert.True(Optimal(best) <= Schemes(path)[2].GetProperty("noise_e_rms").GetDouble());

        // The best split written into the file by hand gives the same noise through `design`, and its last read sits where the repetition puts it.
        var text = File.ReadAllText(path)
            .Replace("start = 8\ncount = 30", $"start = {I(best, "reset_start")}\ncount = {I(best, "reset_count")}", StringComparison.Ordinal)
            .Replace("start = 56\ncount = 30", $"start = {I(best, "signal_start")}\ncount = {I(best, "signal_count")}", StringComparison.Ordinal)
            .Replace("transfer_sample = 45", "transfer_sample = " + best.GetProperty("transfer_sample").GetDouble().ToString("R", CultureInfo.InvariantCulture), StringComparison.Ordinal);
        var copy = Path.Combine(RepoPaths.TempDir(), "split.toml");
        File.WriteAllText(copy, text);
        Assert.Equal(Optimal(best), Schemes(copy)[2].GetProperty("noise_e_rms").GetDouble());
    }

    private static string I(JsonElement e, string name) => e.GetProperty(name).GetInt32().ToString(CultureInfo.InvariantCulture);

    [Fact]
    public void A_read_written_once_as_windows_searches_exactly_as_the_classic_file_does()
    {
        // fast_imaging's two windows written as [[timing.window]] without a repetition: the general cycle's searches
        // (ReadWindows) must find the classic searches' layouts and noise, through the other code path of every stage.
        var classic = RepoPaths.Example("fast_imaging.toml");
        var text = File.ReadAllText(classic);
        var timing = text[text.IndexOf("[timing]", StringComparison.Ordinal)..text.IndexOf("[noise]", StringComparison.Ordinal)];
        const string windows = "[timing]\npixel_samples = 80\nstep = \"ideal\"\n\n" +
            "[[timing.window]]\nname = \"reset\"\nstart = 6\ncount = 28\nsees = \"reset\"\n\n" +
            "[[timing.window]]\nname = \"signal\"\nstart = 46\ncount = 28\nsees = \"charge\"\ntransfer_sample = 40\n\n";
        var cycle = Path.Combine(RepoPaths.TempDir(), "fast_cycle.toml");
        File.WriteAllText(cycle, text.Replace(timing, windows, StringComparison.Ordinal));
        static JsonElement Run(string path)
        {
            var r = CliRunner.Run("sweep", path, "--split-pixel-time", "--target-noise-e", "3", "--scheme", "optimal", "--json");
            Assert.True(r.ExitCode == 0, r.Error);
            using var doc = JsonDocument.Parse(r.Output);
            return doc.RootElement.Clone();
        }

        var (a, b) = (Run(classic), Run(cycle));
        Assert.False(b.GetProperty("split_pixel_time").TryGetProperty("read_period_samples", out _));
        Assert.Equal(a.GetProperty("target_noise").GetProperty("window_count").GetInt32(), b.GetProperty("target_noise").GetProperty("window_count").GetInt32());
        foreach (var (section, list) in new[] { ("target_noise", "trials"), ("split_pixel_time", "best"), ("split_pixel_time", "neighbours") })
        {
            var (x, y) = (a.GetProperty(section).GetProperty(list), b.GetProperty(section).GetProperty(list));
            Assert.Equal(x.GetArrayLength(), y.GetArrayLength());
            for (var i = 0; i < x.GetArrayLength(); i++)
            {
                foreach (var key in new[] { "reset_start", "reset_count", "transfer_sample", "dead_samples", "signal_start", "signal_count" })
                {
                    Assert.Equal(x[i].GetProperty(key).GetDouble(), y[i].GetProperty(key).GetDouble());
                }

                Assert.Equal(x[i].GetProperty("schemes")[2].GetProperty("noise_e_rms").GetDouble(), y[i].GetProperty("schemes")[2].GetProperty("noise_e_rms").GetDouble(), 1e-12);
            }
        }
    }

    [Fact]
    public void A_fowler_target_beyond_reach_stops_where_the_groups_no_longer_fit_and_says_so()
    {
        // Fowler-8 in a 2100-sample cycle, late group at 2020: N = 128 runs past the cycle, so doubling stops there.
        var r = CliRunner.Run("sweep", Cycle("fowler_ir.toml"), "--target-noise-e", "0.1", "--json");
        Assert.True(r.ExitCode == 0, r.Error);
        using var doc = JsonDocument.Parse(r.Output);
        var t = doc.RootElement.GetProperty("target_noise");
        Assert.Equal("timing.window[*].count", t.GetProperty("varies").GetString());
        Assert.Equal(JsonValueKind.Null, t.GetProperty("read_count").ValueKind);
        Assert.Contains("N = 128 is not a valid design", t.GetProperty("note").GetString(), StringComparison.Ordinal);
        var trials = t.GetProperty("trials").EnumerateArray().ToList();
        Assert.Equal([1, 2, 4, 8, 16, 32, 64, 128], trials.Select(x => x.GetProperty("read_count").GetInt32()));
        Assert.True(t.GetProperty("monotone").GetBoolean());
        Assert.False(trials[^1].GetProperty("valid").GetBoolean());
    }

    [Fact]
    public void A_ramp_cycle_refuses_the_split_with_the_reason()
    {
        var r = CliRunner.Run("sweep", Cycle("up_the_ramp.toml"), "--split-pixel-time");
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("up_the_ramp.toml:", r.Error, StringComparison.Ordinal);
        Assert.Contains("CG1255", r.Error, StringComparison.Ordinal);
        Assert.Contains("a ramp cycle has no pedestal/signal windows to resize", r.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void A_ramp_sweeps_over_flux_and_read_count_like_any_key_and_every_point_equals_design()
    {
        var path = Cycle("up_the_ramp.toml");
        var sweep = CliRunner.Run("sweep", path, "--vary", "integration.photon_flux_e_per_s=0,400k,4M", "--vary", "timing.repeat.times=8,32", "--json");
        Assert.True(sweep.ExitCode == 0, sweep.Error);
        using var doc = JsonDocument.Parse(sweep.Output);
        var points = doc.RootElement.GetProperty("points");
        Assert.Equal(6, points.GetArrayLength());
        var baseText = File.ReadAllText(path);
        var axes = new[] { new SweepAxis("integration.photon_flux_e_per_s", [0]), new SweepAxis("timing.repeat.times", [0]) };
        var noise = new List<double>();
        foreach (var p in points.EnumerateArray())
        {
            Assert.True(p.GetProperty("valid").GetBoolean());
            double[] values = [.. p.GetProperty("values").EnumerateArray().Select(v => v.GetDouble())];
            var copy = Path.Combine(RepoPaths.TempDir(), "p.toml");
            File.WriteAllText(copy, Sweep.PointText(baseText, axes, values, out _));
            var design = Schemes(copy);
            for (var i = 0; i < 3; i++)
            {
                Assert.Equal(design[i].GetProperty("noise_e_rms").GetDouble(), p.GetProperty("schemes")[i].GetProperty("noise_e_rms").GetDouble());
            }

            noise.Add(p.GetProperty("schemes")[2].GetProperty("noise_e_rms").GetDouble());
        }

        // Shot noise of the integrating charge: more flux, more noise at either read count (grid order: flux outer, reads inner).
        Assert.True(noise[0] < noise[2] && noise[2] < noise[4] && noise[1] < noise[3] && noise[3] < noise[5], string.Join(", ", noise));
    }
}
