using System.Globalization;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Weights;

/// <summary>The weighted scheme: a chosen window shape w_k >= 0 in each window (see <see cref="WindowShapes"/>).</summary>
public static class ShapedWeights
{
    /// <summary>
    /// Without drift rejection: h = a (-w/sum w_R on reset, +w/sum w_S on signal), a = 1 / (weighted mean
    /// s_S - weighted mean s_R). With drift rejection: h = W A (A^T W A)^-1 b, W = diag(w), the
    /// shape-weighted least-squares estimate of the step with offset and slope (without the slope column
    /// and with an ideal step it is exactly the shape above). Computed as sqrt(w) times the minimum-norm
    /// solution for the row-scaled sqrt(W) A, so A^T W A is never formed.
    /// </summary>
    public static WeightSet Compute(SampleGrid grid, WeightsSpec spec)
    {
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(spec);
        var w = ShapeEveryWindow(spec, grid);
        var label = grid.TwoWindow is { } classic ? Label(spec, classic) : CycleLabel(spec, grid);
        if (!spec.RejectDrift)
        {
            var h0 = BoxcarWeights.WindowMeans(grid, w);
            return new WeightSet(WeightScheme.Weighted, label, h0);
        }

        var root = new double[w.Length];
        for (var i = 0; i < w.Length; i++)
        {
            root[i] = Math.Sqrt(w[i]);
        }

        var system = ConstraintSystem.FromGrid(grid, rejectDrift: true);
        var basis = HouseholderBasis.Factor(system.ScaleRows(root));
        var h = basis.MinimumNormSolution(system.Rhs);
        for (var i = 0; i < h.Length; i++)
        {
            h[i] *= root[i];
        }

        return new WeightSet(WeightScheme.Weighted, label + " (drift rejected)", h);
    }

    /// <summary>The shape of one window of <paramref name="count"/> samples.</summary>
    public static double[] Shape(WeightsSpec spec, int count, IReadOnlyList<double>? explicitShape, string window)
    {
        ArgumentNullException.ThrowIfNull(spec);
        switch (spec.Window)
        {
            case WindowShape.Triangle:
                return WindowShapes.Triangle(count);
            case WindowShape.Hann:
                return WindowShapes.Hann(count);
            case WindowShape.Trapezoid:
                return WindowShapes.Trapezoid(count, spec.RampSamples);
            case WindowShape.Explicit:
                if (explicitShape is null || explicitShape.Count != count)
                {
                    throw new ArgumentException($"explicit {window} shape needs {count} values, got {explicitShape?.Count ?? 0}");
                }

                var w = explicitShape.ToArray();
                if (w.Any(x => !(x >= 0) || !double.IsFinite(x)) || !(w.Sum() > 0))
                {
                    throw new ArgumentException($"explicit {window} shape must be finite, >= 0 and not all zero");
                }

                return w;
            default:
                throw new ArgumentOutOfRangeException(nameof(spec), spec.Window, "unknown window shape");
        }
    }

    /// <summary>
    /// The same shape in every window; explicit shapes belong to the reset and signal windows of a classic file
    /// (<see cref="SampleGrid.TwoWindow"/>).
    /// </summary>
    private static double[] ShapeEveryWindow(WeightsSpec spec, SampleGrid grid)
    {
        var w = new double[grid.Count];
        for (var wi = 0; wi < grid.Windows.Count; wi++)
        {
            var win = grid.Windows[wi];
            var (given, name) = grid.TwoWindow is null ? (null, "window") : wi == 0 ? (spec.ExplicitReset, "reset") : (spec.ExplicitSignal, "signal");
            Shape(spec, win.Count, given, name).CopyTo(w, win.First);
        }

        return w;
    }

    private static string CycleLabel(WeightsSpec spec, SampleGrid grid)
    {
        if (spec.Window != WindowShape.Trapezoid)
        {
            return "weighted (" + spec.Window.ToString().ToLowerInvariant() + ", every window)";
        }

        var ramps = grid.Windows.Select(win => WindowShapes.EffectiveRamp(win.Count, spec.RampSamples)).Distinct().Order();
        return "weighted (trapezoid, ramp " + string.Join("/", ramps.Select(r => r.ToString(CultureInfo.InvariantCulture))) + ", every window)";
    }

    private static string Label(WeightsSpec spec, TwoWindowCycle classic)
    {
        if (spec.Window != WindowShape.Trapezoid)
        {
            return "weighted (" + spec.Window.ToString().ToLowerInvariant() + ")";
        }

        var r = WindowShapes.EffectiveRamp(classic.Reset.Count, spec.RampSamples);
        var s = WindowShapes.EffectiveRamp(classic.Signal.Count, spec.RampSamples);
        var ramp = r == s
            ? r.ToString(CultureInfo.InvariantCulture)
            : string.Create(CultureInfo.InvariantCulture, $"{r}/{s}");
        return "weighted (trapezoid, ramp " + ramp + ")";
    }
}
