using CoefGen.Core.Capture;
using CoefGen.Core.Noise;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Tests.Capture;

public sealed class CaptureWeightsTests
{
    [Fact]
    public void Dense_matrix_solver_equals_the_lag_table_solver_on_a_stationary_matrix()
    {
        var d = CaptureFixtures.Bench;
        var grid = SampleGrid.FromDescription(d);
        var r = NoiseModel.FromDescription(d).Sample(grid);
        var dense = r.ToDense();
        var flat = Enumerable.Range(0, grid.Count * grid.Count).Select(e => dense[e / grid.Count, e % grid.Count]).ToArray();
        var expected = new DenseNullSpaceSolver().Solve(grid, r, rejectDrift: false);
        var actual = DenseMatrixOptimalSolver.Solve(grid, flat, rejectDrift: false);
        for (var i = 0; i < grid.Count; i++)
        {
            Assert.Equal(expected.H[i], actual.H[i], 1e-9);
        }

        Assert.Equal(expected.VarianceV2, actual.VarianceV2, expected.VarianceV2 * 1e-9);
    }

    [Fact]
    public void Capture_optimal_weights_beat_boxcar_and_model_optimal_on_held_out_pixels_when_a_tone_is_present()
    {
        var analysis = CaptureAnalysis.Run(CaptureFixtures.Bench, CaptureFixtures.Pixels(CaptureFixtures.ExampleCodes()), new CaptureAnalysisOptions());
        var v = analysis.Validation.ToDictionary(s => s.Label);
        var capture = v["optimal (capture)"];

        // Non-overlapping 95 % intervals: the improvement is not a fluctuation of the held-out estimate.
        Assert.True(capture.UpperSigmaV < v["boxcar"].LowerSigmaV, $"capture {capture.MeasuredSigmaV} vs boxcar {v["boxcar"].MeasuredSigmaV}");
        Assert.True(capture.UpperSigmaV < v["optimal (fitted model)"].LowerSigmaV, $"capture {capture.MeasuredSigmaV} vs model {v["optimal (fitted model)"].MeasuredSigmaV}");

        // The design half's covariance predicts the held-out noise of the boxcar inside its interval.
        Assert.InRange(v["boxcar"].PredictedCaptureSigmaV, v["boxcar"].LowerSigmaV, v["boxcar"].UpperSigmaV);
    }

    [Fact]
    public void Without_a_tone_the_fitted_model_predicts_the_held_out_noise_of_every_scheme()
    {
        var codes = new SyntheticCapture(5).PixelCodes(SyntheticCapture.Bench(0), 2048, 40);
        var analysis = CaptureAnalysis.Run(CaptureFixtures.Bench, CaptureFixtures.Pixels(codes), new CaptureAnalysisOptions());
        foreach (var s in analysis.Validation)
        {
            Assert.InRange(s.PredictedModelSigmaV, s.LowerSigmaV, s.UpperSigmaV);
        }
    }

    [Fact]
    public void Shrinkage_keeps_the_capture_covariance_positive_definite_with_fewer_pixels_than_samples()
    {
        var d = CaptureFixtures.Bench;
        var grid = SampleGrid.FromDescription(d);
        var capture = CaptureFixtures.Pixels(new SyntheticCapture(6).PixelCodes(SyntheticCapture.Bench(100e-6), 16, 40));
        var target = NoiseModel.FromDescription(d).Sample(grid).ToDense();
        var flat = Enumerable.Range(0, grid.Count * grid.Count).Select(e => target[e / grid.Count, e % grid.Count]).ToArray();
        var c = CaptureCovariance.Estimate(capture, Enumerable.Range(0, 16).ToArray(), grid, d.Adc.LsbV, flat);
        Assert.InRange(c.Shrinkage, CaptureCovariance.MinimumShrinkage, 1);
        var solution = DenseMatrixOptimalSolver.Solve(grid, c.Matrix, rejectDrift: false);
        Assert.True(solution.VarianceV2 > 0);
    }
}
