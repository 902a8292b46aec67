namespace CoefGen.Core.Weights.TwoStage;

/// <summary>
/// A cycle made of N identical reads: read j holds grid entries j*m .. j*m+m-1 at cycle samples start_j + o_p with
/// start_j = start_0 + j P. Only such a cycle (a repetition covering every window) has a two-stage form.
/// </summary>
/// <param name="Reads">N.</param>
/// <param name="PerRead">m, samples per read.</param>
/// <param name="Period">P in samples.</param>
/// <param name="Offsets">o_p: sample offset of each per-read entry from the read's first sample.</param>
/// <param name="ResetClasses">
/// The per-read entries grouped so that entries p and q share a class when they share a reset group in every read (the
/// coarsest partition finer than every read's groups). sum g = 0 over each class makes every reset group's sum of
/// h = a (x) g zero, whatever the pattern: group G meets read j in a union of classes, so sum_G h = sum_j a_j sum_(classes) g = 0.
/// One class when each read has one reset (its own or one shared by several reads).
/// </param>
public sealed record ReadLayout(int Reads, int PerRead, int Period, IReadOnlyList<int> Offsets, IReadOnlyList<int[]> ResetClasses)
{
    /// <summary>The layout of <paramref name="grid"/>, or null when it is not N identical reads (N >= 2, m >= 2).</summary>
    public static ReadLayout? Of(SampleGrid grid)
    {
        ArgumentNullException.ThrowIfNull(grid);
        var reads = grid.Windows.Max(w => w.Read) + 1;
        if (reads < 2 || grid.Count % reads != 0)
        {
            return null;
        }

        var m = grid.Count / reads;
        if (m < 2)
        {
            return null;
        }

        // Grid order is time order, so identical reads follow each other: entry j*m + p belongs to read j.
        for (var i = 0; i < grid.Windows.Count; i++)
        {
            var w = grid.Windows[i];
            if (w.First / m != w.Read || (w.First + w.Count - 1) / m != w.Read)
            {
                return null;
            }
        }

        var index = grid.SampleIndex;
        var period = index[m] - index[0];
        var offsets = new int[m];
        for (var p = 0; p < m; p++)
        {
            offsets[p] = index[p] - index[0];
        }

        for (var j = 1; j < reads; j++)
        {
            for (var p = 0; p < m; p++)
            {
                if (index[(j * m) + p] != index[0] + (j * period) + offsets[p])
                {
                    return null;
                }
            }
        }

        return new ReadLayout(reads, m, period, offsets, Classes(grid.Group, reads, m));
    }

    private static int[][] Classes(IReadOnlyList<int> group, int reads, int m)
    {
        // Key of entry p: its group in every read; equal keys = one class. Classes in order of their first entry.
        var classes = new List<List<int>>();
        var keys = new List<int[]>();
        for (var p = 0; p < m; p++)
        {
            var key = Enumerable.Range(0, reads).Select(j => group[(j * m) + p]).ToArray();
            var c = keys.FindIndex(k => k.AsSpan().SequenceEqual(key));
            if (c < 0)
            {
                keys.Add(key);
                classes.Add([]);
                c = classes.Count - 1;
            }

            classes[c].Add(p);
        }

        return [.. classes.Select(c => c.ToArray())];
    }
}
