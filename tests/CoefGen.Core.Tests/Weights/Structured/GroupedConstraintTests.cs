using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;
using CoefGen.Core.Weights.Structured;

namespace CoefGen.Core.Tests.Weights.Structured;

/// <summary>
/// The structured solver on cycles with one reset group per read (one offset constraint per group, kept as implicit
/// indicator columns): against the dense null-space solve, and the group constraints at many groups.
/// </summary>
public class GroupedConstraintTests
{
    private const double Rate = 1e6;

    /// <summary>N reads of (m reset + m signal) samples, read k in reset group k, 3-sample gaps.</summary>
    internal static SampleGrid Reads(int reads, int perWindow)
    {
        var windows = new List<CycleWindow>();
        var period = (2 * perWindow) + 6;
        for (var k = 0; k < reads; k++)
        {
            var start = 3 + (k * period);
            windows.Add(new CycleWindow("p", new SampleWindow(start, perWindow), ChargeSight.None, 0, k, k));
            windows.Add(new CycleWindow("s", new SampleWindow(start + perWindow + 3, perWindow), ChargeSight.Transfer, (start + perWindow + 1.5) / Rate, k, k));
        }

        return SampleGrid.FromCycle(Rate, new CycleSpec(windows, reads, null, null, reads), 4e5);
    }

    /// <summary>Correlated across reads: a slow pole (rho 0.999), a fast one, a 1/f-like sum and a digital floor.</summary>
    internal static SampledCovariance Correlated(SampleGrid grid)
    {
        var lags = TestCovariances.LagCount(grid);
        var oneOverF = new double[lags];
        for (var k = 0; k < lags; k++)
        {
            oneOverF[k] = StructuredTestCases.Lag("oneoverf")(k);
        }

        return new SampledCovariance(
            grid.SampleIndex,
            [TestCovariances.Ar1("slow", lags, 3.0, 0.999), TestCovariances.Ar1("fast", lags, 1.0, 0.4), new CovarianceComponent("1/f", oneOverF)],
            0.02);
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void Structured_and_dense_agree_with_one_reset_group_per_read(bool rejectDrift)
    {
        // Independent reference: the dense null-space solve (Householder QR of the explicit 32 + 2 (+1) columns,
        // Cholesky of Z^T R Z) on the same covariance, 32 reads x 2 x 16 = 1024 samples in 32 reset groups.
        var grid = Reads(32, 16);
        var r = Correlated(grid);
        var dense = new DenseNullSpaceSolver().Solve(grid, r, rejectDrift);
        var structured = new StructuredSolverAdapter().Solve(grid, r, rejectDrift);
        Assert.True(Math.Abs(structured.VarianceV2 - dense.VarianceV2) <= 1e-9 * dense.VarianceV2, $"structured {structured.VarianceV2:R} dense {dense.VarianceV2:R}");
        Assert.True(TestCovariances.MaxRelativeDifference(structured.H, dense.H) <= 1e-6, $"weights differ by {TestCovariances.MaxRelativeDifference(structured.H, dense.H):E2}");
    }

    [Fact]
    public void Every_group_constraint_holds_to_round_off_with_many_groups()
    {
        // 600 reads x 2 x 4 = 4800 samples in 600 reset groups: sum h = 0 over each group, unit gain.
        var grid = Reads(600, 4);
        var r = Correlated(grid);
        var h = new StructuredSolverAdapter().Solve(grid, r, rejectDrift: false).H;
        var residuals = ConstraintResiduals.Of(grid, h);
        Assert.True(residuals.Offset <= 1e-12, $"worst group offset {residuals.Offset:E2}");
        Assert.True(residuals.Gain <= 1e-12, $"gain {residuals.Gain:E2}");
    }

    [Fact]
    public void Implicit_group_indicators_project_exactly_as_the_explicit_columns()
    {
        // The implicit path does the explicit path's operations (a dot product's zero terms add nothing), so the
        // particular solution and the projection of any vector are the same doubles.
        var grid = Reads(20, 3);
        var system = ConstraintSystem.FromGrid(grid, rejectDrift: true);
        var explicitColumns = new ConstraintProjector(system.Columns, system.Rhs, grid.Count);
        var implicitColumns = new ConstraintProjector(system.Group, system.GroupCount, system.DenseColumns, system.Rhs, grid.Count);
        Assert.Equal(explicitColumns.ParticularSolution(), implicitColumns.ParticularSolution());
        var rng = new Random(11);
        var v = Enumerable.Range(0, grid.Count).Select(_ => rng.NextDouble() - 0.5).ToArray();
        var a = (double[])v.Clone();
        var b = (double[])v.Clone();
        explicitColumns.Project(a);
        implicitColumns.Project(b);
        Assert.Equal(a, b);
        explicitColumns.Restore(a);
        implicitColumns.Restore(b);
        Assert.Equal(a, b);
        Assert.True(implicitColumns.ContainsOnes());
    }
}
