using CoefGen.Core.FixedPoint;

namespace CoefGen.Core.Vectors;

/// <summary>
/// Finds ADC codes for the weighted samples whose exact sum acc = sum c_k x_k hits a chosen value: a greedy pass
/// over all but two coefficients (largest first) brings the remainder down, then the two reserved coefficients
/// (pairs of small ones with the smallest gcd, opposite signs first, tried in turn) solve c_i u + c_j v = remainder exactly (a linear Diophantine
/// equation, solved with the modular inverse). Every sample stays within the ADC's codes.
/// </summary>
internal sealed class AccumulatorTarget
{
    private readonly IntegerDesign _design;
    private readonly long _baseline;
    private readonly long _min;
    private readonly long _max;
    /// <summary>Reserved pairs tried in turn (each with gcd = Step).</summary>
    private const int MaxPairs = 24;

    private readonly (int I, int J)[] _pairs;
    private readonly int[] _byMagnitude;
    private readonly long[] _magnitudes;
    private readonly int _pairStart;

    /// <param name="design">The integer design.</param>
    /// <param name="baselineSample">The signed sample every weighted sample starts from (the baseline level).</param>
    public AccumulatorTarget(IntegerDesign design, long baselineSample)
    {
        _design = design;
        _baseline = baselineSample;
        var half = 1L << (design.AdcBits - 1);
        (_min, _max) = (-half, half - 1);
        var c = design.Coefficients;
        // Prefer pairs of opposite signs: then u and v move together and both fit in the larger headroom of an
        // off-centre baseline; then the smallest gcd (finest reachable grid), then the smallest magnitudes.
        var nonzero = Enumerable.Range(0, c.Count).Where(k => c[k] != 0).OrderBy(k => Math.Abs(c[k])).ThenBy(k => k).ToArray();
        var small = nonzero.Where(k => c[k] > 0).Take(12).Concat(nonzero.Where(k => c[k] < 0).Take(12)).ToArray();
        var pairs = new List<(int I, int J, long G, bool Opposite, long Size)>();
        for (var a = 0; a < small.Length; a++)
        {
            for (var b = a + 1; b < small.Length; b++)
            {
                var (ca, cb) = (c[small[a]], c[small[b]]);
                pairs.Add((small[a], small[b], (long)Gcd(ca, cb), (ca > 0) != (cb > 0), Math.Abs(ca) + Math.Abs(cb)));
            }
        }

        Step = pairs.Count == 0 ? 0 : pairs.Min(p => p.G);
        _pairs = [.. pairs.Where(p => p.G == Step).OrderBy(p => p.Opposite ? 0 : 1).ThenBy(p => p.Size).ThenBy(p => p.I).ThenBy(p => p.J).Take(MaxPairs).Select(p => (p.I, p.J))];
        _byMagnitude = [.. Enumerable.Range(0, c.Count).Where(k => c[k] != 0).OrderByDescending(k => Math.Abs(c[k])).ThenBy(k => k)];
        _magnitudes = [.. _byMagnitude.Select(k => Math.Abs(c[k]))];
        var reserved = _pairs.SelectMany(p => new[] { p.I, p.J }).ToHashSet();
        _pairStart = reserved.Count == 0 ? _byMagnitude.Length : Array.FindIndex(_byMagnitude, reserved.Contains);
        BaselineAccumulator = c.Aggregate(Int128.Zero, (s, x) => s + ((Int128)x * baselineSample));
        Int128 up = _max - baselineSample, down = _min - baselineSample;
        Highest = BaselineAccumulator + c.Aggregate(Int128.Zero, (s, x) => s + (x > 0 ? x * up : x * down));
        Lowest = BaselineAccumulator + c.Aggregate(Int128.Zero, (s, x) => s + (x > 0 ? x * down : x * up));
    }

    /// <summary>The largest and smallest exact sums any ADC input gives (every sample on the rail its coefficient's sign favours).</summary>
    public Int128 Highest { get; }

    public Int128 Lowest { get; }

    /// <summary>gcd of the reserved pair: every reachable accumulator is BaselineAccumulator + a multiple of it (0: none).</summary>
    public long Step { get; }

    public Int128 BaselineAccumulator { get; }

    /// <summary>Signed samples (time order) whose exact weighted sum is <paramref name="target"/>, or null when not found.</summary>
    public long[]? Reach(Int128 target)
    {
        if (Step == 0 || (target - BaselineAccumulator) % Step != 0 || target > Highest || target < Lowest)
        {
            return null;
        }

        // The greedy pass is the same for every reserved pair up to the first coefficient any pair holds back, so that
        // prefix is walked once and each pair continues from it.
        var moved = new List<(int K, long By)>();
        var (r, from) = Greedy(target - BaselineAccumulator, 0, _pairStart, -1, -1, moved);
        var shared = moved.Count;
        foreach (var (i, j) in _pairs)
        {
            moved.RemoveRange(shared, moved.Count - shared);
            var (rest, _) = Greedy(r, from, _byMagnitude.Length, i, j, moved);
            if (Solve(rest, i, j, moved) is { } x)
            {
                return x;
            }
        }

        return null;
    }

    /// <summary>
    /// The greedy moves over positions [from, to) of the magnitude order (skipping i and j) from remainder r; returns the
    /// remainder and where the pass stopped.
    /// </summary>
    private (Int128 Remainder, int Stop) Greedy(Int128 r, int from, int to, int i, int j, List<(int K, long By)> moved)
    {
        var c = _design.Coefficients;
        var pos = from;
        for (; pos < to; pos++)
        {
            // Largest magnitude first: while 2|r| < |c_k| the rounded quotient is 0 and the sample stays, so jump to
            // the first coefficient small enough to move (a binary search; the same moves as visiting every one).
            pos = Math.Min(to, FirstAtMost(pos, 2 * Int128.Abs(r)));
            if (pos == to)
            {
                break;
            }

            var k = _byMagnitude[pos];
            if (k == i || k == j)
            {
                continue;
            }

            var want = Int128.Clamp(RoundDiv(r, c[k]), _min - _baseline, _max - _baseline);
            moved.Add((k, (long)want));
            r -= want * c[k];
        }

        return (r, pos);
    }

    private long[]? Solve(Int128 r, int i, int j, List<(int K, long By)> moved)
    {
        var c = _design.Coefficients;
        var (ci, cj) = ((Int128)c[i], (Int128)c[j]);
        var g = (Int128)Gcd(c[i], c[j]);
        if (r % g != 0)
        {
            return null;
        }

        // c_i u + c_j v = r: u = u0 (mod |c_j| / g); walk the solutions inside the ADC range of u.
        var period = Int128.Abs(cj) / g;
        var u0 = period == 1 ? 0 : Mod(r / g * Inverse(Mod(ci / g, period), period), period);
        Int128 lo = _min - _baseline;
        Int128 hi = _max - _baseline;

        // v is monotonic in u: only u between the two values that put v on its bounds can work.
        var (ua, ub) = (FloorDiv(r - (cj * lo), ci), FloorDiv(r - (cj * hi), ci));
        var first = Int128.Max(lo, Int128.Min(ua, ub) - 1);
        var last = Int128.Min(hi, Int128.Max(ua, ub) + 1);
        var start = first + Mod(u0 - first, period);
        for (var u = start; u <= last; u += period)
        {
            var rest = r - (ci * u);
            var v = rest / cj;
            if (rest % cj == 0 && v >= lo && v <= hi)
            {
                var x = Enumerable.Repeat(_baseline, c.Count).ToArray();
                foreach (var (k, by) in moved)
                {
                    x[k] += by;
                }

                x[i] += (long)u;
                x[j] += (long)v;
                return x;
            }
        }

        return null;
    }

    /// <summary>The first position at or after <paramref name="from"/> whose |c| is at most <paramref name="bound"/> (the magnitudes descend).</summary>
    private int FirstAtMost(int from, Int128 bound)
    {
        int lo = from, hi = _magnitudes.Length;
        while (lo < hi)
        {
            var mid = lo + ((hi - lo) / 2);
            if (_magnitudes[mid] <= bound)
            {
                hi = mid;
            }
            else
            {
                lo = mid + 1;
            }
        }

        return lo;
    }

    private static Int128 RoundDiv(Int128 a, long b)
    {
        var q = a / b;
        var rem = a - (q * b);
        return 2 * Int128.Abs(rem) >= Math.Abs(b) ? q + ((a < 0) == (b < 0) ? 1 : -1) : q;
    }

    private static Int128 FloorDiv(Int128 a, Int128 b)
    {
        var q = a / b;
        return (a % b != 0) && ((a < 0) != (b < 0)) ? q - 1 : q;
    }

    private static Int128 Mod(Int128 a, Int128 m)
    {
        var r = a % m;
        return r < 0 ? r + m : r;
    }

    private static Int128 Inverse(Int128 a, Int128 m)
    {
        Int128 t = 0, newT = 1, r = m, newR = a;
        while (newR != 0)
        {
            var q = r / newR;
            (t, newT) = (newT, t - (q * newT));
            (r, newR) = (newR, r - (q * newR));
        }

        return Mod(t, m);
    }

    private static ulong Gcd(long a, long b)
    {
        var (x, y) = ((ulong)Math.Abs(a), (ulong)Math.Abs(b));
        while (y != 0)
        {
            (x, y) = (y, x % y);
        }

        return x;
    }
}
