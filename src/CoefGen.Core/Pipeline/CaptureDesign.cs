using System.Globalization;
using CoefGen.Core.Capture;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Noise;
using CoefGen.Core.Prediction;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Pipeline;

/// <summary>
/// `noise.capture` in the readout file: the covariance of the window samples comes from the capture itself
/// (mean waveform removed, shrunk towards the parametric model, see <see cref="CaptureCovariance"/>), the
/// optimal weights are designed on it, and every scheme's read noise is predicted on it. The integer design
/// is redone for the new chosen weights: its output fraction bits, noise penalty and predicted output noise use
/// the capture covariance (only the quantiser's +-1 refinement uses the parametric model, which it needs as lag
/// tables), and golden vectors draw their noise from the capture covariance too. A general cycle works the same way
/// (the covariance is projected per reset group); for ramp windows the capture, taken idle, holds the read noise only,
/// so the shot noise of the readout's signal level (<see cref="SampledCovariance.Shot"/>) is added to it for the
/// weights and every prediction, as the vectors add it to their draws.
/// </summary>
public static class CaptureDesign
{
    private const string ShotSourceName = "shot noise (readout file)";

    public static DesignResult Apply(DesignResult model, SampleCapture capture)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(capture);
        var d = model.Description;
        if (model.IsTwoStage)
        {
            throw new InputException(Diagnostic.Error(TwoStageCodes.WithCapture, d.LocationOf("weights.form"),
                "form = \"two-stage\" is designed on the noise model's per-read blocks, not on a capture's covariance; remove noise.capture or use form = \"full\"", "weights.form"));
        }

        var shot = model.Covariance.Shot;
        var (covariance, solution) = CaptureAnalysis.DesignOnCapture(d, capture, model.Noise, shot);
        var shrinkage = covariance.Shrinkage.ToString("0.000", CultureInfo.InvariantCulture);
        var source = $"capture covariance ({covariance.Pixels.ToString(CultureInfo.InvariantCulture)} cycles, shrinkage {shrinkage})";
        Func<IReadOnlyList<double>, double> variance = shot is null ? covariance.QuadraticForm : h => covariance.QuadraticForm(h) + shot.QuadraticForm(h);
        var optimalLabel = d.Weights.RejectDrift ? "optimal on the capture (drift rejected)" : "optimal on the capture";
        WeightSet[] weights = [model.Weights[0], model.Weights[1], new WeightSet(WeightScheme.Optimal, optimalLabel, solution.H), .. model.Weights.Skip(3)];
        var predictions = weights.Select(w => Predict(w, variance, shot is null ? null : ShotShare(w, shot), d, source)).ToArray();
        var chosen = weights.First(w => w.Scheme == d.Weights.Scheme);
        var t = d.Timing;
        var datapath = IntegerStage.Run(d, () => FixedPointDesigner.Design(
            d.Name, model.Grid, chosen.H, model.Covariance, d.Adc, model.FixedPointSettings, t.PixelSamples, d.Weights.RejectDrift,
            variance));
        var result = model with
        {
            Weights = weights,
            Predictions = predictions,
            Datapath = datapath,
            Regret = model.Regret?.WithWeights(weights, d.Noise, d.Sensor),
            CaptureSource = $"{capture.SourcePath}: {source}",
            CaptureSpectrum = CaptureSpectrum(capture, d),
            OptimalSolver = "dense null-space on the capture covariance",
            CaptureCovariance = covariance,
            TwoStage = null, // the two-stage form is the model's: its noise would not compare with the capture's
            Warnings = [.. model.Warnings.Where(w => w.Code != "CG1309"), .. CaptureHealth.Check(capture, d.Adc)],
        };
        DesignFiniteness.ThrowIfNotFinite(result);
        return result;
    }

    private static WelchSpectrum? CaptureSpectrum(SampleCapture capture, ReadoutDescription d)
    {
        var record = CaptureSamples.ResidualStream(capture, d.Adc.LsbV);
        var segment = WelchEstimator.DefaultSegmentLength(record.Length);
        return segment * 2 <= record.Length ? WelchEstimator.Estimate(record, d.Adc.RateHz, segment) : null;
    }

    private static NoisePrediction Predict(WeightSet w, Func<IReadOnlyList<double>, double> quadratic, double? shotV2, ReadoutDescription d, string source)
    {
        var variance = quadratic(w.H);
        var sigma = Math.Sqrt(Math.Max(0, variance));
        NoiseBudgetEntry[] budget = shotV2 is double k
            ? [new NoiseBudgetEntry(source, variance - k, (variance - k) / variance), new NoiseBudgetEntry(ShotSourceName, k, k / variance)]
            : [new NoiseBudgetEntry(source, variance, 1.0)];
        return new NoisePrediction(
            w.Scheme,
            w.Label,
            variance,
            sigma,
            sigma / d.Adc.LsbV,
            sigma / d.Sensor.VoltsAtAdcPerElectron,
            budget,
            null,
            null);
    }

    private static double ShotShare(WeightSet w, ShotNoiseCovariance shot) => shot.QuadraticForm(w.H);
}
