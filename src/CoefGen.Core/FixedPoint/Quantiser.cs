using CoefGen.Core.Noise;
using CoefGen.Core.Weights;

namespace CoefGen.Core.FixedPoint;

/// <summary>
/// Real weights to integers: c = round(h 2^P) with P as large as the coefficient width allows, repaired by the
/// largest-remainder rule (PHYSICS.md §6) so that sum c = 0 exactly per reset group and, for a power-of-two gain,
/// the charge windows sum to 2^P (<see cref="IntegerSumPins"/>); then refined by pairwise +-1 moves that keep those sums, keep every c_k at floor or ceil
/// of h_k 2^P, and lower the noise c^T R c / (sum c s)^2.
/// </summary>
internal static class Quantiser
{
    private const int CandidatesPerSide = 8;

    /// <summary>Quantises <paramref name="h"/> (gain normalised to sum h s = 1 first).</summary>
    /// <param name="h">Real weights, grid order.</param>
    /// <param name="grid">The weighted samples and their step response s.</param>
    /// <param name="r">Noise covariance at the samples (the refinement lowers c^T R c / (sum c s)^2).</param>
    /// <param name="coefBits">Signed coefficient width.</param>
    /// <param name="powerOfTwoGain">Require signal sum 2^P and reset sum -2^P (only meaningful for a settled grid).</param>
    /// <param name="rejectDrift">Also make sum c n = 0 exactly (n: cycle sample index), the integer form of sum h t = 0.</param>
    public static QuantisedWeights Quantise(IReadOnlyList<double> h, SampleGrid grid, SampledCovariance r, int coefBits, bool powerOfTwoGain, bool rejectDrift = false)
    {
        ArgumentNullException.ThrowIfNull(h);
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(r);
        var n = h.Count;
        if (grid.Count != n || r.Count != n || n < 2)
        {
            throw new ArgumentException($"weights ({n}), grid ({grid.Count}) and covariance ({r.Count}) must agree, at least 2 entries");
        }

        if (coefBits is < 2 or > 62)
        {
            throw new ArgumentOutOfRangeException(nameof(coefBits), coefBits, "2..62");
        }

        var gain = 0.0;
        for (var k = 0; k < n; k++)
        {
            gain += h[k] * grid.Step[k];
        }

        if (!(gain > 0) || h.Any(v => !double.IsFinite(v)))
        {
            throw new ArgumentException("weights must be finite with a positive gain sum h s");
        }

        var hn = h.Select(v => v / gain).ToArray();
        var limit = (1L << (coefBits - 1)) - 1;
        var maxAbs = hn.Max(Math.Abs);
        var p = Math.Min(61, (int)Math.Floor(Math.Log2(limit / maxAbs)) + 1);
        for (; p >= 0; p--)
        {
            var c = Repair(hn, grid, p, powerOfTwoGain, out var x);
            if (c.Max(v => Math.Abs(v)) <= limit)
            {
                var moves = n <= RefineLimit ? Refine(c, x, grid, r, limit, powerOfTwoGain) : 0;
                if (rejectDrift && !DriftRepair.Apply(c, x, grid, limit, powerOfTwoGain))
                {
                    continue; // no pair move fits at this scale: try one bit less headroom
                }

                return new QuantisedWeights(c, p, powerOfTwoGain, moves);
            }
        }

        throw new CoefficientWidthException($"no scale 2^P with P >= 0 keeps the largest weight ({maxAbs.ToString("G4", System.Globalization.CultureInfo.InvariantCulture)} per unit gain) within {coefBits}-bit coefficients");
    }

    /// <summary>Rounds at scale p and applies the largest-remainder repair per group; x receives h 2^p.</summary>
    private static long[] Repair(double[] hn, SampleGrid grid, int p, bool powerOfTwoGain, out double[] x)
    {
        var scale = Math.ScaleB(1.0, p);
        var xs = hn.Select(v => v * scale).ToArray();
        var c = xs.Select(v => (long)Math.Round(v, MidpointRounding.ToEven)).ToArray();
        var (sets, targets) = IntegerSumPins.Of(grid, powerOfTwoGain, p, xs);
        for (var i = 0; i < sets.Length; i++)
        {
            FixSum(c, xs, sets[i], targets?[i] ?? 0);
        }

        x = xs;
        return c;
    }

    /// <summary>Moves |sum - target| entries by one count, those whose rounding went furthest in that direction first.</summary>
    internal static void FixSum(long[] c, double[] x, int[] group, long target)
    {
        var excess = group.Sum(k => c[k]) - target;
        while (excess != 0)
        {
            var down = excess > 0;
            var order = group
                .OrderBy(k => down ? x[k] - c[k] : c[k] - x[k])
                .ThenBy(k => k)
                .Take((int)Math.Min(Math.Abs(excess), group.Length));
            foreach (var k in order)
            {
                c[k] += down ? -1 : 1;
                excess += down ? -1 : 1;
            }
        }
    }

    /// <summary>
    /// Above this many coefficients the local refinement is skipped: its set-up is O(N^2), and at these sizes the
    /// repaired rounding is already within ~1e-12 relative of the real weights' noise (2 x 16384 at 32 bits:
    /// 1.6e-12 %), below the roundoff of the refinement's own gradient.
    /// </summary>
    private const int RefineLimit = 8192;

    /// <summary>Largest window for which the refinement's final all-pairs scan runs.</summary>
    private const int FullScanLimit = 2048;

    private static int Refine(long[] c, double[] x, SampleGrid grid, SampledCovariance r, long limit, bool powerOfTwoGain)
    {
        var n = c.Length;
        var lo = new long[n];
        var hi = new long[n];
        for (var k = 0; k < n; k++)
        {
            lo[k] = Math.Max(-limit, Math.Min(c[k], (long)Math.Floor(x[k])));
            hi[k] = Math.Min(limit, Math.Max(c[k], (long)Math.Ceiling(x[k])));
        }

        var windows = IntegerSumPins.Of(grid, powerOfTwoGain, 0, x).Sets;
        var state = new RefinementState(c, grid.Step, r);
        var cap = (4 * n) + 100;
        var moves = 0;
        while (moves < cap)
        {
            // The all-pairs scan is O(W^2) per move; above FullScanLimit samples per window only the steepest
            // candidates are tried (the refinement is a polish: the repaired rounding already satisfies every sum).
            var best = BestMove(state, windows, lo, hi, full: false)
                ?? (windows.Max(w => w.Length) <= FullScanLimit ? BestMove(state, windows, lo, hi, full: true) : null);
            if (best is not var (i, j))
            {
                break;
            }

            state.Apply(i, j);
            moves++;
        }

        return moves;
    }

    /// <summary>The pair (up, down) that lowers the objective most: among the steepest candidates, or among all pairs.</summary>
    private static (int Up, int Down)? BestMove(RefinementState s, int[][] windows, long[] lo, long[] hi, bool full)
    {
        (int, int)? best = null;
        var bestValue = s.Objective * (1 - 1e-12);
        foreach (var w in windows)
        {
            IEnumerable<int> ups;
            int[] downList;
            if (full)
            {
                ups = w.Where(k => s.C[k] < hi[k]);
                downList = [.. w.Where(k => s.C[k] > lo[k])];
            }
            else
            {
                // Same order as sorting by (g, index) and taking the first few, in one O(W) pass.
                ups = Steepest(w, k => s.C[k] < hi[k], k => s.G[k]);
                downList = Steepest(w, k => s.C[k] > lo[k], k => -s.G[k]);
            }

            foreach (var i in ups)
            {
                foreach (var j in downList)
                {
                    if (i != j)
                    {
                        var v = s.ObjectiveAfter(i, j);
                        if (v < bestValue)
                        {
                            bestValue = v;
                            best = (i, j);
                        }
                    }
                }
            }
        }

        return best;
    }

    /// <summary>The <see cref="CandidatesPerSide"/> members of <paramref name="w"/> passing <paramref name="ok"/> with the smallest key (ties: lower index).</summary>
    private static int[] Steepest(int[] w, Func<int, bool> ok, Func<int, double> key)
    {
        var best = new List<(double Key, int Index)>(CandidatesPerSide + 1);
        foreach (var k in w)
        {
            if (!ok(k))
            {
                continue;
            }

            var v = key(k);
            if (best.Count == CandidatesPerSide && !(v < best[^1].Key))
            {
                continue; // w is in increasing index order, so an equal key loses the tie
            }

            var at = best.Count;
            while (at > 0 && v < best[at - 1].Key)
            {
                at--;
            }

            best.Insert(at, (v, k));
            if (best.Count > CandidatesPerSide)
            {
                best.RemoveAt(best.Count - 1);
            }
        }

        return [.. best.Select(b => b.Index)];
    }
}
