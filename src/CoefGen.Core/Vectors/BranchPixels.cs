using CoefGen.Core.FixedPoint;

namespace CoefGen.Core.Vectors;

/// <summary>
/// Pixels constructed to drive the datapath through the branches that separate one arithmetic mode from
/// another (<see cref="DatapathBranch"/>): exact rounding ties with an even and an odd quotient on both signs,
/// the output one step inside and one step outside each saturation limit, and the accumulator on and one past
/// each end of its width. A branch that no ADC input can reach is returned with the reason instead.
/// </summary>
internal static class BranchPixels
{
    /// <summary>Prefix of the constructed pixels' kind: "target_" + what they aim at.</summary>
    public const string Prefix = "target_";

    public const string AccHighInside = "acc_limit_high_inside";
    public const string AccHighOutside = "acc_limit_high_outside";
    public const string AccLowInside = "acc_limit_low_inside";
    public const string AccLowOutside = "acc_limit_low_outside";

    /// <summary>Search bound for the odd multiplier of a tie (ties are 2^e times an odd number).</summary>
    private const int MaxTieMultiplier = 1 << 14;

    public static (IReadOnlyList<(string Kind, long[] Weighted)> Pixels, IReadOnlyList<(string Target, string Reason)> Unreached) Build(IntegerDesign design, long baselineSample)
    {
        var reach = new AccumulatorTarget(design, baselineSample);
        var pixels = new List<(string, long[])>();
        var unreached = new List<(string, string)>();

        void Add(string target, string branch, Int128? acc, string why)
        {
            var x = acc is { } a ? reach.Reach(a) : null;
            var codes = x?.Select(s => BitExactModel.ToCode(s, design.AdcBits, design.Coding)).ToArray();
            if (codes is not null && Hits(design, codes, branch, acc!.Value))
            {
                pixels.Add((Prefix + target, codes));
            }
            else
            {
                unreached.Add((target, why));
            }
        }

        foreach (var (branch, acc, why) in Ties(design, reach))
        {
            Add(branch, branch, acc, why);
        }

        var outMax = (Int128)(long)TwosComplement.MaxValue(design.OutputBits);
        var outMin = (Int128)(long)TwosComplement.MinValue(design.OutputBits);
        var noSat = "no ADC input drives the output to this value (the output range covers every reachable accumulator)";
        Add(DatapathBranch.OutputMax, DatapathBranch.OutputMax, AccFor(design, reach, outMax), noSat);
        Add(DatapathBranch.OutputSaturatedHigh, DatapathBranch.OutputSaturatedHigh, AccFor(design, reach, outMax + 1), noSat);
        Add(DatapathBranch.OutputMin, DatapathBranch.OutputMin, AccFor(design, reach, outMin), noSat);
        Add(DatapathBranch.OutputSaturatedLow, DatapathBranch.OutputSaturatedLow, AccFor(design, reach, outMin - 1), noSat);

        var accMax = (Int128)(long)TwosComplement.MaxValue(design.AccBits);
        var accMin = -accMax - 1;
        var over = design.Accumulator == AccumulatorMode.Wrap ? DatapathBranch.AccumulatorWrapped : DatapathBranch.AccumulatorClipped;
        var noClip = "no ADC input reaches this accumulator value (the proof bounds the accumulator inside its width)";
        Add(AccHighInside, AccHighInside, Nearest(reach, accMax, down: true), noClip);
        Add(AccHighOutside, over, Nearest(reach, accMax + 1, down: false), noClip);
        Add(AccLowInside, AccLowInside, Nearest(reach, accMin, down: false), noClip);
        Add(AccLowOutside, over, Nearest(reach, accMin - 1, down: true), noClip);
        return (pixels, unreached);
    }

    /// <summary>Whether the codes really drive the branch (the construction is checked, never assumed).</summary>
    private static bool Hits(IntegerDesign design, long[] codes, string branch, Int128 acc)
    {
        var result = BitExactModel.Run(design, codes);
        return branch switch
        {
            AccHighInside or AccLowInside => result.Accumulator == acc && !result.AccumulatorClipped && !DatapathBranch.Of(design, codes, result).Contains(DatapathBranch.AccumulatorWrapped),
            _ => DatapathBranch.Of(design, codes, result).Contains(branch),
        };
    }

    /// <summary>
    /// acc * M / 2^S is a tie when its remainder is exactly 2^(S-1), i.e. acc * M = 2^(S-1) times an odd number;
    /// the quotient is even when that odd number is 1 mod 4 and odd when it is 3 mod 4 (either sign).
    /// </summary>
    private static IEnumerable<(string Branch, Int128? Acc, string Why)> Ties(IntegerDesign design, AccumulatorTarget reach)
    {
        string[] wanted = [DatapathBranch.TieEvenPositive, DatapathBranch.TieOddPositive, DatapathBranch.TieEvenNegative, DatapathBranch.TieOddNegative];
        var found = new Dictionary<string, Int128>();
        var m = design.PostMultiplier;
        var twos = m == 0 ? 128 : (int)long.TrailingZeroCount(Math.Abs(m));
        var e = design.Shift - 1 - twos;
        if (design.Shift > 0 && e >= 0 && e < 100 && reach.Step != 0)
        {
            var unit = Int128.One << e;
            for (var t = 1; t < MaxTieMultiplier && found.Count < wanted.Length && (unit * t <= reach.Highest || -unit * t >= reach.Lowest); t += 2)
            {
                foreach (var acc in new[] { unit * t, -unit * t })
                {
                    var branch = DatapathBranch.RoundingBranch(design, acc);
                    if ((acc - reach.BaselineAccumulator) % reach.Step == 0 && !found.ContainsKey(branch) && reach.Reach(acc) is not null)
                    {
                        found[branch] = acc;
                    }
                }
            }
        }

        var why = design.Shift == 0 ? "shift 0: nothing is rounded"
            : e < 0 ? "acc * M is always a multiple of 2^S: nothing is rounded"
            : "no reachable accumulator rounds to this tie";
        foreach (var b in wanted)
        {
            yield return (b, found.TryGetValue(b, out var a) ? a : null, why);
        }
    }

    /// <summary>A reachable accumulator whose rounded value (before saturation) is <paramref name="rounded"/>, or null.</summary>
    private static Int128? AccFor(IntegerDesign design, AccumulatorTarget reach, Int128 rounded)
    {
        if (design.PostMultiplier <= 0)
        {
            return null;
        }

        var accMax = (Int128)(long)TwosComplement.MaxValue(design.AccBits);
        var lo = FirstAtLeast(design, rounded, -accMax - 1, accMax);
        var hi = FirstAtLeast(design, rounded + 1, -accMax - 1, accMax) - 1;
        if (lo is null || hi is null || lo > hi)
        {
            return null;
        }

        var step = reach.Step == 0 ? 1 : reach.Step;
        var offset = reach.BaselineAccumulator - lo.Value;
        var first = lo.Value + (((offset % step) + step) % step);
        return first <= hi ? first : null;
    }

    /// <summary>Smallest acc in [lo, hi] whose rounded acc * M is at least <paramref name="y"/> (binary search; rounding is monotonic for M &gt; 0).</summary>
    private static Int128? FirstAtLeast(IntegerDesign design, Int128 y, Int128 lo, Int128 hi)
    {
        Int128 Rounded(Int128 a) => BitExactModel.RoundShift(a * design.PostMultiplier, design.Shift, design.Rounding);
        if (Rounded(hi) < y)
        {
            return hi + 1;
        }

        while (lo < hi)
        {
            var mid = lo + ((hi - lo) / 2);
            if (Rounded(mid) >= y)
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

    /// <summary>The reachable accumulator nearest to <paramref name="acc"/> on the congruence grid, going down or up.</summary>
    private static Int128? Nearest(AccumulatorTarget reach, Int128 acc, bool down)
    {
        if (reach.Step == 0)
        {
            return null;
        }

        var r = ((acc - reach.BaselineAccumulator) % reach.Step + reach.Step) % reach.Step;
        return down ? acc - r : r == 0 ? acc : acc + (reach.Step - r);
    }
}
