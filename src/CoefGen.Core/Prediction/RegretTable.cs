using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Prediction;

/// <summary>
/// How much each scheme loses in each noise scenario against the best possible there (the optimal weights
/// for that scenario's covariance), with the robust solve that produced the robust row.
/// </summary>
/// <param name="Scenarios">The scenarios, in file order.</param>
/// <param name="OptimumElectrons">Each scenario's own optimum read noise, e- rms.</param>
/// <param name="Rows">Boxcar, weighted, optimal (for the nominal noise), robust.</param>
/// <param name="Robust">The robust solve (dual point, duality gap, solves).</param>
/// <param name="VariedKey">The one key every scenario varies (for a chart against it), or null when several keys vary.</param>
/// <param name="VariedValues">That key's value in each scenario (the nominal value for the nominal scenario), or null.</param>
public sealed record RegretTable(
    IReadOnlyList<NoiseScenario> Scenarios,
    IReadOnlyList<double> OptimumElectrons,
    IReadOnlyList<RegretRow> Rows,
    RobustSolution Robust,
    string? VariedKey,
    IReadOnlyList<double>? VariedValues)
{
    /// <summary>The scenario covariances the rows were evaluated on (to re-evaluate other weights, e.g. on a capture).</summary>
    public IReadOnlyList<SampledCovariance> Covariances { get; init; } = [];

    /// <summary>The same scenarios and robust solve with the rows of other weights (e.g. the optimum on a capture).</summary>
    public RegretTable WithWeights(IReadOnlyList<WeightSet> weights, NoiseSpec nominal, SensorSpec sensor) =>
        Build(nominal, Scenarios, Covariances, weights, Robust, sensor);

    /// <summary>Builds the table: every weight set evaluated on every scenario covariance.</summary>
    public static RegretTable Build(
        NoiseSpec nominal,
        IReadOnlyList<NoiseScenario> scenarios,
        IReadOnlyList<SampledCovariance> covariances,
        IReadOnlyList<WeightSet> weights,
        RobustSolution robust,
        SensorSpec sensor)
    {
        ArgumentNullException.ThrowIfNull(nominal);
        ArgumentNullException.ThrowIfNull(scenarios);
        ArgumentNullException.ThrowIfNull(covariances);
        ArgumentNullException.ThrowIfNull(weights);
        ArgumentNullException.ThrowIfNull(robust);
        ArgumentNullException.ThrowIfNull(sensor);
        double Electrons(double v) => Math.Sqrt(Math.Max(0, v)) / sensor.VoltsAtAdcPerElectron;
        var optimum = robust.ScenarioOptimaV2.Select(Electrons).ToArray();
        var rows = weights.Select(w =>
        {
            var sigma = covariances.Select(c => Electrons(c.QuadraticForm(w.H))).ToArray();
            return new RegretRow(w.Scheme, w.Label, sigma, [.. sigma.Select((s, i) => s / optimum[i])]);
        }).ToArray();

        var keys = scenarios.SelectMany(s => s.Overrides.Select(o => o.Key)).Distinct().ToList();
        string? key = keys.Count == 1 && scenarios.All(s => s.Overrides.Count <= 1) ? keys[0] : null;
        double[]? values = null;
        if (key is not null && NoiseOverrides.ValueOf(nominal, key) is double nominalValue)
        {
            values = [.. scenarios.Select(s => s.Overrides.Count == 1 ? s.Overrides[0].Value : nominalValue)];
        }

        return new RegretTable(scenarios, optimum, rows, robust, values is null ? null : key, values) { Covariances = covariances };
    }
}
