using CoefGen.Core.Readout;

namespace CoefGen.Core.Weights;

/// <summary>Equal weights in each window: the digital differential averager.</summary>
public static class BoxcarWeights
{
    /// <summary>
    /// Without drift rejection: h = a (-1/N_R on reset, +1/N_S on signal), a = 1 / (mean(s_S) - mean(s_R)); for a
    /// general cycle the same idea over all windows (<see cref="CycleWindowFit"/>), which is exactly this for two windows.
    /// With drift rejection equal weights cannot satisfy sum h t = 0, so the boxcar becomes the
    /// minimum sum h^2 weights under all three constraints, h = A (A^T A)^-1 b: the ordinary least-squares
    /// estimate of the step with an offset and a slope, which is the optimum for white noise.
    /// </summary>
    public static WeightSet Compute(SampleGrid grid, bool rejectDrift)
    {
        ArgumentNullException.ThrowIfNull(grid);
        if (rejectDrift)
        {
            var system = ConstraintSystem.FromGrid(grid, rejectDrift: true);
            var basis = HouseholderBasis.Factor(system);
            return new WeightSet(WeightScheme.Boxcar, "boxcar (drift rejected, least squares)", basis.MinimumNormSolution(system.Rhs));
        }

        var ones = new double[grid.Count];
        Array.Fill(ones, 1.0);
        var label = grid.TwoWindow is null ? "boxcar (window means, least squares)" : "boxcar";
        return new WeightSet(WeightScheme.Boxcar, label, WindowMeans(grid, ones));
    }

    /// <summary>
    /// The window-mean estimator with shape w: the closed-form difference for a reset/signal pair, otherwise
    /// the least-squares fit of the window means (<see cref="CycleWindowFit"/>; the same weights up to roundoff).
    /// </summary>
    internal static double[] WindowMeans(SampleGrid grid, IReadOnlyList<double> w) =>
        grid.IsResetSignalPair ? WindowDifference(grid, w) : CycleWindowFit.Weights(grid, w);

    /// <summary>
    /// h = a (-w/sum w_R on the no-charge window, +w/sum w_S on the charge window) of a reset/signal pair with a = 1 / (weighted mean s_S - weighted mean s_R),
    /// so that sum h = 0 and sum h s = 1 exactly up to roundoff.
    /// </summary>
    internal static double[] WindowDifference(SampleGrid grid, IReadOnlyList<double> w)
    {
        double sumR = 0, sumS = 0, stepR = 0, stepS = 0;
        for (var i = 0; i < grid.Count; i++)
        {
            if (grid.WindowOf(i) == 1)
            {
                sumS += w[i];
                stepS += w[i] * grid.Step[i];
            }
            else
            {
                sumR += w[i];
                stepR += w[i] * grid.Step[i];
            }
        }

        if (!(sumR > 0) || !(sumS > 0))
        {
            throw new ArgumentException("each window needs a positive total weight");
        }

        var contrast = (stepS / sumS) - (stepR / sumR);
        if (!(Math.Abs(contrast) > 1e-12))
        {
            throw new ArgumentException("the mean step response is the same in both windows: no gain to the charge step");
        }

        var a = 1.0 / contrast;
        var h = new double[grid.Count];
        for (var i = 0; i < grid.Count; i++)
        {
            h[i] = grid.WindowOf(i) == 1 ? a * w[i] / sumS : -a * w[i] / sumR;
        }

        return h;
    }
}
