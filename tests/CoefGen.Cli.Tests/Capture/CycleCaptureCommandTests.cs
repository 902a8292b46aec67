using System.Text.Json;

namespace CoefGen.Cli.Tests.Capture;

/// <summary>`fit` and `design` with noise.capture on the repeated-reads example (examples/cycles/skipper_capture.toml).</summary>
public sealed class CycleCaptureCommandTests
{
    private static string Readout => RepoPaths.Example(Path.Combine("cycles", "skipper_capture.toml"));

    private static string Capture => RepoPaths.Example(Path.Combine("cycles", "skipper_capture_idle.i16"));

    [Fact]
    public void Fit_of_a_cycle_capture_prints_the_fit_and_the_held_out_comparison_in_text_and_json()
    {
        var text = CliRunner.Run("fit", Capture, "--readout", Readout);
        Assert.True(text.ExitCode == 0, text.Error);
        Assert.DoesNotContain("CG1255", text.Error, StringComparison.Ordinal);
        Assert.Contains("204800 samples (1024 pixel cycles of 200)", text.Output, StringComparison.Ordinal);
        Assert.Contains("weighted (trapezoid, ramp 1, every window) ", text.Output, StringComparison.Ordinal);
        Assert.Contains("optimal (capture)", text.Output, StringComparison.Ordinal);

        var json = CliRunner.Run("fit", Capture, "--readout", Readout, "--json");
        Assert.True(json.ExitCode == 0, json.Error);
        using var doc = JsonDocument.Parse(json.Output);
        var fit = doc.RootElement.GetProperty("fit");
        // The generator's truth is 40 nV/rtHz and a 50 kHz corner (CycleCaptureTests checks it against the stated sigmas).
        Assert.InRange(fit.GetProperty("white_nv_per_rthz").GetDouble(), 38, 42);
        Assert.InRange(fit.GetProperty("flicker_corner_hz").GetDouble(), 40e3, 60e3);
        Assert.Equal(json.Output, CliRunner.Run("fit", Capture, "--readout", Readout, "--json").Output);
    }

    [Fact]
    public void Design_with_a_cycle_capture_predicts_every_scheme_on_the_capture_covariance()
    {
        var text = CliRunner.Run("design", Readout);
        Assert.True(text.ExitCode == 0, text.Error);
        Assert.Contains("capture covariance (1024 cycles", text.Output, StringComparison.Ordinal);
        Assert.Contains("Two-stage form: not designed on a capture", text.Output, StringComparison.Ordinal);
        Assert.Contains("proof        SAFE", text.Output, StringComparison.Ordinal);

        var json = CliRunner.Run("design", Readout, "--json");
        Assert.True(json.ExitCode == 0, json.Error);
        using var doc = JsonDocument.Parse(json.Output);
        var root = doc.RootElement;
        var (schemes, _) = DesignOnCaptureTests.OptimalOnTheCapture(root);
        Assert.Equal(3, schemes.Length);
        Assert.False(root.TryGetProperty("two_stage", out _));
        Assert.DoesNotContain("CG1309", json.Error, StringComparison.Ordinal);
    }
}
