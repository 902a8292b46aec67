using CoefGen.Core.Weights;

namespace CoefGen.Core.FixedPoint;

/// <summary>
/// With drift rejection the real weights satisfy sum h t = 0; rounding breaks it. Since t_k = n_k / rate with
/// integer sample indices n_k, the constraint is exact in integers: sum c_k n_k = 0 (given sum c = 0). This
/// restores it with paired moves (+1 at i, -1 at j) inside one pinned set (<see cref="IntegerSumPins"/>: a reset
/// group, or its no-charge or charge part when the gain is pinned to 2^P) which keep every sum and change sum c n by n_i - n_j. Each move takes
/// the largest step towards zero that a pair allows, choosing the pair whose rounding went furthest the other
/// way (the largest-remainder rule again), so the integers stay next to h 2^P.
/// </summary>
internal static class DriftRepair
{
    /// <summary>Returns true when sum c n = 0 holds on exit.</summary>
    public static bool Apply(long[] c, double[] x, SampleGrid grid, long limit, bool windowsPinned)
    {
        var n = grid.SampleIndex;
        var groups = IntegerSumPins.Of(grid, windowsPinned, 0, x).Sets;
        var maxMoves = (4 * c.Length) + 100;
        for (var move = 0; move < maxMoves; move++)
        {
            var d = Residual(c, n);
            if (d == 0)
            {
                return true;
            }

            if (!MoveOnce(c, x, n, groups, d, limit))
            {
                return false;
            }
        }

        return Residual(c, n) == 0;
    }

    /// <summary>sum c_k n_k, exactly.</summary>
    public static Int128 Residual(IReadOnlyList<long> c, IReadOnlyList<int> n)
    {
        Int128 d = 0;
        for (var k = 0; k < c.Count; k++)
        {
            d += (Int128)c[k] * n[k];
        }

        return d;
    }

    private static bool MoveOnce(long[] c, double[] x, IReadOnlyList<int> n, int[][] groups, Int128 d, long limit)
    {
        // delta = n_i - n_j must have the sign opposite to d and |delta| <= |d|.
        var want = Int128.Abs(d);
        var span = groups.Max(g => n[g[^1]] - n[g[0]]);
        for (var m = (int)Int128.Min(want, span); m >= 1; m--)
        {
            var delta = d > 0 ? -m : m;
            var best = (I: -1, J: -1, Score: double.NegativeInfinity);
            foreach (var g in groups)
            {
                foreach (var i in g)
                {
                    var j = Partner(g, n, n[i] - delta);
                    if (j < 0 || c[i] + 1 > limit || c[j] - 1 < -limit - 1)
                    {
                        continue;
                    }

                    // Raise the entry that was rounded down most, lower the one rounded up most.
                    var score = (x[i] - c[i]) - (x[j] - c[j]);
                    if (score > best.Score)
                    {
                        best = (i, j, score);
                    }
                }
            }

            if (best.I >= 0)
            {
                c[best.I] += 1;
                c[best.J] -= 1;
                return true;
            }
        }

        return false;
    }

    /// <summary>The group member with sample index <paramref name="target"/>, or -1 (groups are sorted by index).</summary>
    private static int Partner(int[] group, IReadOnlyList<int> n, long target)
    {
        int lo = 0, hi = group.Length - 1;
        while (lo <= hi)
        {
            var mid = (lo + hi) / 2;
            var v = n[group[mid]];
            if (v == target)
            {
                return group[mid];
            }

            if (v < target)
            {
                lo = mid + 1;
            }
            else
            {
                hi = mid - 1;
            }
        }

        return -1;
    }
}
