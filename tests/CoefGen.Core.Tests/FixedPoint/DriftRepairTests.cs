using CoefGen.Core.FixedPoint;
using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Tests.FixedPoint;

public class DriftRepairTests
{
    // Sum h t = 0 with t_k = n_k / rate is, for integer weights with sum c = 0, the integer identity sum c n = 0
    // (common practice, no source: the constraint is linear and the sample indices are integers).
    [Theory]
    [InlineData(2, 2, 1, 4)]
    [InlineData(3, 5, 2, 6)]
    [InlineData(8, 8, 10, 8)]
    [InlineData(17, 40, 3, 12)]
    [InlineData(64, 64, 20, 18)]
    [InlineData(200, 150, 60, 24)]
    [InlineData(1000, 1000, 50, 32)]
    public void Drift_rejecting_integer_weights_satisfy_every_constraint_exactly(int resetCount, int signalCount, int gap, int coefBits)
    {
        var reset = new SampleWindow(3, resetCount);
        var signal = new SampleWindow(reset.End + gap, signalCount);
        var grid = SampleGrid.Create(1e6, reset, signal, (reset.End + (gap / 2.0)) / 1e6, null);
        var r = White(grid);
        var h = OptimalWeights.Compute(grid, r, rejectDrift: true).Weights.H;

        var q = Quantiser.Quantise(h, grid, r, coefBits, powerOfTwoGain: true, rejectDrift: true);

        var c = q.Coefficients;
        Assert.Equal(0, DriftRepair.Residual(c, grid.SampleIndex));
        Assert.Equal(0L, c.Sum());
        Assert.Equal(1L << q.P, c.Skip(grid.Windows[0].Count).Sum());
        var limit = (1L << (coefBits - 1)) - 1;
        Assert.All(c, v => Assert.InRange(v, -limit - 1, limit));
    }

    [Fact]
    public void Drift_repair_keeps_the_integer_weights_close_to_the_real_ones()
    {
        var reset = new SampleWindow(0, 100);
        var signal = new SampleWindow(130, 100);
        var grid = SampleGrid.Create(1e6, reset, signal, 115e-6, null);
        var r = White(grid);
        var h = OptimalWeights.Compute(grid, r, rejectDrift: true).Weights.H;
        var q = Quantiser.Quantise(h, grid, r, 18, powerOfTwoGain: true, rejectDrift: true);
        var scaled = q.Coefficients.Select(v => Math.ScaleB(v, -q.P)).ToArray();
        var real = Math.Sqrt(r.QuadraticForm(h));
        var integer = Math.Sqrt(r.QuadraticForm(scaled));
        // Exact constraints and 18-bit coefficients: the integers cannot beat the constrained optimum, and lose little.
        Assert.InRange(integer / real - 1, -1e-12, 1e-6);
    }

    private static SampledCovariance White(SampleGrid grid)
    {
        var span = grid.SampleIndex[^1] - grid.SampleIndex[0] + 1;
        var lag = new double[span];
        lag[0] = 1.0;
        return new SampledCovariance(grid.SampleIndex, [new CovarianceComponent("white", lag)], 0.0);
    }
}
