using System.Globalization;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Capture;

/// <summary>
/// From a parsed capture and its readout file: Welch spectrum of the noise record, fit of white + 1/f
/// + pole, and for pixel cycles the shrunk capture covariance, optimal weights on it and a held-out
/// comparison of every scheme. The spectrum and fit use all cycles (three parameters: negligible
/// leakage into the held-out half); the capture covariance uses only the design cycles.
/// Throws <see cref="InputException"/> with CG5xxx diagnostics when the capture cannot be analysed.
/// </summary>
public static class CaptureAnalysis
{
    public const string FittedSourceName = "fitted from capture";

    public static CaptureAnalysisResult Run(ReadoutDescription description, SampleCapture capture, CaptureAnalysisOptions options)
    {
        ArgumentNullException.ThrowIfNull(description);
        ArgumentNullException.ThrowIfNull(capture);
        ArgumentNullException.ThrowIfNull(options);
        var adc = description.Adc;
        var file = SourceLocation.FileOnly(capture.SourcePath);
        if (capture.Layout == CaptureLayout.PixelSynchronous && capture.CycleLength != description.Timing.PixelSamples)
        {
            throw Fail(CaptureCodes.WrongLayout, file,
                $"the capture has {Int(capture.CycleLength)} samples per cycle but timing.pixel_samples is {Int(description.Timing.PixelSamples)}");
        }

        var grid = SampleGrid.FromDescription(description);
        if (capture.Layout == CaptureLayout.PixelSynchronous)
        {
            // A stream has no covariance of the weighted samples: only the spectrum and the fit.
            CheckCycleSize(description, grid, "timing.window");
        }

        var record = CaptureSamples.ResidualStream(capture, adc.LsbV);
        var segment = options.SegmentLength ?? WelchEstimator.DefaultSegmentLength(record.Length);
        if (segment > record.Length / 2)
        {
            throw Fail(CaptureCodes.TooFewSamples, file,
                $"a Welch segment of {Int(segment)} samples needs at least {Int(2 * segment)} samples; the capture has {Int(record.Length)}");
        }

        var spectrum = WelchEstimator.Estimate(record, adc.RateHz, segment);
        double? fixedPole = null;
        if (options.FixPole)
        {
            fixedPole = description.Noise.FrontEndPoleHz
                ?? throw Fail(CaptureCodes.FitFailed, description.LocationOf("noise"), "the pole is to be held but the readout file gives no noise.front_end_pole_hz");
        }

        var health = CaptureHealth.Check(capture, adc);
        var fit = SpectrumFitter.Fit(spectrum, adc.DigitalVarianceV2, fixedPole)
            ?? throw new InputException([.. health, Diagnostic.Error(CaptureCodes.FitFailed, file,
                "not even a white level fits this spectrum (a bin of zero power, or no finite optimum); check that the capture holds live noise")]);

        var lowCutoff = description.Noise.Sources.Count > 0 ? description.Noise.Sources[0].LowCutoffHz : 0.01;
        var model = fit.Model;
        double? nyquist = model.PoleHz is null ? adc.RateHz / 2 : null;
        var components = new List<NoiseComponent> { ParametricNoiseComponent.White(FittedSourceName + " white", model.WhiteV2PerHz, model.PoleHz, nyquist) };
        if (model.FlickerCornerHz > 0 && lowCutoff < (nyquist ?? double.PositiveInfinity))
        {
            components.Add(ParametricNoiseComponent.Flicker(FittedSourceName + " 1/f", model.WhiteV2PerHz * model.FlickerCornerHz, lowCutoff, model.PoleHz, nyquist));
        }

        var fitted = new NoiseModel(components, adc.DigitalVarianceV2);
        var unresolved = fit.Unresolved.Select(term => Diagnostic.Warning(CaptureCodes.TermNotResolved, file, term == FitTerms.PoleTerm
            ? "the spectrum does not resolve a front-end pole (flat up to Nyquist or not determined): the fit leaves it out and its white part ends at Nyquist (bandwidth_hz = rate / 2)"
            : "the spectrum does not resolve a 1/f term (no rise at low frequencies above the uncertainty): the fit leaves it out (flicker corner 0)"));
        var result = new CaptureAnalysisResult
        {
            Capture = capture,
            Spectrum = spectrum,
            Fit = fit,
            LowCutoffHz = lowCutoff,
            FittedNoise = fitted,
            DesignRows = [],
            HeldOutRows = [],
            Grid = grid,
            Warnings = [.. health, .. unresolved],
        };
        return capture.Layout == CaptureLayout.Stream ? result : WithValidation(result, description, options);
    }

    /// <summary>
    /// Most weighted samples of a general cycle the dense capture covariance takes: it keeps about six N x N
    /// matrices (200 MB at 2048) and accumulates P N² products over the P cycles. Classic files have no limit
    /// (their windows are short and their results stay as they were).
    /// </summary>
    public const int MaxCycleSamples = 2048;

    /// <summary>The capture covariance of a pixel-synchronous capture and optimal weights designed on it (no validation split: all cycles).</summary>
    /// <param name="description">The readout file.</param>
    /// <param name="capture">A pixel-synchronous capture of idle cycles.</param>
    /// <param name="target">The parametric model the estimate is shrunk towards.</param>
    /// <param name="shot">
    /// Shot noise of an integrating charge at the readout's signal level, or null. An idle capture holds the read noise
    /// only, so this term (from the readout file) is added to the capture covariance for the solve; it is not part of
    /// the returned <see cref="CaptureCovariance"/>.
    /// </param>
    public static (CaptureCovariance Covariance, OptimalSolution Solution) DesignOnCapture(
        ReadoutDescription description, SampleCapture capture, NoiseModel target, ShotNoiseCovariance? shot = null)
    {
        ArgumentNullException.ThrowIfNull(description);
        ArgumentNullException.ThrowIfNull(capture);
        ArgumentNullException.ThrowIfNull(target);
        var grid = SampleGrid.FromDescription(description);
        CheckCycleSize(description, grid, "noise.capture");
        var covariance = CaptureCovariance.Estimate(capture, Enumerable.Range(0, capture.Rows).ToArray(), grid, description.Adc.LsbV, Dense(target.Sample(grid)));
        return (covariance, SolveOnCapture(description, grid, covariance, capture, shot));
    }

    private static CaptureAnalysisResult WithValidation(CaptureAnalysisResult result, ReadoutDescription d, CaptureAnalysisOptions options)
    {
        var capture = result.Capture;
        var grid = result.Grid;
        var design = Math.Clamp((int)Math.Round(capture.Rows * options.DesignFraction), 1, capture.Rows - 1);
        int[] designRows = [.. Enumerable.Range(0, design)];
        int[] heldOut = [.. Enumerable.Range(design, capture.Rows - design)];
        if (designRows.Length < 8 || heldOut.Length < 8)
        {
            throw Fail(CaptureCodes.TooFewSamples, SourceLocation.FileOnly(capture.SourcePath),
                $"the split leaves {Int(designRows.Length)} design and {Int(heldOut.Length)} held-out cycles; each needs at least 8");
        }

        var modelCovariance = result.FittedNoise.Sample(grid);
        var covariance = CaptureCovariance.Estimate(capture, designRows, grid, d.Adc.LsbV, Dense(modelCovariance));
        var rejectDrift = d.Weights.RejectDrift;
        var shaped = ShapedWeights.Compute(grid, d.Weights);
        var schemes = new List<(string Label, double[] H)>
        {
            ("boxcar", BoxcarWeights.Compute(grid, rejectDrift).H),
            (shaped.Label, shaped.H),
        };
        try
        {
            schemes.Add(("optimal (fitted model)", OptimalWeights.Compute(grid, modelCovariance, rejectDrift).Weights.H));
        }
        catch (CovarianceNotPositiveDefiniteException ex)
        {
            throw Fail(CaptureCodes.FitFailed, SourceLocation.FileOnly(capture.SourcePath), $"the fitted model is not positive definite on the grid ({ex.Message})");
        }

        schemes.Add(("optimal (capture)", SolveOnCapture(d, grid, covariance, capture).H));
        var validation = schemes
            .Select(s => HeldOutValidation.Evaluate(
                s.Label, s.H, capture, heldOut, grid, d.Adc.LsbV, modelCovariance.QuadraticForm(s.H), covariance.SampleQuadraticForm(s.H)))
            .ToArray();
        return result with { DesignRows = designRows, HeldOutRows = heldOut, Covariance = covariance, Validation = validation };
    }

    private static OptimalSolution SolveOnCapture(ReadoutDescription d, SampleGrid grid, CaptureCovariance covariance, SampleCapture capture, ShotNoiseCovariance? shot = null)
    {
        try
        {
            return DenseMatrixOptimalSolver.Solve(grid, shot is null ? covariance.Matrix : WithShot(covariance.Matrix, grid.Count, shot), d.Weights.RejectDrift);
        }
        catch (CovarianceNotPositiveDefiniteException ex)
        {
            throw Fail(CaptureCodes.FitFailed, SourceLocation.FileOnly(capture.SourcePath), $"the capture covariance is not positive definite on the constraint null space ({ex.Message})");
        }
    }

    private static void CheckCycleSize(ReadoutDescription d, SampleGrid grid, string key)
    {
        if (!d.Timing.Cycle.IsClassic && grid.Count > MaxCycleSamples)
        {
            throw new InputException(Diagnostic.Error(CaptureCodes.CycleTooLarge, d.LocationOf(key),
                $"the cycle has {Int(grid.Count)} weighted samples; a capture covariance is dense and takes at most {Int(MaxCycleSamples)} (fewer reads or shorter windows; `coefgen design` without noise.capture takes the full cycle)", key));
        }
    }

    /// <summary>C + K: the capture matrix with a shot term added (a new array).</summary>
    internal static double[] WithShot(double[] matrix, int n, ShotNoiseCovariance shot)
    {
        var m = (double[])matrix.Clone();
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                m[(i * n) + j] += shot.At(i, j);
            }
        }

        return m;
    }

    private static double[] Dense(SampledCovariance r)
    {
        var n = r.Count;
        var m = new double[n * n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                m[(i * n) + j] = r.At(i, j);
            }
        }

        return m;
    }

    private static InputException Fail(string code, SourceLocation location, string message) =>
        new(Diagnostic.Error(code, location, message));

    private static string Int(int v) => v.ToString(CultureInfo.InvariantCulture);
}
