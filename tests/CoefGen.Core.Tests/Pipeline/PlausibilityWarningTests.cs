using CoefGen.Core.Capture;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Tests.Capture;
using static CoefGen.Core.Tests.Readout.ReadoutFixture;

namespace CoefGen.Core.Tests.Pipeline;

/// <summary>
/// Each plausibility warning fires on the case it is for, never stops the design, and stays silent on every
/// shipped example (thresholds: <see cref="DesignPlausibility"/>, <see cref="CaptureHealth"/>; common practice, no source).
/// </summary>
public class PlausibilityWarningTests
{
    private static readonly string[] NewCodes = ["CG1311", "CG1312", "CG1405", "CG2031", "CG5010", "CG5011"];

    public static TheoryData<string, string, string, string> Cases() => new()
    {
        // A bandwidth of 30 Hz at 20 MS/s: the unit (MHz) was forgotten.
        { "front_end_pole_hz = \"2 MHz\"", "bandwidth_hz = 30", "CG1311", "noise.bandwidth_hz" },
        // 1 mV/rtHz behind a 2 MHz pole is volts rms at one sample: beyond the 2 V full scale.
        { "white_nv_per_rthz = 6.0", "white_nv_per_rthz = 1e6", "CG1312", "noise" },
        // Two ramps of 100 samples do not fit a 160-sample window.
        { "[noise]", "[weights]\nwindow = \"trapezoid\"\nramp_samples = 100\n\n[noise]", "CG1405", "weights.ramp_samples" },
        // A Hann window at 2-bit coefficients is a comb of 0 and -1/+1.
        { "[noise]", "[weights]\nscheme = \"weighted\"\nwindow = \"hann\"\n\n[fixed_point]\ncoef_bits = 2\n\n[noise]", "CG2031", "fixed_point.coef_bits" },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Warning_fires_on_its_case_and_the_design_completes(string oldText, string newText, string code, string key)
    {
        var toml = With(oldText, newText);
        var load = Load(toml);
        Assert.True(load.Succeeded, string.Join("\n", load.Diagnostics));
        var result = DesignPipeline.Run(load.Description!, ShippedExamples.Catalog);
        var warning = Assert.Single(result.Warnings, w => w.Code == code);
        Assert.Equal(Severity.Warning, warning.Severity);
        Assert.Equal(key, warning.Key);
        Assert.True(warning.Location.Line > 0, warning.ToString());
        Assert.DoesNotContain(result.Warnings, w => w.Code != code && NewCodes.Contains(w.Code));
    }

    [Fact]
    public void Hann_at_two_bits_loses_its_shape_and_at_eighteen_bits_keeps_it()
    {
        var toml = With("[noise]", "[weights]\nscheme = \"weighted\"\nwindow = \"hann\"\n\n[noise]");
        var wide = DesignPipeline.Run(Load(toml).Description!, ShippedExamples.Catalog);
        var narrow = DesignPipeline.Run(Load(toml.Replace("[weights]", "[fixed_point]\ncoef_bits = 2\n\n[weights]", StringComparison.Ordinal)).Description!, ShippedExamples.Catalog);
        Assert.True(DesignPlausibility.ShapeError(wide.Chosen.H, wide.Datapath.Coefficients) < 1e-4);
        Assert.True(DesignPlausibility.ShapeError(narrow.Chosen.H, narrow.Datapath.Coefficients) > DesignPlausibility.ShapeErrorLimit);

        // The comb: every coefficient is -1, 0 or +1.
        Assert.All(narrow.Datapath.Coefficients, c => Assert.InRange(c, -1L, 1L));
    }

    [Fact]
    public void Shape_error_is_zero_for_a_multiple_and_one_for_an_orthogonal_vector()
    {
        Assert.Equal(0, DesignPlausibility.ShapeError([1.0, -2.0, 1.0], [2L, -4L, 2L]), 12);
        Assert.Equal(1, DesignPlausibility.ShapeError([1.0, -1.0, 0.0], [1L, 1L, 0L]), 12);
    }

    [Theory]
    [MemberData(nameof(ShippedExamples.All), MemberType = typeof(ShippedExamples))]
    public void Shipped_examples_raise_none_of_the_plausibility_warnings(string name)
    {
        var result = DesignPipeline.Run(ShippedExamples.Load(name), ShippedExamples.Catalog);
        Assert.DoesNotContain(result.Warnings, w => NewCodes.Contains(w.Code));
    }

    [Fact]
    public void A_stuck_adc_capture_is_flagged_and_the_example_capture_is_not()
    {
        var stuck = CaptureFixtures.Pixels([.. Enumerable.Repeat(117L, 40 * 64)]);
        var warning = Assert.Single(CaptureHealth.Check(stuck, CaptureFixtures.Bench.Adc));
        Assert.Equal("CG5010", warning.Code);
        Assert.Equal(Severity.Warning, warning.Severity);
        Assert.Empty(CaptureHealth.Check(CaptureFixtures.Pixels(CaptureFixtures.ExampleCodes()), CaptureFixtures.Bench.Adc));
    }

    [Fact]
    public void A_stuck_capture_warns_in_a_capture_design_without_stopping_it()
    {
        var d = CaptureFixtures.Bench;
        var model = DesignPipeline.Run(d, ShippedExamples.Catalog);
        var result = CaptureDesign.Apply(model, CaptureFixtures.Pixels([.. Enumerable.Repeat(117L, 40 * 64)]));
        Assert.Contains(result.Warnings, w => w.Code == "CG5010");
    }
}
