using CoefGen.Core.Noise;

namespace CoefGen.Core.Weights.TwoStage;

/// <summary>
/// The two-stage form of repeated reads that hardware builds with one short table and a second multiply
/// (PHYSICS.md §4b): h = a (x) g. The variance is bilinear, so a and g are designed jointly by alternating two small
/// generalised least-squares problems, each of which cannot increase the variance: g for fixed a with
/// C_g = (a (x) I)^T R (a (x) I) under sum g = 0 per reset class (ReadLayout.ResetClasses) and sum_j a_j g^T s_j = 1; a for fixed g with
/// C_a = (I (x) g)^T R (I (x) g) under sum_j a_j g^T s_j = 1. It starts from a uniform a. With stationary noise on
/// identical reads R's block between reads j and l depends on j - l only (T_d), so C_g = sum_d c_d T_d with
/// c_d = sum_l a_(l+d) a_l and C_a is Toeplitz: O(N m^2) per step instead of O(N^2 m^2). The result lies between the
/// full optimum (it is a special case of it) and the plain average (the average of read pairs is a two-stage form).
/// </summary>
public static class TwoStageWeights
{
    public const int MaxIterations = 200;

    /// <summary>Stop when a full round lowers the variance by less than this fraction.</summary>
    public const double Tolerance = 1e-12;

    /// <summary>Null when the cycle is not N identical reads, the covariance has a non-stationary part, or drift is rejected.</summary>
    public static TwoStageResult? Design(SampleGrid grid, SampledCovariance r, bool rejectDrift)
    {
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(r);
        var layout = ReadLayout.Of(grid);
        if (layout is null || r.Shot is not null || rejectDrift)
        {
            return null;
        }

        var n = layout.Reads;
        var m = layout.PerRead;
        var blocks = new ReadBlocks(layout, r);
        var step = new double[n][];
        for (var j = 0; j < n; j++)
        {
            step[j] = [.. Enumerable.Range(j * m, m).Select(i => grid.Step[i])];
        }

        var a = Enumerable.Repeat(1.0 / n, n).ToArray();
        double[] g = [];
        double[] h = [];
        var v = double.NaN; // h and v of the last step are the result's (no second expansion and quadratic form)
        var variance = double.PositiveInfinity;
        var iterations = 0;
        for (; iterations < MaxIterations; iterations++)
        {
            g = SolveTable(blocks, step, a, layout.ResetClasses, m);
            a = SolveReadWeights(blocks, step, g, n);
            h = Expand(a, g);
            v = r.QuadraticForm(h);
            var done = variance - v <= Tolerance * v;
            variance = Math.Min(variance, v);
            if (done)
            {
                break;
            }
        }

        return new TwoStageResult(g, a, h, v, iterations + 1);
    }

    /// <summary>h = a (x) g in grid order.</summary>
    public static double[] Expand(IReadOnlyList<double> a, IReadOnlyList<double> g)
    {
        var h = new double[a.Count * g.Count];
        for (var j = 0; j < a.Count; j++)
        {
            for (var p = 0; p < g.Count; p++)
            {
                h[(j * g.Count) + p] = a[j] * g[p];
            }
        }

        return h;
    }

    private static double[] SolveTable(ReadBlocks blocks, double[][] step, double[] a, IReadOnlyList<int[]> classes, int m)
    {
        var n = a.Length;
        var cd = new double[n];
        for (var d = 0; d < n; d++)
        {
            for (var l = 0; l + d < n; l++)
            {
                cd[d] += a[l + d] * a[l];
            }
        }

        var c = blocks.TableMatrix(cd);

        // sum g = 0 over each reset class (ReadLayout.ResetClasses): every reset group's offset cancels.
        var offsets = classes.Select(c =>
        {
            var ones = new double[m];
            foreach (var p in c)
            {
                ones[p] = 1.0;
            }

            return ones;
        }).ToList();
        var gain = new double[m];
        for (var j = 0; j < n; j++)
        {
            for (var p = 0; p < m; p++)
            {
                gain[p] += a[j] * step[j][p];
            }
        }

        return DenseNullSpaceSolver.SolveOnMatrix(ConstraintSystem.Of([.. offsets, gain], [.. offsets.Select(_ => 0.0), 1.0]), c);
    }

    private static double[] SolveReadWeights(ReadBlocks blocks, double[][] step, double[] g, int n)
    {
        var m = g.Length;
        var tau = blocks.ReadCovariance(g);
        var c = new double[n * n];
        for (var j = 0; j < n; j++)
        {
            for (var l = 0; l < n; l++)
            {
                c[(j * n) + l] = tau[Math.Abs(j - l)];
            }
        }

        var gain = new double[n];
        for (var j = 0; j < n; j++)
        {
            for (var p = 0; p < m; p++)
            {
                gain[j] += g[p] * step[j][p];
            }
        }

        return DenseNullSpaceSolver.SolveOnMatrix(ConstraintSystem.Of([gain], [1.0]), c);
    }
}
