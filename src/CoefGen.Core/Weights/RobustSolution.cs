using CoefGen.Core.Readout;

namespace CoefGen.Core.Weights;

/// <summary>The robust weights over noise scenarios and what the solve reached.</summary>
/// <param name="H">The weights (constraints as every other scheme).</param>
/// <param name="Objective">Worst case (minimax over the scenarios) or mean.</param>
/// <param name="Lambda">Scenario weights of the covariance mix the weights are optimal for (the dual point).</param>
/// <param name="ScenarioVariancesV2">h^T C_i h for each scenario i.</param>
/// <param name="ScenarioOptimaV2">Each scenario's own optimal variance (the optimal weights for C_i alone).</param>
/// <param name="DualBound">The best lower bound on the objective found, max over the visited λ of the optimal variance of the mix:
/// in V^2 for the worst case, a ratio of variances for the regret, the mean variance (exact) for the mean.</param>
/// <param name="RelativeGap">(objective of H - dual bound) / dual bound; null for the mean objective (solved exactly).</param>
/// <param name="Solves">Optimal solves used (the vertices included).</param>
public sealed record RobustSolution(
    double[] H,
    RobustObjective Objective,
    IReadOnlyList<double> Lambda,
    IReadOnlyList<double> ScenarioVariancesV2,
    IReadOnlyList<double> ScenarioOptimaV2,
    double DualBound,
    double? RelativeGap,
    int Solves)
{
    /// <summary>The largest variance over the scenarios, max_i h^T C_i h.</summary>
    public double WorstCaseV2 => ScenarioVariancesV2.Max();
}
