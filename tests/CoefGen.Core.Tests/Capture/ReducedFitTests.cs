using CoefGen.Core.Capture;

namespace CoefGen.Core.Tests.Capture;

/// <summary>
/// Captures that hold fewer terms than white + 1/f + pole: the fit leaves out what the spectrum does not resolve,
/// says so, and recovers the known white level (and the remaining terms) of the synthesis within 3 sigma.
/// </summary>
public sealed class ReducedFitTests
{
    private static readonly SyntheticCapture.Model Bench = SyntheticCapture.Bench(0);

    [Fact]
    public void Pure_white_capture_fits_the_white_level_and_reports_1_f_and_pole_unresolved()
    {
        var truth = Bench with { FlickerCornerHz = 0, PoleHz = double.PositiveInfinity };
        var fit = SpectrumFitTests.FitStream(truth, 21);
        Assert.Equal([FitTerms.FlickerTerm, FitTerms.PoleTerm], fit.Unresolved);
        Assert.Null(fit.Model.PoleHz);
        Assert.Equal(0, fit.Model.FlickerCornerHz);
        SpectrumFitTests.AssertWithin(Math.Log(truth.WhiteV2PerHz), Math.Log(fit.Model.WhiteV2PerHz), fit.WhiteLogSigma, "ln W");
        Assert.True(fit.WhiteLogSigma < 0.02, $"sigma {fit.WhiteLogSigma}");
    }

    [Fact]
    public void White_behind_a_pole_fits_white_and_pole_and_reports_1_f_unresolved()
    {
        var truth = Bench with { FlickerCornerHz = 0 };
        var fit = SpectrumFitTests.FitStream(truth, 22);
        Assert.Equal([FitTerms.FlickerTerm], fit.Unresolved);
        SpectrumFitTests.AssertWithin(Math.Log(truth.WhiteV2PerHz), Math.Log(fit.Model.WhiteV2PerHz), fit.WhiteLogSigma, "ln W");
        SpectrumFitTests.AssertWithin(Math.Log(truth.PoleHz), Math.Log(fit.Model.PoleHz!.Value), fit.PoleLogSigma!.Value, "ln f_p");
    }

    [Fact]
    public void White_and_1_f_without_a_pole_fit_both_and_report_the_pole_unresolved()
    {
        var truth = Bench with { PoleHz = double.PositiveInfinity };
        var fit = SpectrumFitTests.FitStream(truth, 23);
        Assert.Equal([FitTerms.PoleTerm], fit.Unresolved);
        SpectrumFitTests.AssertWithin(Math.Log(truth.WhiteV2PerHz), Math.Log(fit.Model.WhiteV2PerHz), fit.WhiteLogSigma, "ln W");
        SpectrumFitTests.AssertWithin(Math.Log(truth.FlickerCornerHz), Math.Log(fit.Model.FlickerCornerHz), fit.FlickerLogSigma!.Value, "ln f_c");
    }

    [Fact]
    public void Pure_white_capture_with_a_held_pole_still_fits()
    {
        var truth = Bench with { FlickerCornerHz = 0, PoleHz = double.PositiveInfinity };
        var codes = new SyntheticCapture(24).StreamCodes(truth, 1 << 16);
        var capture = new SampleCapture("white", CaptureLayout.Stream, 1, codes);
        var spectrum = WelchEstimator.Estimate(CaptureSamples.ResidualStream(capture, truth.LsbV), truth.RateHz, 4096);
        var fit = SpectrumFitter.Fit(spectrum, truth.LsbV * truth.LsbV * ((1.0 / 12) + 0.25), 20 * truth.RateHz);
        Assert.NotNull(fit);
        Assert.Equal([FitTerms.FlickerTerm], fit.Unresolved);
        Assert.Equal(20 * truth.RateHz, fit.Model.PoleHz);
    }

    [Fact]
    public void The_full_example_capture_resolves_every_term()
    {
        var fit = SpectrumFitTests.FitStream(SyntheticCapture.Bench(100e-6), 12);
        Assert.Empty(fit.Unresolved);
    }

    [Fact]
    public void A_pixel_capture_of_pure_white_noise_analyses_and_pastes_as_a_bandwidth_limit()
    {
        var truth = Bench with { FlickerCornerHz = 0, PoleHz = double.PositiveInfinity };
        var codes = new SyntheticCapture(25).PixelCodes(truth, 2048, 40);
        var analysis = CaptureAnalysis.Run(CaptureFixtures.Bench, CaptureFixtures.Pixels(codes), new CaptureAnalysisOptions());
        Assert.Equal(2, analysis.Warnings.Count(w => w.Code == CaptureCodes.TermNotResolved));
        var section = FittedNoiseSection.ToToml(CaptureFixtures.Bench, analysis);
        Assert.Contains("bandwidth_hz = \"5 MHz\"", section, StringComparison.Ordinal);
        Assert.DoesNotContain("flicker_corner_hz", section, StringComparison.Ordinal);
        Assert.NotEmpty(analysis.Validation);
    }
}
