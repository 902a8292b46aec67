using CoefGen.Core.Capture;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Tests.Capture;

public class FittedSectionRoundTripTests
{
    [Fact]
    public void The_ready_to_paste_noise_section_loads_back_with_the_fitted_values()
    {
        var (readoutPath, text, d, analysis) = Example();

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

    [Fact]
    public void The_fit_confidence_box_pasted_as_scenarios_gives_a_robust_design_over_its_corners_and_edges()
    {
        var (readoutPath, text, d, analysis) = Example();
        var start = text.IndexOf("[noise]", StringComparison.Ordinal);
        var end = text.IndexOf("[weights]", StringComparison.Ordinal);
        var pasted = text[..start] + FittedNoiseSection.ToToml(d, analysis).TrimEnd() + "\n\n" + FittedScenarioRange.ToToml(analysis) + "\n"
            + text[end..].Replace("scheme = \"optimal\"", "scheme = \"robust\"", StringComparison.Ordinal);
        var reloaded = ReadoutLoader.Load(System.Text.Encoding.UTF8.GetBytes(pasted), readoutPath, ReadRelative);
        Assert.True(reloaded.Description is not null, string.Join("\n", reloaded.Diagnostics));
        var s = reloaded.Description!.Scenarios!;
        var keys = s.Cases.SelectMany(c => c.Overrides.Select(o => o.Key)).Distinct().Count();
        Assert.Equal(1 + (1 << keys) + (keys << (keys - 1)), s.Cases.Count); // nominal + corners + edge midpoints
        var low = s.Cases[1].Overrides.Single(o => o.Key == "noise.source[0].white_nv_per_rthz").Value;
        var expected = analysis.Fit.WhiteNvPerRtHz * Math.Exp(-FittedScenarioRange.Sigmas * analysis.Fit.WhiteLogSigma / 2);
        Assert.Equal(expected, low, expected * 5e-4);
        var design = CoefGen.Core.Pipeline.DesignPipeline.Run(reloaded.Description, CoefGen.Core.Tests.Vectors.ExampleDesigns.Catalog);
        Assert.True(design.Regret!.Robust.RelativeGap < 1e-6);
        var rows = design.Regret.Rows;
        Assert.True(rows.Single(r => r.Scheme == WeightScheme.Robust).WorstRatio <= rows.Single(r => r.Scheme == WeightScheme.Optimal).WorstRatio);
    }

    /// <summary>The capture example: its path and text, its description and the analysis of its capture.</summary>
    private static (string Path, string Text, ReadoutDescription Description, CaptureAnalysisResult Analysis) Example()
    {
        var root = Root();
        var readoutPath = Path.Combine(root, "examples", "capture_bench.toml");
        var text = File.ReadAllText(readoutPath);
        var d = ReadoutLoader.Load(System.Text.Encoding.UTF8.GetBytes(text), readoutPath, ReadRelative).Description!;
        var capturePath = Path.Combine(root, "examples", d.Noise.CapturePath!);
        var parsed = CaptureParser.Parse(
            File.ReadAllBytes(capturePath), capturePath,
            new CaptureFormat(CaptureFormat.EncodingFromFileName(capturePath), CaptureLayout.PixelSynchronous, d.Timing.PixelSamples), d.Adc);
        return (readoutPath, text, d, CaptureAnalysis.Run(d, parsed.Capture!, new CaptureAnalysisOptions()));
    }

    private static byte[]? ReadRelative(string rel) => File.ReadAllBytes(Path.Combine(Root(), "examples", rel));

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
