using CoefGen.Core.Diagnostics;
using CoefGen.Core.Noise;
using CoefGen.Core.Prediction;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Pipeline;

/// <summary>
/// The [scenarios] stage: one covariance per noise scenario on the nominal grid, the robust weights over
/// them, and the regret table of every scheme. Talks to the noise model and the optimal solver only.
/// </summary>
public static class ScenarioStage
{
    /// <summary>The robust weight set and the regret table (rows: <paramref name="weights"/> then robust).</summary>
    public static (WeightSet Robust, RegretTable Regret) Run(ReadoutDescription d, SampleGrid grid, IReadOnlyList<WeightSet> weights, IOptimalSolver solver)
    {
        ArgumentNullException.ThrowIfNull(d);
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(weights);
        var spec = d.Scenarios ?? throw new ArgumentException("the description has no scenarios", nameof(d));
        // The shot noise of an integrating charge does not depend on the noise keys a scenario varies: every
        // scenario carries the nominal design's term (CycleNoise), so the robust weights see it too.
        var shot = CycleNoise.ShotOf(grid, d);
        var covariances = spec.Cases
            .Select(c => NoiseModel.FromDescription(d with { Noise = NoiseOverrides.Apply(d.Noise, c.Overrides) }).Sample(grid).WithShot(shot))
            .ToArray();
        RobustSolution solution;
        try
        {
            solution = RobustWeights.Compute(grid, covariances, d.Weights.RejectDrift, solver, spec.Objective);
        }
        catch (CovarianceNotPositiveDefiniteException ex)
        {
            throw new InputException(Diagnostic.Error(
                "CG1501",
                d.LocationOf("scenarios"),
                $"the noise covariance of a scenario is not positive definite on the constraint null space ({ex.Message}); give the ADC some noise (adc.noise_lsb) or check the scenario's noise keys"));
        }

        var count = spec.Cases.Count.ToString(System.Globalization.CultureInfo.InvariantCulture);
        var label = spec.Objective switch
        {
            RobustObjective.Mean => $"robust (mean over {count} scenarios)",
            RobustObjective.Regret => $"robust (least worst regret over {count} scenarios)",
            _ => $"robust (worst case over {count} scenarios)",
        };
        if (d.Weights.RejectDrift)
        {
            label += " (drift rejected)";
        }

        var robust = new WeightSet(WeightScheme.Robust, label, solution.H);
        var regret = RegretTable.Build(d.Noise, spec.Cases, covariances, [.. weights, robust], solution, d.Sensor);
        return (robust, regret);
    }
}
