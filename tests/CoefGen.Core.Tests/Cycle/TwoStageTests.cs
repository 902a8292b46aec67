using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Tests.Weights;
using CoefGen.Core.Weights;
using CoefGen.Core.Weights.TwoStage;
using MathNet.Numerics.LinearAlgebra;

namespace CoefGen.Core.Tests.Cycle;

/// <summary>The two-stage form h = a (x) g of repeated reads (PHYSICS.md §4b).</summary>
public class TwoStageTests
{
    private const double Rate = 1e6;

    private static SampleGrid Reads(int n, int m, bool ownReset)
    {
        var windows = new List<CycleWindow>();
        for (var k = 0; k < n; k++)
        {
            var start = 5 + (k * ((2 * m) + 4));
            windows.Add(new CycleWindow("p", new SampleWindow(start, m), ChargeSight.None, 0, ownReset ? k : 0, k));
            windows.Add(new CycleWindow("s", new SampleWindow(start + m + 2, m), ChargeSight.Transfer, (start + m + 1.5) / Rate, ownReset ? k : 0, k));
        }

        return SampleGrid.FromCycle(Rate, new CycleSpec(windows, ownReset ? n : 1, null, null, n), 3e5);
    }

    private static SampledCovariance Correlated(SampleGrid grid)
    {
        var lags = TestCovariances.LagCount(grid);
        return new SampledCovariance(grid.SampleIndex, [TestCovariances.Ar1("slow", lags, 5.0, 0.995), TestCovariances.Ar1("fast", lags, 1.0, 0.3)], 0.05);
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public void Two_stage_optimum_lies_between_the_full_optimum_and_the_plain_average(bool ownReset)
    {
        // PHYSICS.md §4b: h = a (x) g is a special case of the full optimum, and the average of the read pairs is a
        // special case of it, so full <= two-stage <= average.
        var grid = Reads(12, 5, ownReset);
        var r = Correlated(grid);
        var full = OptimalWeights.Compute(grid, r, rejectDrift: false).VarianceV2;
        var average = r.QuadraticForm(BoxcarWeights.Compute(grid, rejectDrift: false).H);
        var two = TwoStageWeights.Design(grid, r, rejectDrift: false)!;
        Assert.True(full <= two.VarianceV2 * (1 + 1e-12), $"full {full} two-stage {two.VarianceV2}");
        Assert.True(two.VarianceV2 < average, $"two-stage {two.VarianceV2} average {average}");
        var residuals = ConstraintResiduals.Of(grid, two.H);
        Assert.True(residuals.Offset < 1e-12 && residuals.Gain < 1e-12, residuals.ToString());
        Assert.Equal(0.0, two.PerReadTable.Sum(), 12);
    }

    [Fact]
    public void Under_white_noise_the_two_stage_form_is_the_plain_average()
    {
        // Tiffenberg et al. 2017: independent reads, the optimum is the average, which is itself a two-stage form.
        var grid = Reads(8, 4, ownReset: true);
        var r = TestCovariances.White(grid, 1.0);
        var two = TwoStageWeights.Design(grid, r, rejectDrift: false)!;
        var (_, full) = OptimalWeights.Compute(grid, r, rejectDrift: false);
        Assert.Equal(full, two.VarianceV2, 12);
    }

    [Fact]
    public void The_read_weights_at_convergence_are_the_dense_gls_optimum_for_the_table()
    {
        // Independent path: C_a = (I (x) g)^T R (I (x) g) formed densely from R entry by entry and solved with MathNet's
        // LU on the KKT system; the structured (Toeplitz-by-read) step must give the same read weights.
        var grid = Reads(9, 4, ownReset: true);
        var r = Correlated(grid);
        var two = TwoStageWeights.Design(grid, r, rejectDrift: false)!;
        var g = two.PerReadTable;
        int n = 9, m = 8; // 4 reset + 4 signal samples per read
        MathNet.Numerics.Control.UseManaged();
        var k = Matrix<double>.Build.Dense(n + 1, n + 1);
        var rhs = Vector<double>.Build.Dense(n + 1);
        for (var j = 0; j < n; j++)
        {
            for (var l = 0; l < n; l++)
            {
                var s = 0.0;
                for (var p = 0; p < m; p++)
                {
                    for (var q = 0; q < m; q++)
                    {
                        s += g[p] * g[q] * r.FullAt((j * m) + p, (l * m) + q);
                    }
                }

                k[j, l] = s;
            }

            var gain = Enumerable.Range(0, m).Sum(p => g[p] * grid.Step[(j * m) + p]);
            k[j, n] = k[n, j] = gain;
        }

        rhs[n] = 1.0;
        var a = k.Solve(rhs).Take(n).ToArray();
        Assert.True(TestCovariances.MaxRelativeDifference(two.ReadWeights, a) < 1e-6);
    }

    [Fact]
    public void Cycles_that_are_not_identical_reads_have_no_two_stage_form()
    {
        var ramp = SampleGrid.FromCycle(Rate, new CycleSpec(
            [new("a", new SampleWindow(2, 3), ChargeSight.Ramp, 0, 0, 0), new("b", new SampleWindow(10, 3), ChargeSight.Ramp, 0, 0, 0)], 1, 1e-5, null, 1), null);
        Assert.Null(TwoStageWeights.Design(ramp, TestCovariances.White(ramp, 1.0), rejectDrift: false));
    }
}
