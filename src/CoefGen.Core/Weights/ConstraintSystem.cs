namespace CoefGen.Core.Weights;

/// <summary>
/// The linear constraints A^T h = b shared by every scheme: A = [1, s (, t')], b = [0, 1 (, 0)]; with several
/// reset groups the ones column becomes one indicator column per group (sum h = 0 over each group, PHYSICS.md §4b).
/// t' is the sample time centred on its mean and scaled to unit rms, so the drift column is as well
/// scaled as the others; with sum h = 0 the centring does not change sum h t, and b_t = 0 makes the
/// scale irrelevant.
/// The group indicator columns are kept implicit (<see cref="Group"/>: one group per row, the columns come first)
/// so that a cycle of 1000 reset groups does not hold 1000 columns of N entries; <see cref="Columns"/> makes them
/// on demand for the dense solvers.
/// </summary>
internal sealed class ConstraintSystem
{
    private double[][]? _columns;

    private ConstraintSystem(double[][] columns, double[] rhs)
    {
        _columns = columns;
        DenseColumns = columns;
        Rhs = rhs;
        Rows = columns[0].Length;
    }

    private ConstraintSystem(int[] group, int groupCount, double[][] denseColumns, double[] rhs)
    {
        Group = group;
        GroupCount = groupCount;
        DenseColumns = denseColumns;
        Rhs = rhs;
        Rows = group.Length;
    }

    /// <summary>The m columns of A, each of length N (the group indicators made here when implicit).</summary>
    public double[][] Columns => _columns ??= [.. IndicatorColumns(), .. DenseColumns];

    /// <summary>Reset group of each row when the first <see cref="GroupCount"/> columns are group indicators; else null.</summary>
    public int[]? Group { get; }

    /// <summary>Number of implicit indicator columns (0 when <see cref="Group"/> is null).</summary>
    public int GroupCount { get; }

    /// <summary>The columns after the indicators (all columns when there are none).</summary>
    public double[][] DenseColumns { get; }

    /// <summary>The right-hand side b (length m).</summary>
    public double[] Rhs { get; }

    public int Rows { get; }

    public int Constraints => GroupCount + DenseColumns.Length;

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
        var group = new int[grid.Count];
        for (var i = 0; i < grid.Count; i++)
        {
            group[i] = grid.Group[i];
        }

        var rhs = new double[groups + (rejectDrift ? 2 : 1)];
        rhs[groups] = 1.0;
        double[][] dense = rejectDrift ? [step, CentredTime(grid)] : [step];
        return new ConstraintSystem(group, groups, dense, rhs);
    }

    private IEnumerable<double[]> IndicatorColumns()
    {
        if (Group is null)
        {
            yield break;
        }

        var columns = new double[GroupCount][];
        for (var g = 0; g < GroupCount; g++)
        {
            columns[g] = new double[Rows];
        }

        for (var i = 0; i < Rows; i++)
        {
            columns[Group[i]][i] = 1.0;
        }

        foreach (var c in columns)
        {
            yield return c;
        }
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
        var columns = Columns;
        var cols = new double[columns.Length][];
        for (var c = 0; c < cols.Length; c++)
        {
            cols[c] = new double[Rows];
            for (var i = 0; i < Rows; i++)
            {
                cols[c][i] = columns[c][i] * rowScale[i];
            }
        }

        return new ConstraintSystem(cols, Rhs);
    }
}
