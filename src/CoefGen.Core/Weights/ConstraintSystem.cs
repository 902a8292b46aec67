namespace CoefGen.Core.Weights;

/// <summary>
/// The linear constraints A^T h = b shared by every scheme: A = [1, s (, t')], b = [0, 1 (, 0)]; with several
/// reset groups the ones column becomes one indicator column per group (sum h = 0 over each group, PHYSICS.md §4b).
/// t' is the sample time centred on its mean and scaled to unit rms, so the drift column is as well
/// scaled as the others; with sum h = 0 the centring does not change sum h t, and b_t = 0 makes the
/// scale irrelevant.
/// </summary>
internal sealed class ConstraintSystem
{
    private ConstraintSystem(double[][] columns, double[] rhs)
    {
        Columns = columns;
        Rhs = rhs;
    }

    /// <summary>The m columns of A, each of length N.</summary>
    public double[][] Columns { get; }

    /// <summary>The right-hand side b (length m).</summary>
    public double[] Rhs { get; }

    public int Rows => Columns[0].Length;

    public int Constraints => Columns.Length;

    /// <summary>Any constraint set A^T h = b (small problems of the two-stage design).</summary>
    public static ConstraintSystem Of(double[][] columns, double[] rhs) => new(columns, rhs);

    public static ConstraintSystem FromGrid(SampleGrid grid, bool rejectDrift)
    {
        ArgumentNullException.ThrowIfNull(grid);
        var n = grid.Count;
        var ones = new double[n];
        var step = new double[n];
        for (var i = 0; i < n; i++)
        {
            ones[i] = 1.0;
            step[i] = grid.Step[i];
        }

        if (grid.GroupCount > 1)
        {
            return Grouped(grid, step, rejectDrift);
        }

        if (!rejectDrift)
        {
            return new ConstraintSystem([ones, step], [0.0, 1.0]);
        }

        return new ConstraintSystem([ones, step, CentredTime(grid)], [0.0, 1.0, 0.0]);
    }

    private static ConstraintSystem Grouped(SampleGrid grid, double[] step, bool rejectDrift)
    {
        var groups = grid.GroupCount;
        var columns = new List<double[]>(groups + 2);
        for (var g = 0; g < groups; g++)
        {
            columns.Add(new double[grid.Count]);
        }

        for (var i = 0; i < grid.Count; i++)
        {
            columns[grid.Group[i]][i] = 1.0;
        }

        columns.Add(step);
        var rhs = new double[groups + (rejectDrift ? 2 : 1)];
        rhs[groups] = 1.0;
        if (rejectDrift)
        {
            columns.Add(CentredTime(grid));
        }

        return new ConstraintSystem([.. columns], rhs);
    }

    /// <summary>Sample times centred on their mean and scaled to unit rms (all zero for one sample).</summary>
    public static double[] CentredTime(SampleGrid grid)
    {
        ArgumentNullException.ThrowIfNull(grid);
        var n = grid.Count;
        var t = new double[n];
        var mean = 0.0;
        for (var i = 0; i < n; i++)
        {
            // Sample indices are exact integers; use them rather than seconds (same constraint up to a scale).
            mean += grid.SampleIndex[i];
        }

        mean /= n;
        var sumSq = 0.0;
        for (var i = 0; i < n; i++)
        {
            t[i] = grid.SampleIndex[i] - mean;
            sumSq += t[i] * t[i];
        }

        var rms = Math.Sqrt(sumSq / n);
        if (rms > 0)
        {
            for (var i = 0; i < n; i++)
            {
                t[i] /= rms;
            }
        }

        return t;
    }

    /// <summary>The same system with every row i scaled by <paramref name="rowScale"/>[i].</summary>
    public ConstraintSystem ScaleRows(IReadOnlyList<double> rowScale)
    {
        var cols = new double[Columns.Length][];
        for (var c = 0; c < cols.Length; c++)
        {
            cols[c] = new double[Rows];
            for (var i = 0; i < Rows; i++)
            {
                cols[c][i] = Columns[c][i] * rowScale[i];
            }
        }

        return new ConstraintSystem(cols, Rhs);
    }
}
