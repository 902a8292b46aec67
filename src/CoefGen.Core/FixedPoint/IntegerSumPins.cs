using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.FixedPoint;

/// <summary>
/// The integer sums the quantiser pins, as disjoint sets of grid entries with a target sum each; the refinement
/// and the drift repair move counts only inside one set, so every pinned sum survives them.
/// Every reset group gets sum c = 0. With a power-of-two gain, a group with windows that see no charge and windows
/// after a transfer (and no ramp window) is split: its charge windows sum to T_g and its no-charge windows to
/// -T_g, where the T_g are 2^P shared out over those groups in proportion to their real charge-window sums (largest
/// remainder), so sum over charge windows of c = 2^P and, settled (s = 1), the gain sum c s is exactly 2^P. One
/// group (the classic file) gives T = 2^P: reset window -2^P, signal window +2^P. A group with ramp windows keeps
/// only sum c = 0: its gain sum c s = sum c (t - t_0) / T_ref is not a sum of pinned counts.
/// </summary>
internal static class IntegerSumPins
{
    /// <summary>The pinned sets in group order (no-charge part before charge part); targets null without a power-of-two gain.</summary>
    public static (int[][] Sets, long[]? Targets) Of(SampleGrid grid, bool powerOfTwoGain, int p, double[] x)
    {
        var groups = grid.GroupMembers();
        if (!powerOfTwoGain)
        {
            return (groups, null);
        }

        var sets = new List<int[]>();
        var split = new List<(int None, int Charge, double Sum)>();
        foreach (var members in groups)
        {
            var none = members.Where(k => grid.SightOf(k) == ChargeSight.None).ToArray();
            var charge = members.Where(k => grid.SightOf(k) == ChargeSight.Transfer).ToArray();
            if (none.Length > 0 && charge.Length > 0 && none.Length + charge.Length == members.Length)
            {
                split.Add((sets.Count, sets.Count + 1, charge.Sum(k => x[k])));
                sets.Add(none);
                sets.Add(charge);
            }
            else
            {
                sets.Add(members);
            }
        }

        var targets = new long[sets.Count];
        var shares = Apportion(1L << p, [.. split.Select(s => s.Sum)]);
        for (var i = 0; i < split.Count; i++)
        {
            targets[split[i].None] = -shares[i];
            targets[split[i].Charge] = shares[i];
        }

        return ([.. sets], targets);
    }

    /// <summary>Whole shares of <paramref name="total"/> in proportion to <paramref name="weights"/>, summing to it exactly (largest remainder).</summary>
    private static long[] Apportion(long total, double[] weights)
    {
        var shares = new long[weights.Length];
        if (weights.Length == 0)
        {
            return shares;
        }

        if (weights.Length == 1)
        {
            shares[0] = total;
            return shares;
        }

        var sum = weights.Sum();
        var exact = weights.Select(v => sum != 0 ? total * (v / sum) : (double)total / weights.Length).ToArray();
        for (var i = 0; i < shares.Length; i++)
        {
            shares[i] = (long)Math.Floor(exact[i]);
        }

        var left = total - shares.Sum();
        var order = Enumerable.Range(0, shares.Length).OrderByDescending(i => exact[i] - shares[i]).ThenBy(i => i).ToArray();
        for (var i = 0; left != 0; i = (i + 1) % order.Length)
        {
            var step = left > 0 ? 1 : -1;
            shares[order[i]] += step;
            left -= step;
        }

        return shares;
    }
}
