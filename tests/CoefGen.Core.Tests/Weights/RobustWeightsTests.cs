using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;
using CoefGen.Core.Weights.Structured;

namespace CoefGen.Core.Tests.Weights;

public class RobustWeightsTests
{
    private static readonly DenseNullSpaceSolver Dense = new();

    private static SampleGrid Grid(int n, int gap) =>
        SampleGrid.Create(1e6, new SampleWindow(2, n), new SampleWindow(2 + n + gap, n), (2 + n - 0.5) / 1e6, null);

    /// <summary>
    /// Two scenarios whose optima differ, white-dominated versus strongly correlated (1/f-like) noise, the first
    /// scaled so that both own optima are equal: then neither vertex is the saddle.
    /// </summary>
    private static SampledCovariance[] Competing(SampleGrid g)
    {
        var lags = TestCovariances.LagCount(g);
        var white = new SampledCovariance(g.SampleIndex, [TestCovariances.Ar1("fast", lags, 1.0, 0.2)], 0.05);
        var slow = new SampledCovariance(g.SampleIndex, [TestCovariances.Ar1("fast", lags, 0.3, 0.2), TestCovariances.Ar1("slow", lags, 2.0, 0.97)], 0.05);
        var scale = OptimalVariance(g, slow) / OptimalVariance(g, white);
        return [CovarianceMixture.Mix([white], [scale]), slow];
    }

    private static double OptimalVariance(SampleGrid g, SampledCovariance c) => Dense.Solve(g, c, false).VarianceV2;

    [Fact]
    public void One_scenario_gives_the_optimal_weights()
    {
        // The minimax over one scenario is the plain optimum (definition; common practice, no source). 1e-9 relative.
        var g = Grid(12, 3);
        var c = TestCovariances.Mixture(g, new Random(3), 0.02);
        var optimal = Dense.Solve(g, c, false).H;
        foreach (var objective in new[] { RobustObjective.WorstCase, RobustObjective.Regret, RobustObjective.Mean })
        {
            var robust = RobustWeights.Compute(g, [c], false, Dense, objective);
            Assert.True(TestCovariances.MaxRelativeDifference(robust.H, optimal) < 1e-9, objective.ToString());
        }
    }

    [Fact]
    public void Two_scenarios_reach_the_largest_mixed_optimum_of_a_fine_one_dimensional_search()
    {
        // Minimax duality (Sion 1958; convex duality): min_h max_i h'C_i h = max over lambda in [0, 1] of the optimal
        // variance of (1 - lambda) C1 + lambda C2; the right side by a fine independent grid search with the dense solver.
        var g = Grid(16, 2);
        var c = Competing(g);
        var robust = RobustWeights.Compute(g, c, false, Dense, RobustObjective.WorstCase);
        var best = 0.0;
        var bestLambda = 0.0;
        for (var k = 0; k <= 2000; k++)
        {
            var lambda = k / 2000.0;
            var v = OptimalVariance(g, CovarianceMixture.Mix(c, [1 - lambda, lambda]));
            if (v > best)
            {
                best = v;
                bestLambda = lambda;
            }
        }

        Assert.InRange(bestLambda, 0.01, 0.99); // an interior saddle: the check is not a vertex in disguise
        Assert.True(Math.Abs(robust.WorstCaseV2 - best) <= 1e-6 * best, $"minimax {robust.WorstCaseV2:R} vs search {best:R}");
        Assert.True(robust.WorstCaseV2 >= best * (1 - 1e-12), "the minimax value is never below a dual value");
        Assert.NotNull(robust.RelativeGap);
        Assert.True(robust.RelativeGap < 1e-6, $"gap {robust.RelativeGap}");
        Assert.True(robust.DualBound <= robust.WorstCaseV2 * (1 + 1e-12));
        foreach (var own in c.Select(ci => Dense.Solve(g, ci, false).H))
        {
            var ownWorst = c.Max(ci => ci.QuadraticForm(own));
            Assert.True(robust.WorstCaseV2 <= ownWorst * (1 + 1e-12), "robust is no worse in the worst case than either scenario's optimum");
            Assert.True(robust.WorstCaseV2 < ownWorst * (1 - 1e-3), "and here strictly better, since the saddle is interior");
        }
    }

    [Fact]
    public void The_robust_weights_keep_the_constraints()
    {
        var g = Grid(10, 4);
        var c = Competing(g);
        var h = RobustWeights.Compute(g, c, false, Dense, RobustObjective.WorstCase).H;
        Assert.True(Math.Abs(h.Sum()) < 1e-12);
        Assert.True(Math.Abs(h.Select((x, i) => x * g.Step[i]).Sum() - 1) < 1e-12);
    }

    [Fact]
    public void Minimax_regret_is_no_worse_in_ratio_than_any_scenario_optimum_and_the_mean_is_one_mean_solve()
    {
        // Regret = minimax over C_i / optimum_i (the same duality on scaled scenarios); the mean objective is the
        // optimum of the mean covariance (definition). Three random scenarios.
        var g = Grid(14, 3);
        var rng = new Random(11);
        var c = Enumerable.Range(0, 3).Select(_ => TestCovariances.Mixture(g, rng, 0.03)).ToArray();
        var optima = c.Select(ci => OptimalVariance(g, ci)).ToArray();
        var regret = RobustWeights.Compute(g, c, false, Dense, RobustObjective.Regret);
        double WorstRatio(double[] h) => c.Select((ci, i) => ci.QuadraticForm(h) / optima[i]).Max();
        Assert.True(regret.RelativeGap < 1e-6, $"gap {regret.RelativeGap}");
        foreach (var ci in c)
        {
            Assert.True(WorstRatio(regret.H) <= WorstRatio(Dense.Solve(g, ci, false).H) * (1 + 1e-12));
        }

        var mean = RobustWeights.Compute(g, c, false, Dense, RobustObjective.Mean);
        var direct = Dense.Solve(g, CovarianceMixture.Mix(c, [1 / 3.0, 1 / 3.0, 1 / 3.0]), false).H;
        Assert.True(TestCovariances.MaxRelativeDifference(mean.H, direct) < 1e-12);
        Assert.Null(mean.RelativeGap);
    }

    [Fact]
    public void Dense_and_structured_inner_solves_give_the_same_robust_weights()
    {
        // Both solvers minimise the same quadratic (they agree to round-off, SolverAgreementTests); so must the dual search.
        var g = Grid(24, 5);
        var c = Competing(g);
        var dense = RobustWeights.Compute(g, c, true, Dense, RobustObjective.WorstCase);
        var structured = RobustWeights.Compute(g, c, true, new StructuredSolverAdapter(), RobustObjective.WorstCase);
        Assert.True(Math.Abs(dense.WorstCaseV2 - structured.WorstCaseV2) < 1e-8 * dense.WorstCaseV2);
        Assert.True(TestCovariances.MaxRelativeDifference(structured.H, dense.H) < 1e-4);
        Assert.True(structured.RelativeGap < 1e-6);
    }
}
