namespace CoefGen.Core.Weights;

/// <summary>
/// The natural equal-weight estimator of a general cycle: inside each window the samples are averaged with the
/// window's shape w (all ones for the boxcar); the window means, m_w = b_g + q s~_w, are then fitted by unweighted
/// least squares with one offset per reset group and one charge q. So h_k = (w_k / W_w) (s~_w - mean_g s~) / D with
/// D = sum over windows of (s~_w - mean_g s~)^2. This is the average of the read pairs for repeated reads, the
/// difference of the two group means for Fowler-N and the unweighted least-squares slope for a ramp read up one
/// sample per window; sum h = 0 over each group and sum h s = 1 hold by construction.
/// </summary>
internal static class CycleWindowFit
{
    /// <summary>Smallest D (sum of squared window-mean contrasts) that still gives a charge estimate.</summary>
    public const double MinContrast = 1e-18;

    public static double[] Weights(SampleGrid grid, IReadOnlyList<double> w)
    {
        var (means, groupMean, d) = Contrast(grid, w);
        if (!(d > MinContrast))
        {
            throw new ArgumentException("no reset group has windows with different mean step response: no gain to the charge");
        }

        var h = new double[grid.Count];
        for (var wi = 0; wi < grid.Windows.Count; wi++)
        {
            var win = grid.Windows[wi];
            var total = 0.0;
            for (var k = win.First; k < win.First + win.Count; k++)
            {
                total += w[k];
            }

            var a = (means[wi] - groupMean[win.Group]) / d;
            for (var k = win.First; k < win.First + win.Count; k++)
            {
                h[k] = a * w[k] / total;
            }
        }

        return h;
    }

    /// <summary>Shape-weighted window means of s, their mean per group, and D.</summary>
    public static (double[] Means, double[] GroupMean, double D) Contrast(SampleGrid grid, IReadOnlyList<double> w)
    {
        var windows = grid.Windows;
        var means = new double[windows.Count];
        var groupSum = new double[grid.GroupCount];
        var groupWindows = new int[grid.GroupCount];
        for (var wi = 0; wi < windows.Count; wi++)
        {
            var win = windows[wi];
            double total = 0, weighted = 0;
            for (var k = win.First; k < win.First + win.Count; k++)
            {
                total += w[k];
                weighted += w[k] * grid.Step[k];
            }

            if (!(total > 0))
            {
                throw new ArgumentException("each window needs a positive total weight");
            }

            means[wi] = weighted / total;
            groupSum[win.Group] += means[wi];
            groupWindows[win.Group]++;
        }

        var groupMean = new double[grid.GroupCount];
        for (var g = 0; g < groupMean.Length; g++)
        {
            groupMean[g] = groupWindows[g] > 0 ? groupSum[g] / groupWindows[g] : 0;
        }

        var d = 0.0;
        for (var wi = 0; wi < windows.Count; wi++)
        {
            var c = means[wi] - groupMean[windows[wi].Group];
            d += c * c;
        }

        return (means, groupMean, d);
    }
}
