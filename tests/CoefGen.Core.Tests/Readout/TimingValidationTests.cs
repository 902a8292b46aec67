using static CoefGen.Core.Tests.Readout.ReadoutFixture;

namespace CoefGen.Core.Tests.Readout;

public class TimingValidationTests
{
    private const string SignalWindow = "start = 220\ncount = 160";

    [Fact]
    public void Window_ending_after_the_pixel_cycle_is_reported_at_its_count()
    {
        var toml = With(SignalWindow, "start = 220\ncount = 181");
        var d = AssertOnly(Load(toml), "CG1201", "timing.signal.count", LineOf(toml, "count = 181"));
        Assert.Contains("401 > 400", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Window_ending_exactly_at_the_cycle_end_is_allowed()
    {
        var result = Load(With(SignalWindow, "start = 220\ncount = 180"));
        Assert.Empty(result.Diagnostics);
        Assert.Equal(400, result.Description!.Timing.Cycle.AsTwoWindow()!.Signal.End);
    }

    [Fact]
    public void Overlapping_windows_are_reported_at_the_signal_start()
    {
        var toml = With(SignalWindow, "start = 179\ncount = 160");
        AssertOnly(Load(toml), "CG1202", "timing.signal.start", LineOf(toml, "start = 179"));
    }

    [Fact]
    public void Window_empty_after_nanosecond_rounding_is_reported()
    {
        // 20 ns at 20 MHz is 0.4 samples and rounds to 0.
        var toml = With(SignalWindow, "start = 220\ncount_ns = 20");
        var d = AssertOnly(Load(toml), "CG1203", "timing.signal.count_ns", LineOf(toml, "count_ns = 20"));
        Assert.Contains("0.4 samples", d.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("transfer_sample = 100")]   // inside the reset window 20..179
    [InlineData("transfer_sample = 179.5")] // still before the end of the reset window (sample 180)
    [InlineData("transfer_sample = 10")]    // before the reset window
    [InlineData("transfer_sample = 220.5")] // after the signal window starts
    [InlineData("transfer_ns = 11001")]     // 220.02 samples
    public void Transfer_outside_the_gap_between_the_windows_is_reported(string transfer)
    {
        var toml = With("transfer_sample = 200", transfer);
        var key = "timing." + transfer.Split(' ')[0];
        AssertOnly(Load(toml), "CG1204", key, LineOf(toml, transfer));
    }

    [Theory]
    [InlineData("transfer_sample = 180")]
    [InlineData("transfer_sample = 220")]
    [InlineData("transfer_ns = 9000")]
    public void Transfer_on_either_edge_of_the_gap_is_allowed(string transfer)
    {
        Assert.Empty(Load(With("transfer_sample = 200", transfer)).Diagnostics);
    }

    [Fact]
    public void Signal_window_before_the_reset_window_is_reported()
    {
        var toml = With(SignalWindow, "start = 0\ncount = 10");
        AssertOnly(Load(toml), "CG1205", "timing.signal.start", LineOf(toml, "start = 0"));
    }

    [Fact]
    public void Pole_step_without_a_pole_is_reported_at_the_step()
    {
        var toml = With("front_end_pole_hz = \"2 MHz\"", "bandwidth_hz = \"10 MHz\"")
            .Replace("transfer_sample = 200", "transfer_sample = 200\nstep = \"pole\"", StringComparison.Ordinal);
        AssertOnly(Load(toml), "CG1403", "timing.step", LineOf(toml, "step = \"pole\""));
    }

    [Fact]
    public void Missing_window_section_is_reported()
    {
        var toml = With("[timing.signal]\n" + SignalWindow + "\n", "");
        AssertOnly(Load(toml), "CG1002", "timing.signal", LineOf(toml, "[timing]"));
    }

    [Fact]
    public void Nanosecond_start_past_the_sample_limit_is_out_of_range()
    {
        var toml = With(SignalWindow, "start_ns = 1e18\ncount = 160");
        AssertOnly(Load(toml), "CG1004", "timing.signal.start_ns", LineOf(toml, "start_ns"));
    }
}
