using System.Text.Json;

namespace CoefGen.Cli.Tests.Capture;

public class DesignOnCaptureTests
{
    [Fact]
    public void Design_with_noise_capture_designs_and_predicts_every_scheme_on_the_capture_covariance()
    {
        var r = CliRunner.Run("design", RepoPaths.Example("capture_bench.toml"), "--json");
        Assert.True(r.ExitCode == 0, r.Error);
        using var doc = JsonDocument.Parse(r.Output);
        var (schemes, optimal) = OptimalOnTheCapture(doc.RootElement);
        Assert.All(schemes, s => Assert.Single(s.GetProperty("budget").EnumerateArray()));

        // The example carries an interference tone the parametric model lacks: the capture optimum must gain clearly.
        Assert.True(schemes[0].GetProperty("variance_v2").GetDouble() > 1.2 * optimal);
        Assert.DoesNotContain("CG1309", r.Error, StringComparison.Ordinal);
    }

    /// <summary>
    /// The schemes of a `design --json` on a capture and the variance of "optimal on the capture", which minimises h'Ch
    /// for the very matrix every scheme is predicted on.
    /// </summary>
    internal static (JsonElement[] Schemes, double Optimal) OptimalOnTheCapture(JsonElement root)
    {
        Assert.Contains("capture covariance", root.GetProperty("readout").GetProperty("noise").GetProperty("capture").GetString(), StringComparison.Ordinal);
        var schemes = root.GetProperty("schemes").EnumerateArray().ToArray();
        Assert.Equal("optimal on the capture", schemes[2].GetProperty("label").GetString());
        var optimal = schemes[2].GetProperty("variance_v2").GetDouble();
        Assert.All(schemes, s => Assert.True(s.GetProperty("variance_v2").GetDouble() >= optimal * (1 - 1e-12)));
        return (schemes, optimal);
    }

    [Fact]
    public void A_missing_capture_file_is_located_bad_input()
    {
        var dir = RepoPaths.TempDir();
        var text = File.ReadAllText(RepoPaths.Example("capture_bench.toml"));
        var path = Path.Combine(dir, "cap.toml");
        File.WriteAllText(path, text);
        var r = CliRunner.Run("design", path);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("CG5006", r.Error, StringComparison.Ordinal);
        Assert.Contains("noise.capture", r.Error, StringComparison.Ordinal);
        var line = text.Split('\n').ToList().FindIndex(l => l.TrimStart().StartsWith("capture", StringComparison.Ordinal)) + 1;
        Assert.Contains($"cap.toml:{line}:", r.Error, StringComparison.Ordinal);
    }
}
