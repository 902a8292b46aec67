using System.Globalization;

namespace CoefGen.Cli.Tests.Capture;

/// <summary>`fit` on captures simpler than white + 1/f + pole: unresolved terms are reported, never a failure.</summary>
public sealed class FitReducedModelTests
{
    private static string Readout => RepoPaths.Example("capture_bench.toml");

    /// <summary>2048 cycles of 40 independent Gaussian codes, 3 LSB rms (System.Random, fixed seed; Box-Muller).</summary>
    private static string WhiteCsv()
    {
        var random = new Random(5);
        var path = Path.Combine(RepoPaths.TempDir(), "white.csv");
        var rows = Enumerable.Range(0, 2048).Select(_ => string.Join(",", Enumerable.Range(0, 40).Select(_ =>
        {
            var g = Math.Sqrt(-2 * Math.Log(1 - random.NextDouble())) * Math.Cos(2 * Math.PI * random.NextDouble());
            return Math.Round(100 + (3 * g)).ToString(CultureInfo.InvariantCulture);
        })));
        File.WriteAllText(path, string.Join("\n", rows) + "\n");
        return path;
    }

    [Fact]
    public void A_pure_white_capture_fits_white_alone_and_says_which_terms_are_not_resolved()
    {
        var white = WhiteCsv();
        var text = CliRunner.Run("fit", white, "--readout", Readout);
        Assert.Equal(0, text.ExitCode);
        Assert.Contains("1/f corner   not resolved", text.Output);
        Assert.Contains("pole         not resolved", text.Output);
        Assert.Contains("bandwidth_hz = \"5 MHz\"", text.Output);
        Assert.Equal(2, text.Error.Split('\n').Count(l => l.Contains("warning CG5011", StringComparison.Ordinal)));

        var json = CliRunner.Run("fit", white, "--readout", Readout, "--json");
        Assert.Equal(0, json.ExitCode);
        Assert.Contains("\"pole_hz\": null", json.Output);
        Assert.Contains("\"unresolved\": [", json.Output);

        var held = CliRunner.Run("fit", white, "--readout", Readout, "--fix-pole");
        Assert.Equal(0, held.ExitCode);
        Assert.Contains("held at noise.front_end_pole_hz", held.Output);
    }

    [Fact]
    public void A_stuck_adc_capture_is_named_as_such_when_nothing_can_be_fitted()
    {
        var path = Path.Combine(RepoPaths.TempDir(), "stuck.csv");
        File.WriteAllText(path, string.Join("\n", Enumerable.Repeat(string.Join(",", Enumerable.Repeat("117", 40)), 2048)) + "\n");
        var r = CliRunner.Run("fit", path, "--readout", Readout);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("warning CG5010", r.Error);
        Assert.Contains("error CG5008", r.Error);
    }
}
