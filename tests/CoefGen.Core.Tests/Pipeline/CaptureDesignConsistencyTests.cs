using CoefGen.Core.Capture;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Tests.Capture;
using CoefGen.Core.Vectors;

namespace CoefGen.Core.Tests.Pipeline;

/// <summary>
/// A capture design (noise.capture) predicts, quantises and draws golden-vector noise from one covariance: the
/// capture's. Checked on the bench example, whose data-sheet model (30 nV/rtHz) is far from its capture (40 nV/rtHz and a tone).
/// </summary>
public class CaptureDesignConsistencyTests
{
    private static readonly Lazy<(DesignResult Model, DesignResult Capture)> Designs = new(() =>
    {
        var model = DesignPipeline.Run(CaptureFixtures.Bench, ShippedExamples.Catalog);
        var codes = File.ReadAllBytes(CaptureFixtures.ExampleCapturePath);
        var parsed = CaptureParser.Parse(codes, "capture_bench_idle.i16", new CaptureFormat(CaptureEncoding.Raw16, CaptureLayout.PixelSynchronous, 40), CaptureFixtures.Bench.Adc);
        return (model, CaptureDesign.Apply(model, parsed.Capture!));
    });

    [Fact]
    public void Output_fraction_bits_and_predicted_output_noise_follow_the_capture_prediction()
    {
        var (model, capture) = Designs.Value;
        var d = capture.Datapath;

        // The integer weights' noise on the capture covariance, in ADU (h = c / 2^P, gain sum h s).
        var scaled = d.Coefficients.Select(c => Math.ScaleB(c, -d.P)).ToArray();
        var gain = scaled.Select((h, k) => h * capture.Grid.Step[k]).Sum();
        var sigmaAdu = Math.Sqrt(capture.CaptureCovariance!.QuadraticForm(scaled)) / Math.Abs(gain) / capture.Description.Adc.LsbV;
        Assert.Equal(sigmaAdu, capture.ChosenPrediction.SigmaAdu, capture.ChosenPrediction.SigmaAdu * 1e-3);
        Assert.Equal(Math.Min(FixedPointDesigner.RecommendedFracBits(sigmaAdu), capture.FixedPointSettings.OutputBits - 1), d.OutputFracBits);

        // Output noise = input noise x 2^F with the gain error, plus output rounding LSB^2 / 12 (PHYSICS.md §6).
        var outSigma = sigmaAdu * (1 + (d.GainErrorPpm * 1e-6)) * Math.ScaleB(1.0, d.OutputFracBits);
        Assert.Equal(Math.Sqrt((outSigma * outSigma) + (1.0 / 12)), d.PredictedNoiseOutputLsb, 1e-9 * d.PredictedNoiseOutputLsb);

        // And it is not the data-sheet model's figure any more.
        var modelPerAdu = model.Datapath.PredictedNoiseOutputLsb / Math.ScaleB(1.0, model.Datapath.OutputFracBits);
        var capturePerAdu = d.PredictedNoiseOutputLsb / Math.ScaleB(1.0, d.OutputFracBits);
        Assert.True(capturePerAdu > 1.1 * modelPerAdu, $"capture {capturePerAdu} ADU, model {modelPerAdu} ADU");
    }

    [Fact]
    public void Golden_vector_noise_pixels_have_the_capture_predicted_spread()
    {
        var (model, capture) = Designs.Value;
        var set = GoldenVectorGenerator.Generate(capture, new VectorOptions(3000, 7));
        var outputs = set.Pixels.Where(p => p.Kind == PixelKind.Noise).Select(p => (double)p.Expected.Output).ToArray();
        var mean = outputs.Average();
        var sd = Math.Sqrt(outputs.Sum(o => (o - mean) * (o - mean)) / (outputs.Length - 1));

        // The sample sd of n Gaussian values has relative sd 1/sqrt(2(n-1)) (common practice); 5 of those allowed.
        var tolerance = 5 / Math.Sqrt(2.0 * (outputs.Length - 1));
        var predicted = capture.Datapath.PredictedNoiseOutputLsb;
        Assert.True(Math.Abs((sd / predicted) - 1) < tolerance, $"vectors {sd}, capture prediction {predicted} output LSB, n {outputs.Length}");

        var modelInSameUnits = model.Datapath.PredictedNoiseOutputLsb * Math.ScaleB(1.0, capture.Datapath.OutputFracBits - model.Datapath.OutputFracBits);
        Assert.True(Math.Abs((sd / modelInSameUnits) - 1) > 3 * tolerance, $"vectors {sd} also match the data-sheet model {modelInSameUnits}");
    }
}
