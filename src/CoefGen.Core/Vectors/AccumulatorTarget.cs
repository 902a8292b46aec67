using CoefGen.Core.FixedPoint;

namespace CoefGen.Core.Vectors;

/// <summary>
/// Finds ADC codes for the weighted samples whose exact sum acc = sum c_k x_k hits a chosen value: a greedy pass
/// over all but two coefficients (largest first) brings the remainder down, then the two reserved coefficients
/// (the pair of small ones with the smallest gcd) solve c_i u + c_j v = remainder exactly (a linear Diophantine
/// equation, solved with the modular inverse). Every sample stays within the ADC's codes.
/// </summary>
internal sealed class AccumulatorTarget
{
    private readonly IntegerDesign _design;
    private readonly long _baseline;
    private readonly long _min;
    private readonly long _max;
    private readonly int _i;
    private readonly int _j;
    private readonly int[] _greedyOrder;

    /// <param name="design">The integer design.</param>
    /// <param name="baselineSample">The signed sample every weighted sample starts from (the baseline level).</param>
    public AccumulatorTarget(IntegerDesign design, long baselineSample)
    {
        _design = design;
        _baseline = baselineSample;
        var half = 1L << (design.AdcBits - 1);
        (_min, _max) = (-half, half - 1);
        var c = design.Coefficients;
        var small = Enumerable.Range(0, c.Count).Where(k => c[k] != 0).OrderBy(k => Math.Abs(c[k])).ThenBy(k => k).Take(24).ToArray();
        (_i, _j, Step) = (-1, -1, 0);
        for (var a = 0; a < small.Length; a++)
        {
            for (var b = a + 1; b < small.Length; b++)
            {
                var g = (long)Gcd(c[small[a]], c[small[b]]);
                if (Step == 0 || g < Step)
                {
                    (_i, _j, Step) = (small[a], small[b], g);
                }
            }
        }

        _greedyOrder = [.. Enumerable.Range(0, c.Count).Where(k => k != _i && k != _j && c[k] != 0).OrderByDescending(k => Math.Abs(c[k])).ThenBy(k => k)];
        BaselineAccumulator = c.Aggregate(Int128.Zero, (s, x) => s + ((Int128)x * baselineSample));
    }

    /// <summary>gcd of the reserved pair: every reachable accumulator is BaselineAccumulator + a multiple of it (0: none).</summary>
    public long Step { get; }

    public Int128 BaselineAccumulator { get; }

    /// <summary>Signed samples (time order) whose exact weighted sum is <paramref name="target"/>, or null when not found.</summary>
    public long[]? Reach(Int128 target)
    {
        if (Step == 0 || (target - BaselineAccumulator) % Step != 0)
        {
            return null;
        }

        var c = _design.Coefficients;
        var x = Enumerable.Repeat(_baseline, c.Count).ToArray();
        var r = target - BaselineAccumulator;
        foreach (var k in _greedyOrder)
        {
            var want = Int128.Clamp(RoundDiv(r, c[k]), _min - _baseline, _max - _baseline);
            x[k] += (long)want;
            r -= want * c[k];
        }

        var (ci, cj) = ((Int128)c[_i], (Int128)c[_j]);
        if (r % Step != 0)
        {
            return null;
        }

        // c_i u + c_j v = r: u = u0 (mod |c_j| / g); walk the solutions inside the ADC range of u.
        var period = Int128.Abs(cj) / Step;
        var u0 = period == 1 ? 0 : Mod(r / Step * Inverse(Mod(ci / Step, period), period), period);
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
                x[_i] += (long)u;
                x[_j] += (long)v;
                return x;
            }
        }

        return null;
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
