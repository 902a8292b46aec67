namespace CoefGen.Core.Tests.Readout;

public class NanosecondRoundingTests
{
    private static string NsTiming(string reset, string signal, string pixel = "pixel_ns = 20000", string transfer = "transfer_ns = 10010") =>
        ReadoutFixture.Minimal
            .Replace("pixel_samples = 400", pixel, StringComparison.Ordinal)
            .Replace("transfer_sample = 200", transfer, StringComparison.Ordinal)
            .Replace("start = 20\ncount = 160", reset, StringComparison.Ordinal)
            .Replace("start = 220\ncount = 160", signal, StringComparison.Ordinal);

    [Fact]
    public void Every_nanosecond_quantity_gets_one_rounding_line()
    {
        var toml = NsTiming("start_ns = 1010\ncount_ns = 8010", "start_ns = \"11 us\"\ncount_ns = 8000");
        var result = ReadoutFixture.Load(toml);
        Assert.Empty(result.Diagnostics);
        var t = result.Description!.Timing;
        Assert.Equal(
            [
                "timing.pixel_ns = 20000 ns -> 400 samples (20000 ns, +0 ns)",
                "timing.transfer_ns = 10010 ns -> sample 200.2 (kept exact)",
                "timing.reset.start_ns = 1010 ns -> sample 20 (1000 ns, -10 ns)",
                "timing.reset.count_ns = 8010 ns -> 160 samples (8000 ns, -10 ns)",
                "timing.signal.start_ns = 11000 ns -> sample 220 (11000 ns, +0 ns)",
                "timing.signal.count_ns = 8000 ns -> 160 samples (8000 ns, +0 ns)",
            ],
            t.Rounding);
        Assert.Equal(new Core.Readout.SampleWindow(20, 160), t.Cycle.AsTwoWindow()!.Reset);
        Assert.Equal(new Core.Readout.SampleWindow(220, 160), t.Cycle.AsTwoWindow()!.Signal);
        Assert.Equal(400, t.PixelSamples);
        Assert.Equal(10010 / 1e9, t.TransferTimeS);
    }

    [Fact]
    public void Half_a_sample_rounds_away_from_zero()
    {
        // 1025 ns at 20 MHz is sample 20.5 exactly; 8025 ns is 160.5 samples.
        var toml = NsTiming("start_ns = 1025\ncount_ns = 8025", "start = 220\ncount = 160", pixel: "pixel_samples = 400", transfer: "transfer_sample = 200");
        var t = ReadoutFixture.Load(toml).Description!.Timing;
        Assert.Equal(new Core.Readout.SampleWindow(21, 161), t.Cycle.AsTwoWindow()!.Reset);
        Assert.Equal(
            ["timing.reset.start_ns = 1025 ns -> sample 21 (1050 ns, +25 ns)", "timing.reset.count_ns = 8025 ns -> 161 samples (8050 ns, +25 ns)"],
            t.Rounding);
    }

    [Fact]
    public void Changing_the_clock_moves_the_windows_in_samples()
    {
        var toml = NsTiming("start_ns = 1000\ncount_ns = 8000", "start_ns = 11000\ncount_ns = 8000")
            .Replace("rate_hz = \"20 MHz\"", "rate_hz = \"40M\"", StringComparison.Ordinal);
        var t = ReadoutFixture.Load(toml).Description!.Timing;
        Assert.Equal(800, t.PixelSamples);
        Assert.Equal(new Core.Readout.SampleWindow(40, 320), t.Cycle.AsTwoWindow()!.Reset);
        Assert.Equal(new Core.Readout.SampleWindow(440, 320), t.Cycle.AsTwoWindow()!.Signal);
        Assert.Equal(10010 / 1e9, t.TransferTimeS);
    }
}
