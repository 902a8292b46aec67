using CoefGen.Core.Readout;

namespace CoefGen.Core.Prediction;

/// <summary>One scheme's read noise in every scenario and its ratio to that scenario's own optimum.</summary>
/// <param name="Scheme">The scheme.</param>
/// <param name="Label">Its label, e.g. "optimal" (designed for the nominal noise).</param>
/// <param name="SigmaElectrons">Read noise in each scenario, e- rms, in scenario order.</param>
/// <param name="Ratio">SigmaElectrons[i] / the optimum's noise in scenario i (>= 1 up to round-off).</param>
public sealed record RegretRow(WeightScheme Scheme, string Label, IReadOnlyList<double> SigmaElectrons, IReadOnlyList<double> Ratio)
{
    public double WorstElectrons => SigmaElectrons.Max();

    public double MeanElectrons => SigmaElectrons.Average();

    /// <summary>The worst-case regret: the largest ratio to a scenario's own optimum.</summary>
    public double WorstRatio => Ratio.Max();

    public double MeanRatio => Ratio.Average();
}
