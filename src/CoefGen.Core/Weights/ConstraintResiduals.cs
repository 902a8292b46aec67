namespace CoefGen.Core.Weights;

/// <summary>
/// How well weights meet the constraints, each residual divided by the size of the terms it sums
/// (sum |h_k a_k|), so 1e-16-level values mean "exact up to roundoff" whatever the weights' scale.
/// </summary>
/// <param name="Offset">|sum h| / sum |h|; with several reset groups the largest of these over the groups.</param>
/// <param name="Gain">|sum h s - 1| / max(1, sum |h s|).</param>
/// <param name="Drift">|sum h (n - mean n)| / sum |h (n - mean n)| with n the sample index (0 for a single sample).</param>
public sealed record ConstraintResiduals(double Offset, double Gain, double Drift)
{
    public static ConstraintResiduals Of(SampleGrid grid, IReadOnlyList<double> h)
    {
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(h);
        if (h.Count != grid.Count)
        {
            throw new ArgumentException($"weight vector has {h.Count} entries, grid {grid.Count}");
        }

        var t = ConstraintSystem.CentredTime(grid);
        double sum = 0, sumAbs = 0, gain = 0, gainAbs = 0, drift = 0, driftAbs = 0;
        for (var i = 0; i < h.Count; i++)
        {
            sum += h[i];
            sumAbs += Math.Abs(h[i]);
            gain += h[i] * grid.Step[i];
            gainAbs += Math.Abs(h[i] * grid.Step[i]);
            drift += h[i] * t[i];
            driftAbs += Math.Abs(h[i] * t[i]);
        }

        return new ConstraintResiduals(
            grid.GroupCount > 1 ? GroupOffset(grid, h) : sumAbs > 0 ? Math.Abs(sum) / sumAbs : 0,
            Math.Abs(gain - 1) / Math.Max(1, gainAbs),
            driftAbs > 0 ? Math.Abs(drift) / driftAbs : 0);
    }

    private static double GroupOffset(SampleGrid grid, IReadOnlyList<double> h)
    {
        var sum = new double[grid.GroupCount];
        var sumAbs = new double[grid.GroupCount];
        for (var i = 0; i < h.Count; i++)
        {
            sum[grid.Group[i]] += h[i];
            sumAbs[grid.Group[i]] += Math.Abs(h[i]);
        }

        var worst = 0.0;
        for (var g = 0; g < sum.Length; g++)
        {
            worst = Math.Max(worst, sumAbs[g] > 0 ? Math.Abs(sum[g]) / sumAbs[g] : 0);
        }

        return worst;
    }
}
