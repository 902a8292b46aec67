using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Tests.Weights;

public class ShapedWeightsTests
{
    private static SampleGrid Grid(int nr, int ns, double? poleHz = null) =>
        SampleGrid.Create(1e6, new SampleWindow(0, nr), new SampleWindow(nr + 2, ns), (nr - 0.5) / 1e6, poleHz);

    private static WeightsSpec Spec(WindowShape shape, bool drift, int ramp = 0, double[]? reset = null, double[]? signal = null) =>
        new(WeightScheme.Weighted, shape, ramp, reset, signal, drift);

    [Theory]
    [InlineData(WindowShape.Triangle)]
    [InlineData(WindowShape.Hann)]
    [InlineData(WindowShape.Trapezoid)]
    public void Without_drift_the_weights_are_the_window_shape_scaled_to_unit_gain(WindowShape shape)
    {
        var grid = Grid(6, 9);
        var w = ShapedWeights.Compute(grid, Spec(shape, false));
        var reset = ShapedWeights.Shape(Spec(shape, false), 6, null, "reset");
        var signal = ShapedWeights.Shape(Spec(shape, false), 9, null, "signal");
        for (var k = 0; k < 6; k++)
        {
            Assert.Equal(-reset[k] / reset.Sum(), w.H[k], 1e-15);
        }

        for (var k = 0; k < 9; k++)
        {
            Assert.Equal(signal[k] / signal.Sum(), w.H[6 + k], 1e-15);
        }
    }

    [Fact]
    public void Weighted_least_squares_without_the_drift_column_reduces_to_the_shape_for_an_ideal_step()
    {
        // W A (A^T W A)^-1 b with A = [1, s], ideal s: lies in span{w_R, w_S}, hence the scaled shape (derived here).
        var grid = Grid(5, 7);
        var spec = Spec(WindowShape.Hann, false);
        var w = new double[grid.Count];
        ShapedWeights.Shape(spec, 5, null, "reset").CopyTo(w, 0);
        ShapedWeights.Shape(spec, 7, null, "signal").CopyTo(w, 5);
        double s0 = 0, s1 = 0, s2 = 0;
        for (var i = 0; i < grid.Count; i++)
        {
            s0 += w[i];
            s1 += w[i] * grid.Step[i];
            s2 += w[i] * grid.Step[i] * grid.Step[i];
        }

        // (A^T W A)^-1 [0, 1]^T for the 2 x 2 system [[s0, s1], [s1, s2]].
        var det = (s0 * s2) - (s1 * s1);
        var c0 = -s1 / det;
        var c1 = s0 / det;
        var shaped = ShapedWeights.Compute(grid, spec).H;
        for (var i = 0; i < grid.Count; i++)
        {
            Assert.Equal(w[i] * (c0 + (c1 * grid.Step[i])), shaped[i], 1e-14);
        }
    }

    [Fact]
    public void Explicit_shapes_are_used_as_given_and_may_contain_zeros()
    {
        var grid = Grid(3, 4);
        var spec = Spec(WindowShape.Explicit, false, reset: [0, 1, 3], signal: [2, 2, 0, 4]);
        var h = ShapedWeights.Compute(grid, spec).H;
        double[] expected = [0, -0.25, -0.75, 0.25, 0.25, 0, 0.5];
        for (var i = 0; i < h.Length; i++)
        {
            Assert.Equal(expected[i], h[i], 1e-15);
        }
    }

    [Fact]
    public void Explicit_shapes_of_the_wrong_length_or_sign_are_refused()
    {
        var grid = Grid(3, 4);
        Assert.Throws<ArgumentException>(() => ShapedWeights.Compute(grid, Spec(WindowShape.Explicit, false, reset: [1, 1], signal: [1, 1, 1, 1])));
        Assert.Throws<ArgumentException>(() => ShapedWeights.Compute(grid, Spec(WindowShape.Explicit, false, reset: [1, -1, 1], signal: [1, 1, 1, 1])));
        Assert.Throws<ArgumentException>(() => ShapedWeights.Compute(grid, Spec(WindowShape.Explicit, false, reset: [0, 0, 0], signal: [1, 1, 1, 1])));
        Assert.Throws<ArgumentException>(() => ShapedWeights.Compute(grid, Spec(WindowShape.Explicit, false)));
    }

    [Fact]
    public void Labels_name_the_shape_and_the_effective_ramp()
    {
        Assert.Equal("weighted (trapezoid, ramp 8)", ShapedWeights.Compute(Grid(64, 64), Spec(WindowShape.Trapezoid, false)).Label);
        Assert.Equal("weighted (trapezoid, ramp 1/2)", ShapedWeights.Compute(Grid(8, 16), Spec(WindowShape.Trapezoid, false)).Label);
        Assert.Equal("weighted (hann) (drift rejected)", ShapedWeights.Compute(Grid(8, 16), Spec(WindowShape.Hann, true)).Label);
        Assert.Equal("boxcar", BoxcarWeights.Compute(Grid(3, 3), false).Label);
    }

    [Fact]
    public void All_schemes_come_back_as_boxcar_weighted_optimal()
    {
        var grid = Grid(6, 6, 1e5);
        var all = WeightSchemes.ComputeAll(grid, TestCovariances.Ar1(grid, 1, 0.7, 0.01), Spec(WindowShape.Triangle, true));
        Assert.Equal([WeightScheme.Boxcar, WeightScheme.Weighted, WeightScheme.Optimal], all.Select(w => w.Scheme));
    }

    [Fact]
    public void A_step_with_no_contrast_between_the_windows_is_refused()
    {
        // Transfer before the reset window: s = 1 everywhere, so no weights can have unit gain with sum h = 0.
        var grid = SampleGrid.Create(1e6, new SampleWindow(5, 4), new SampleWindow(12, 4), 1e-6, null);
        Assert.Throws<ArgumentException>(() => BoxcarWeights.Compute(grid, false));
        Assert.Throws<ArgumentException>(() => ShapedWeights.Compute(grid, Spec(WindowShape.Hann, false)));
        Assert.Throws<ArgumentException>(() => OptimalWeights.Compute(grid, TestCovariances.White(grid, 1), false));
    }
}
