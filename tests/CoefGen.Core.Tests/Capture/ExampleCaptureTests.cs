using CoefGen.Core.Capture;

namespace CoefGen.Core.Tests.Capture;

public sealed class ExampleCaptureTests
{
    [Fact]
    public void Example_capture_is_exactly_the_documented_synthesis()
    {
        ExampleSynthesis.AssertFileIs(CaptureFixtures.ExampleCapturePath, SyntheticCapture.ToRaw16(CaptureFixtures.ExampleCodes()));
    }

    [Fact]
    public void Example_capture_parses_as_2048_cycles_of_40_samples()
    {
        var bytes = File.ReadAllBytes(CaptureFixtures.ExampleCapturePath);
        var parsed = CaptureParser.Parse(bytes, "capture_bench_idle.i16", new CaptureFormat(CaptureEncoding.Raw16, CaptureLayout.PixelSynchronous, 40), CaptureFixtures.Bench.Adc);
        Assert.Empty(parsed.Diagnostics);
        Assert.Equal(2048, parsed.Capture!.Rows);
    }
}
