using CoefGen.Core.Capture;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Tests.Capture;

public class FittedSectionRoundTripTests
{
    [Fact]
    public void The_ready_to_paste_noise_section_loads_back_with_the_fitted_values()
    {
        var root = Root();
        var readoutPath = Path.Combine(root, "examples", "capture_bench.toml");
        var text = File.ReadAllText(readoutPath);
        byte[]? ReadRelative(string rel) => File.ReadAllBytes(Path.Combine(root, "examples", rel));
        var d = ReadoutLoader.Load(System.Text.Encoding.UTF8.GetBytes(text), readoutPath, ReadRelative).Description!;
        var capturePath = Path.Combine(root, "examples", d.Noise.CapturePath!);
        var parsed = CaptureParser.Parse(
            File.ReadAllBytes(capturePath), capturePath,
            new CaptureFormat(CaptureFormat.EncodingFromFileName(capturePath), CaptureLayout.PixelSynchronous, d.Timing.PixelSamples), d.Adc);
        var analysis = CaptureAnalysis.Run(d, parsed.Capture!, new CaptureAnalysisOptions());

        var section = FittedNoiseSection.ToToml(d, analysis);

        // Paste it as a user would: replace everything from [noise] up to the next non-noise table.
        var start = text.IndexOf("[noise]", StringComparison.Ordinal);
        var end = text.IndexOf("[weights]", StringComparison.Ordinal);
        var pasted = text[..start] + section.TrimEnd() + "\n\n" + text[end..];
        var reloaded = ReadoutLoader.Load(System.Text.Encoding.UTF8.GetBytes(pasted), readoutPath, ReadRelative);

        Assert.True(reloaded.Description is not null, string.Join("\n", reloaded.Diagnostics));
        var source = Assert.Single(reloaded.Description!.Noise.Sources);
        // The section prints 4 significant digits (FittedNoiseSection), so the values come back to 5e-4 relative.
        Assert.Equal(analysis.Fit.WhiteNvPerRtHz, source.WhiteNvPerRtHz, analysis.Fit.WhiteNvPerRtHz * 5e-4);
        Assert.Equal(analysis.Fit.Model.FlickerCornerHz, source.FlickerCornerHz, analysis.Fit.Model.FlickerCornerHz * 5e-4);
        Assert.Equal(analysis.Fit.Model.PoleHz!.Value, reloaded.Description.Noise.FrontEndPoleHz!.Value, analysis.Fit.Model.PoleHz!.Value * 5e-4);
    }

    private static string Root()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "CoefGen.sln")))
            {
                return dir.FullName;
            }
        }

        throw new InvalidOperationException("CoefGen.sln not found");
    }
}
