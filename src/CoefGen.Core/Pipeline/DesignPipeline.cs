using CoefGen.Core.Diagnostics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Noise;
using CoefGen.Core.Prediction;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Pipeline;

/// <summary>
/// Runs the stages in order: description -> sampled covariance -> weights -> prediction -> integer design.
/// Throws <see cref="InputException"/> with located diagnostics when the description cannot be realised
/// (e.g. the fixed-point settings do not fit the target).
/// </summary>
public static class DesignPipeline
{
    /// <summary>
    /// The frequency-domain cross-check costs about O(N * span) (weighted samples times the span of the two windows,
    /// ~0.4 s at 2000 x 2100 on one core); above this product it is skipped and reported as skipped.
    /// </summary>
    public const long FrequencyCheckLimit = 10_000_000;

    /// <param name="description">A validated readout description.</param>
    /// <param name="catalog">Target profiles.</param>
    /// <param name="frequencyCheck">Compute the frequency-domain cross-check (sweeps turn it off: it changes no prediction).</param>
    public static DesignResult Run(ReadoutDescription description, TargetCatalog catalog, bool frequencyCheck = true)
    {
        ArgumentNullException.ThrowIfNull(description);
        ArgumentNullException.ThrowIfNull(catalog);

        var resolution = FixedPointSettingsResolver.Resolve(description, catalog);
        if (resolution.Settings is null || resolution.Diagnostics.Any(d => d.Severity == Severity.Error))
        {
            throw new InputException(resolution.Diagnostics);
        }

        var grid = SampleGrid.FromDescription(description);
        var infeasible = DesignFeasibility.Check(description, grid);
        if (infeasible.Count > 0)
        {
            throw new InputException(infeasible);
        }

        var noise = NoiseModel.FromDescription(description);
        var covariance = CycleNoise.WithShot(noise.Sample(grid), grid, description);
        var twoStageErrors = TwoStageStage.Check(description, grid, covariance);
        if (twoStageErrors.Count > 0)
        {
            throw new InputException(twoStageErrors);
        }

        var solver = OptimalSolverSelection.For(grid.Count, stationary: covariance.Shot is null);
        var weights = SolveWeights(description, grid, covariance, solver.Solver);
        RegretTable? regret = null;
        if (description.Scenarios is not null)
        {
            (var robust, regret) = ScenarioStage.Run(description, grid, weights, solver.Solver);
            weights = [.. weights, robust];
        }

        var span = grid.SampleIndex[^1] - grid.SampleIndex[0] + 1L;
        // Shot noise is not stationary: it has no spectrum, so the frequency-domain identity does not apply.
        Func<IReadOnlyList<double>, double>? frequencyDomain = frequencyCheck && covariance.Shot is null && grid.Count * span <= FrequencyCheckLimit
            ? h => FrequencyDomainVariance.ComputeByComponent(noise, grid, h).Sum()
            : null;
        var predictions = weights
            .Select(w => NoisePredictor.Predict(w, covariance, description.Adc, description.Sensor, frequencyDomain))
            .ToArray();

        var chosen = weights.First(w => w.Scheme == description.Weights.Scheme);
        var twoStage = TwoStageStage.Run(description, grid, covariance, resolution.Settings);
        // With form = "two-stage" the full table is not quantised: it need not fit the target, its two-stage tables must.
        var integer = description.Weights.Form == WeightsForm.TwoStage
            ? null
            : IntegerStage.Run(description, () => IntegerDesignOf(description, grid, chosen, covariance, resolution.Settings));

        var result = new DesignResult
        {
            Description = description,
            Grid = grid,
            Noise = noise,
            Covariance = covariance,
            Weights = weights,
            Predictions = predictions,
            OptimalSolver = solver.Name,
            FixedPointSettings = resolution.Settings,
            Datapath = integer,
            TwoStage = twoStage,
            Regret = regret,
            Warnings =
            [
                .. resolution.Diagnostics.Where(d => d.Severity == Severity.Warning),
                .. CaptureNotice(description),
                .. DesignPlausibility.Check(description, covariance, chosen.H, integer),
            ],
        };
        DesignFiniteness.ThrowIfNotFinite(result);
        return result;
    }

    /// <summary>
    /// The same design with its integer datapath made again for other (already validated) fixed-point settings, e.g. the
    /// shared widths of an instrument; everything before the quantiser is kept.
    /// </summary>
    public static DesignResult WithSettings(DesignResult result, FixedPointSettings settings)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(settings);
        var d = result.Description;
        var twoStage = TwoStageStage.Run(d, result.Grid, result.Covariance, settings);
        var integer = d.Weights.Form == WeightsForm.TwoStage
            ? null
            : IntegerStage.Run(d, () => IntegerDesignOf(d, result.Grid, result.Chosen, result.Covariance, settings));
        return result with { FixedPointSettings = settings, Datapath = integer, TwoStage = twoStage };
    }

    private static IntegerDesign IntegerDesignOf(ReadoutDescription d, SampleGrid grid, WeightSet chosen, SampledCovariance covariance, FixedPointSettings settings)
    {
        var t = d.Timing;
        return FixedPointDesigner.Design(d.Name, grid, chosen.H, covariance, d.Adc, settings, t.PixelSamples, d.Weights.RejectDrift);
    }

    // Core does not read files: the CLI parses noise.capture and calls CaptureDesign.Apply, which drops this warning.
    private static IEnumerable<Diagnostic> CaptureNotice(ReadoutDescription d) =>
        d.Noise.CapturePath is null
            ? []
            : [Diagnostic.Warning("CG1309", d.LocationOf("noise.capture"),
                "the capture was not applied: this design uses the parametric noise model only (the coefgen command applies noise.capture; `coefgen fit` shows held-out read noise)")];

    private static IReadOnlyList<WeightSet> SolveWeights(ReadoutDescription d, SampleGrid grid, SampledCovariance r, IOptimalSolver solver)
    {
        try
        {
            return WeightSchemes.ComputeAll(grid, r, d.Weights, solver);
        }
        catch (CovarianceNotPositiveDefiniteException ex)
        {
            throw new InputException(Diagnostic.Error(
                "CG1501",
                d.LocationOf("noise"),
                $"the noise covariance is not positive definite on the constraint null space ({ex.Message}); give the ADC some noise (adc.noise_lsb) or check the noise sources"));
        }
    }
}
