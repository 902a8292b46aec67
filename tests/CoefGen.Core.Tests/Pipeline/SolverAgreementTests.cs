using System.Globalization;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;
using CoefGen.Core.Weights.Structured;

namespace CoefGen.Core.Tests.Pipeline;

/// <summary>On every shipped example the dense and the structured optimal solvers give the same minimum variance.</summary>
public class SolverAgreementTests(ITestOutputHelper output)
{
    [Theory]
    [MemberData(nameof(ShippedExamples.All), MemberType = typeof(ShippedExamples))]
    public void Dense_and_structured_solvers_reach_the_same_optimal_variance_on_a_shipped_example(string name)
    {
        var description = ShippedExamples.Load(name);
        var run = DesignPipeline.Run(description, ShippedExamples.Catalog);
        var dense = WeightSchemes.ComputeAll(run.Grid, run.Covariance, description.Weights, new DenseNullSpaceSolver());
        var structured = WeightSchemes.ComputeAll(run.Grid, run.Covariance, description.Weights, new StructuredSolverAdapter());
        var hDense = dense.Single(w => w.Scheme == WeightScheme.Optimal).H;
        var hStructured = structured.Single(w => w.Scheme == WeightScheme.Optimal).H;

        // Both evaluated with the same quadratic form, so the comparison is of the weights' variance, not of each solver's own bookkeeping.
        var vDense = run.Covariance.QuadraticForm(hDense);
        var vStructured = run.Covariance.QuadraticForm(hStructured);
        var relative = Math.Abs(vStructured - vDense) / vDense;
        var maxDh = hDense.Zip(hStructured, (a, b) => Math.Abs(a - b)).Max() / hDense.Max(Math.Abs);
        output.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"{name}: {run.Grid.Count} samples, pipeline used {run.OptimalSolver}; var dense {vDense:R} V^2, structured {vStructured:R} V^2, relative difference {relative:E2}, max |dh| / max |h| {maxDh:E2}"));

        // Tolerance: both solve the same strictly convex problem; 1e-9 relative leaves room for CG stopping at 1e-13 residual
        // (the variance error is quadratic in the weight error) and dense roundoff. Common practice, no source.
        Assert.True(relative < 1e-9, $"{name}: variances differ by {relative:E3} relative");

        // The pipeline's own optimal weights came from one of the two; its variance matches too.
        var pipelineH = run.Weights.Single(w => w.Scheme == WeightScheme.Optimal).H;
        Assert.True(Math.Abs(run.Covariance.QuadraticForm(pipelineH) - vDense) / vDense < 1e-9);
    }
}
