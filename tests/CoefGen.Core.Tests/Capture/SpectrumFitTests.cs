using CoefGen.Core.Capture;

namespace CoefGen.Core.Tests.Capture;

public sealed class SpectrumFitTests
{
    private const int Samples = 1 << 16;
    private const int Segment = 4096;

    [Theory]
    [InlineData(0.0, 11)]
    [InlineData(100e-6, 12)]
    public void Fit_recovers_white_flicker_and_pole_within_three_sigma(double toneV, int seed)
    {
        var truth = SyntheticCapture.Bench(toneV);
        var fit = FitStream(truth, seed);

        // Source of the check: the synthesis above (known parameters); tolerance 3 sigma of the fit's own uncertainty.
        AssertWithin(Math.Log(truth.WhiteV2PerHz), Math.Log(fit.Model.WhiteV2PerHz), fit.WhiteLogSigma, "ln W");
        AssertWithin(Math.Log(truth.FlickerCornerHz), Math.Log(fit.Model.FlickerCornerHz), fit.FlickerLogSigma!.Value, "ln f_c");
        AssertWithin(Math.Log(truth.PoleHz), Math.Log(fit.Model.PoleHz!.Value), fit.PoleLogSigma!.Value, "ln f_p");

        // The uncertainties are informative, not so wide that any answer passes: e to better than 2 %, f_c and f_p to 20 %.
        Assert.True(fit.WhiteLogSigma < 0.04 && fit.FlickerLogSigma < 0.2 && fit.PoleLogSigma < 0.2,
            $"sigmas {fit.WhiteLogSigma} {fit.FlickerLogSigma} {fit.PoleLogSigma}");
    }

    [Fact]
    public void A_tone_is_masked_and_reported_as_a_line_at_its_frequency_and_amplitude()
    {
        var truth = SyntheticCapture.Bench(100e-6);
        var fit = FitStream(truth, 12);
        var line = Assert.Single(fit.Lines, l => Math.Abs(l.FrequencyHz - truth.ToneHz) < 2 * truth.RateHz / Segment);

        // A sine of amplitude A has rms A / sqrt(2); the masked-bin estimate is good to about 10 % (common practice, no source).
        Assert.InRange(line.RmsV, 0.9 * truth.ToneV / Math.Sqrt(2), 1.1 * truth.ToneV / Math.Sqrt(2));
    }

    [Fact]
    public void A_clean_spectrum_leaves_log_residuals_of_the_size_the_chi_square_predicts()
    {
        var fit = FitStream(SyntheticCapture.Bench(0), 13);
        Assert.InRange(fit.ResidualRms / fit.ExpectedResidualRms, 0.9, 1.1);
    }

    [Fact]
    public void A_held_pole_is_not_fitted_and_has_no_uncertainty()
    {
        var truth = SyntheticCapture.Bench(0);
        var codes = new SyntheticCapture(14).StreamCodes(truth, Samples);
        var spectrum = WelchEstimator.Estimate(codes.Select(c => c * truth.LsbV).ToArray(), truth.RateHz, Segment);
        var fit = SpectrumFitter.Fit(spectrum, Digital(truth), truth.PoleHz)!;
        Assert.Null(fit.PoleLogSigma);
        Assert.Equal(truth.PoleHz, fit.Model.PoleHz);
        AssertWithin(Math.Log(truth.WhiteV2PerHz), Math.Log(fit.Model.WhiteV2PerHz), fit.WhiteLogSigma, "ln W");
    }

    internal static SpectrumFit FitStream(SyntheticCapture.Model truth, int seed)
    {
        var codes = new SyntheticCapture(seed).StreamCodes(truth, Samples);
        var capture = new SampleCapture("synthetic", CaptureLayout.Stream, 1, codes);
        var spectrum = WelchEstimator.Estimate(CaptureSamples.ResidualStream(capture, truth.LsbV), truth.RateHz, Segment);
        return SpectrumFitter.Fit(spectrum, Digital(truth), null) ?? throw new InvalidOperationException("fit failed");
    }

    // Quantisation LSB²/12 plus the ADC's own noise, as AdcSpec.DigitalVarianceV2.
    private static double Digital(SyntheticCapture.Model m) => m.LsbV * m.LsbV * ((1.0 / 12) + (m.AdcNoiseLsb * m.AdcNoiseLsb));

    internal static void AssertWithin(double expected, double actual, double sigma, string what) =>
        Assert.True(Math.Abs(actual - expected) <= 3 * sigma, $"{what}: fitted {actual}, true {expected}, sigma {sigma} ({(actual - expected) / sigma:F2} sigma)");
}
