using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Study;

/// <summary>
/// Runs the design over a grid of key values. Each point edits the readout text with
/// <see cref="ReadoutTextEditor"/> and reloads it, so a point is validated exactly like a user file; an invalid
/// point keeps its diagnostics in its row. Points run in parallel; results are stored by index, so the order and
/// every value are the same whatever the scheduling.
/// </summary>
public static class Sweep
{
    /// <summary>Most grid points in one sweep.</summary>
    public const int MaxPoints = 100_000;

    /// <param name="baseText">The readout file's text.</param>
    /// <param name="point">How each point is designed.</param>
    /// <param name="axes">Varied keys; the grid is their cartesian product.</param>
    /// <param name="maxParallelism">Worker limit (null: one per core).</param>
    /// <param name="progress">Called with the number of finished points (from worker threads).</param>
    public static SweepResult Run(string baseText, DesignPoint point, IReadOnlyList<SweepAxis> axes, int? maxParallelism = null, Action<int>? progress = null)
    {
        ArgumentNullException.ThrowIfNull(baseText);
        ArgumentNullException.ThrowIfNull(point);
        ArgumentNullException.ThrowIfNull(axes);
        if (axes.Count == 0 || axes.Any(a => a.Values.Count == 0))
        {
            throw new ArgumentException("at least one axis with at least one value is needed", nameof(axes));
        }

        var total = axes.Aggregate(1L, (n, a) => n * a.Values.Count);
        if (total > MaxPoints)
        {
            throw new ArgumentException($"{total} points; at most {MaxPoints}", nameof(axes));
        }

        var coordinates = Grid(axes, (int)total);
        var outcomes = new PointOutcome[coordinates.Length];
        var done = 0;
        var options = new ParallelOptions { MaxDegreeOfParallelism = maxParallelism ?? Environment.ProcessorCount };
        Parallel.For(0, coordinates.Length, options, i =>
        {
            outcomes[i] = Evaluate(baseText, point, axes, coordinates[i]);
            progress?.Invoke(Interlocked.Increment(ref done));
        });
        return new SweepResult(axes, [.. coordinates.Select((c, i) => new SweepPoint(i, c, outcomes[i]))]);
    }

    /// <summary>The readout text of one point, or null with the reason it cannot be written.</summary>
    public static string? PointText(string baseText, IReadOnlyList<SweepAxis> axes, IReadOnlyList<double> values, out string? error)
    {
        ArgumentNullException.ThrowIfNull(axes);
        ArgumentNullException.ThrowIfNull(values);
        string? text = baseText;
        error = null;
        for (var a = 0; a < axes.Count && text is not null; a++)
        {
            text = ReadoutTextEditor.SetNumber(text, axes[a].Key, values[a], out error);
        }

        return text;
    }

    private static PointOutcome Evaluate(string baseText, DesignPoint point, IReadOnlyList<SweepAxis> axes, double[] values)
    {
        var text = PointText(baseText, axes, values, out var error);
        return text is null
            ? PointOutcome.Invalid([Diagnostic.Error("CG6001", SourceLocation.FileOnly(""), error ?? "cannot edit the key")])
            : point.Evaluate(text);
    }

    private static double[][] Grid(IReadOnlyList<SweepAxis> axes, int total)
    {
        var grid = new double[total][];
        for (var i = 0; i < total; i++)
        {
            var rest = i;
            var values = new double[axes.Count];
            for (var a = axes.Count - 1; a >= 0; a--)
            {
                var n = axes[a].Values.Count;
                values[a] = axes[a].Values[rest % n];
                rest /= n;
            }

            grid[i] = values;
        }

        return grid;
    }
}
