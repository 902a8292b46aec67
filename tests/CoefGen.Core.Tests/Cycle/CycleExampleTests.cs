using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Tests.Cycle;

/// <summary>The shipped cycle examples (examples/cycles) through the whole design: weights, predictions, integer design.</summary>
public class CycleExampleTests
{
    /// <summary>Examples whose design takes seconds: checked the same way by <see cref="LargeCycleExampleTests"/> (long tests).</summary>
    public static readonly string[] LongExamples = ["skipper_1000.toml"];

    public static TheoryData<string> Names => new(
        Directory.GetFiles(Path.Combine(Pipeline.ShippedExamples.Folder, "cycles"), "*.toml").Select(Path.GetFileName).Where(n => !LongExamples.Contains(n)).Order(StringComparer.Ordinal)!);

    [Theory]
    [MemberData(nameof(Names))]
    public void Cycle_examples_design_with_exact_integer_sums_per_reset_group(string name) => DesignsWithExactIntegerSums(name);

    /// <summary>The checks of the theory above for one example; returns the design for further checks.</summary>
    internal static DesignResult DesignsWithExactIntegerSums(string name)
    {
        var d = Pipeline.ShippedExamples.Load(Path.Combine("cycles", name));
        Assert.NotNull(d.Timing.Cycle);
        var r = DesignPipeline.Run(d, Pipeline.ShippedExamples.Catalog);
        Assert.Null(r.Grid.TwoWindow);

        // Every scheme meets the constraints of every group; the optimum is never worse than the others.
        foreach (var w in r.Weights)
        {
            var residuals = ConstraintResiduals.Of(r.Grid, w.H);
            Assert.True(residuals.Offset < 1e-11 && residuals.Gain < 1e-11, $"{w.Label}: {residuals}");
        }

        Assert.True(r.Predictions[^1].VarianceV2 <= r.Predictions.Min(p => p.VarianceV2) * (1 + 1e-9));

        // Offset rejection is exact in integers for each reset group (every reset has its own kTC level); with form = "two-stage"
        // the integers applied to each sample are w_j g_p.
        var c = r.IsTwoStage
            ? [.. Enumerable.Range(0, r.Grid.Count).Select(k => r.TwoStage!.Quantised.ReadWeights[k / r.TwoStage.Layout.PerRead] * r.TwoStage.Quantised.Table[k % r.TwoStage.Layout.PerRead])]
            : r.Datapath.Coefficients;
        foreach (var group in r.Grid.GroupMembers())
        {
            Assert.Equal(0L, group.Sum(k => c[k]));
        }

        Assert.True(r.Proof.Safe);
        Assert.Equal(d.Weights.Form == WeightsForm.TwoStage, !r.HasFullDatapath);
        var shot = d.Timing.Cycle!.ShotNoise is { TotalEPerS: > 0 };
        Assert.Equal(shot, r.ChosenPrediction.Budget.Any(b => b.Source == "shot noise"));
        if (shot)
        {
            Assert.Equal("dense null-space", r.OptimalSolver);
            Assert.Null(r.ChosenPrediction.FrequencyDomainRelativeDifference);
        }

        return r;
    }

    [Fact]
    public void Designed_weights_are_optimal_at_their_own_level_only()
    {
        var d = Pipeline.ShippedExamples.Load(Path.Combine("cycles", "up_the_ramp.toml"));
        var r = DesignPipeline.Run(d, Pipeline.ShippedExamples.Catalog);
        var rows = CoefGen.Core.Prediction.SignalLevelTable.Compute(r.Grid, r.Covariance, d, r.Chosen.H, rejectDrift: false);
        Assert.Equal(5, rows.Count);
        var design = Assert.Single(rows, row => row.IsDesignLevel);
        Assert.Equal(1.0, design.DesignedSigmaE / design.OptimalSigmaE, 9);
        Assert.Equal(r.ChosenPrediction.SigmaElectrons, design.DesignedSigmaE, 12);
        Assert.All(rows, row => Assert.True(row.DesignedSigmaE >= row.OptimalSigmaE * (1 - 1e-12)));
        Assert.True(rows[0].DesignedSigmaE > 1.2 * rows[0].OptimalSigmaE); // at zero flux the unweighted fit is far better
    }
}
