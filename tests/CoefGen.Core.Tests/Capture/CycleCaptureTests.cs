using CoefGen.Core.Capture;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Noise;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Tests.Capture;

/// <summary>Captures of a general cycle: the shipped repeated-reads example, and checks of the capture path against closed forms.</summary>
public sealed class CycleCaptureTests
{
    [Fact]
    public void Example_capture_is_exactly_the_documented_synthesis()
    {
        ExampleSynthesis.AssertFileIs(CycleCaptureFixtures.ExampleCapturePath, SyntheticCapture.ToRaw16(CycleCaptureFixtures.ExampleCodes()));
    }

    [Fact]
    public void Fit_of_the_example_recovers_the_generators_white_level_and_corner_within_three_stated_sigmas()
    {
        // The generator's parameters are known exactly (CycleCaptureFixtures.Truth); the fit states 1-sigma
        // uncertainties of the log parameters (SpectrumFit). Three of them: a 0.3 % chance per parameter to fail by luck.
        var d = CycleCaptureFixtures.Skipper;
        var a = CaptureAnalysis.Run(d, CycleCaptureFixtures.Pixels(d, CycleCaptureFixtures.ExampleCodes()), new CaptureAnalysisOptions());
        var fit = a.Fit;
        var truth = CycleCaptureFixtures.Truth;
        Assert.InRange(Math.Log(fit.Model.WhiteV2PerHz / truth.WhiteV2PerHz), -3 * fit.WhiteLogSigma, 3 * fit.WhiteLogSigma);
        Assert.NotNull(fit.FlickerLogSigma);
        Assert.InRange(Math.Log(fit.Model.FlickerCornerHz / truth.FlickerCornerHz), -3 * fit.FlickerLogSigma!.Value, 3 * fit.FlickerLogSigma.Value);
        Assert.NotNull(fit.Model.PoleHz);
        Assert.InRange(Math.Log(fit.Model.PoleHz!.Value / truth.PoleHz), -3 * fit.PoleLogSigma!.Value, 3 * fit.PoleLogSigma.Value);

        // Held-out validation runs on the cycle's 128 weighted samples; the capture optimum is no worse than the boxcar
        // beyond the overlap of their 95 % intervals.
        Assert.Equal(512, a.HeldOutRows.Count);
        var v = a.Validation.ToDictionary(s => s.Label);
        Assert.True(v["optimal (capture)"].LowerSigmaV < v["boxcar"].UpperSigmaV);
    }

    // The white-only and true-model checks below design on 8192 generated cycles (P). Tolerance on the weights: the
    // optimum on an estimated covariance loses, on the true one, a share of about (k - 1) / (P + 2 - k) of its variance
    // (k = free weights = 128 - 2 here; Reed, Mallett and Brennan 1974, IEEE Trans. AES 10, 853: the normalised SNR of
    // sample-matrix weights has mean (P + 2 - k) / (P + 1)); shrinkage towards a model only lowers that. The tests
    // allow three times that mean. Tolerance on a predicted variance: the sample variance of P cycles has a relative
    // standard deviation of sqrt(2 / P) (chi-square); four of them.
    private const int ManyCycles = 8192;

    private static double WeightTolerance(int k) => 3.0 * (k - 1) / (ManyCycles + 2.0 - k);

    private static double VarianceTolerance => 4 * Math.Sqrt(2.0 / ManyCycles);

    [Fact]
    public void White_capture_design_over_eight_reads_is_the_plain_average_with_sigma_one_over_root_n()
    {
        // Independent samples (no pole, no 1/f): the optimum of N reads of m samples each with one reset is the plain
        // average of the read differences, sigma_N = sigma_1 / sqrt(N), sigma_1^2 = 2 sigma^2 / m (Tiffenberg et al. 2017,
        // PRL 119, 131802). The readout keeps its data-sheet guess (30 nV/rtHz and a 20 kHz corner, not the truth), so
        // the shrinkage target is wrong and the result has to come from the capture.
        var truth = CycleCaptureFixtures.Truth with { FlickerCornerHz = 0, PoleHz = double.PositiveInfinity };
        var d = CycleCaptureFixtures.Edited(
            ("step = \"pole\"", "step = \"ideal\""),
            ("front_end_pole_hz = \"2 MHz\"", "bandwidth_hz = \"2.5 MHz\""));
        var codes = new SyntheticCapture(7).CycleCodes(truth, ManyCycles, CycleCaptureFixtures.Waveform(d));
        var grid = SampleGrid.FromDescription(d);
        var (covariance, solution) = CaptureAnalysis.DesignOnCapture(d, CycleCaptureFixtures.Pixels(d, codes), NoiseModel.FromDescription(d));
        Assert.InRange(covariance.Shrinkage, 0, 0.2);

        var lsb = truth.LsbV;
        var sigma2 = (truth.WhiteV2PerHz * truth.RateHz / 2) + (lsb * lsb * ((truth.AdcNoiseLsb * truth.AdcNoiseLsb) + (1.0 / 12)));
        const int reads = 8, m = 8;
        var sigmaN2 = 2 * sigma2 / m / reads;
        var average = BoxcarWeights.Compute(grid, rejectDrift: false).H;
        Assert.All(average, h => Assert.Equal(1.0 / (reads * m), Math.Abs(h), 1e-12));

        // Under white noise a weight set's variance is sigma^2 sum h^2: the capture optimum's excess over the average.
        var excess = (solution.H.Sum(h => h * h) / average.Sum(h => h * h)) - 1;
        Assert.InRange(excess, 0, WeightTolerance(grid.Count - 2));
        Assert.InRange(covariance.SampleQuadraticForm(average) / sigmaN2, 1 - VarianceTolerance, 1 + VarianceTolerance);
    }

    [Fact]
    public void Capture_design_and_parametric_design_of_the_same_true_model_agree_within_the_estimation_error()
    {
        // The parametric design of the generator's model (white 40 nV/rtHz, 50 kHz corner, 1.5 MHz pole, the ADC's noise)
        // is the true optimum. The capture design starts from the data-sheet guess (30 nV/rtHz, 20 kHz; the step's pole
        // set to the true 1.5 MHz so that both solve under the same unit-gain constraint) and must reach it from the
        // capture: on the true covariance it may lose at most the estimation tolerance. (Here 1/f buys the true optimum
        // only 0.9 % of variance over the boxcar, less than the 1.6 % the estimate is expected to lose at this P, so
        // the capture design is not asserted to beat the boxcar.) The capture's estimate of fixed weights is unbiased.
        var truth = CycleCaptureFixtures.Truth;
        var pole = ("front_end_pole_hz = \"2 MHz\"", "front_end_pole_hz = \"1.5 MHz\"");
        var trueModel = CycleCaptureFixtures.Edited(
            pole, ("flicker_corner_hz = \"20 kHz\"", "flicker_corner_hz = \"50 kHz\""), ("white_nv_per_rthz = 30.0", "white_nv_per_rthz = 40.0"));
        var guess = CycleCaptureFixtures.Edited(pole);
        var codes = new SyntheticCapture(11).CycleCodes(truth, ManyCycles, CycleCaptureFixtures.Waveform(guess));
        var grid = SampleGrid.FromDescription(trueModel);
        var r = NoiseModel.FromDescription(trueModel).Sample(grid);
        var parametric = OptimalWeights.Compute(grid, r, rejectDrift: false);
        var (covariance, solution) = CaptureAnalysis.DesignOnCapture(guess, CycleCaptureFixtures.Pixels(guess, codes), NoiseModel.FromDescription(guess));
        Assert.InRange(covariance.Shrinkage, 0, 0.2);

        var loss = (r.QuadraticForm(solution.H) / parametric.VarianceV2) - 1;
        Assert.InRange(loss, -1e-9, WeightTolerance(grid.Count - 2));
        Assert.InRange(covariance.SampleQuadraticForm(parametric.Weights.H) / parametric.VarianceV2, 1 - VarianceTolerance, 1 + VarianceTolerance);
    }

    [Fact]
    public void Ramp_design_on_an_idle_capture_adds_the_readouts_shot_noise_and_is_optimal_for_the_sum()
    {
        // An idle capture holds the read noise only; the shot noise of the stated signal level comes from the readout
        // (F min(t_i, t_j), PHYSICS.md §4b). The weights must minimise capture + shot: no worse than the weights designed
        // on the capture alone, judged on the sum; the budget splits the two exactly.
        var d = CoefGen.Core.Tests.Pipeline.ShippedExamples.Load(Path.Combine("cycles", "fowler_ir.toml"));
        var model = DesignPipeline.Run(d, CoefGen.Core.Tests.Pipeline.ShippedExamples.Catalog);
        var shot = model.Covariance.Shot!;
        var m = CycleCaptureFixtures.Truth with { RateHz = d.Adc.RateHz, FlickerCornerHz = 2e3, PoleHz = 4e5, LsbV = d.Adc.LsbV };
        var capture = CycleCaptureFixtures.Pixels(d, new SyntheticCapture(3).CycleCodes(m, 96, new double[d.Timing.PixelSamples]));
        var result = CaptureDesign.Apply(model, capture);
        var covariance = result.CaptureCovariance!;
        var optimal = result.Predictions[2];
        var h = result.Weights[2].H;
        Assert.Equal(covariance.QuadraticForm(h) + shot.QuadraticForm(h), optimal.VarianceV2, optimal.VarianceV2 * 1e-12);
        Assert.Equal(shot.QuadraticForm(h), optimal.Budget[1].VarianceV2, 1e-30);
        var readOnly = CaptureAnalysis.DesignOnCapture(d, capture, model.Noise).Solution.H;
        Assert.True(optimal.VarianceV2 <= (covariance.QuadraticForm(readOnly) + shot.QuadraticForm(readOnly)) * (1 + 1e-12));
        Assert.True(shot.QuadraticForm(h) > 0.05 * optimal.VarianceV2, "the example's shot noise is a visible share");
        Assert.All(result.Predictions, p => Assert.True(p.VarianceV2 >= optimal.VarianceV2 * (1 - 1e-12)));

        // The noise-against-level table on the capture: at the design level the designed weights are the optimum there.
        var rows = CaptureSignalLevels.Compute(result.Grid, covariance, d, h, rejectDrift: false);
        var here = Assert.Single(rows, row => row.IsDesignLevel);
        Assert.Equal(optimal.SigmaElectrons, here.DesignedSigmaE, optimal.SigmaElectrons * 1e-9);
        Assert.Equal(here.OptimalSigmaE, here.DesignedSigmaE, here.DesignedSigmaE * 1e-9);
        Assert.All(rows, row => Assert.True(row.DesignedSigmaE >= row.OptimalSigmaE * (1 - 1e-9)));
    }

    [Fact]
    public void A_cycle_too_large_for_the_capture_covariance_is_CG5009_at_its_windows_but_a_stream_is_still_fitted()
    {
        var big = CycleCaptureFixtures.Edited(("times = 8", "times = 129"), ("pixel_samples = 200", "pixel_samples = 3200"));
        var codes = CycleCaptureFixtures.ExampleCodes()[..(20 * 3200)];
        var ex = Assert.Throws<InputException>(() => CaptureAnalysis.Run(big, CycleCaptureFixtures.Pixels(big, codes), new CaptureAnalysisOptions()));
        var error = Assert.Single(ex.Diagnostics);
        Assert.Equal(CaptureCodes.CycleTooLarge, error.Code);
        Assert.Equal("timing.window", error.Key);
        Assert.Contains("2064 weighted samples", error.Message, StringComparison.Ordinal);

        var stream = CaptureAnalysis.Run(big, new SampleCapture("s.i16", CaptureLayout.Stream, 1, codes), new CaptureAnalysisOptions());
        Assert.Empty(stream.Validation);
        Assert.True(stream.Fit.Model.WhiteV2PerHz > 0);
    }
}
