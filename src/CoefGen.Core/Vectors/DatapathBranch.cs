using CoefGen.Core.FixedPoint;

namespace CoefGen.Core.Vectors;

/// <summary>
/// The arithmetic branches a pixel drives the datapath through, by stable name (manifest "branches",
/// `verify`'s coverage report). With v = acc * M, q = floor(v / 2^S) and r = v - q 2^S:
/// round_exact (r = 0), round_below_half, round_above_half, round_tie_{even,odd}_{pos,neg} (r = 2^(S-1), by the
/// parity of q and the sign of v: half-up and half-even differ on even q, half-even and truncate on odd q,
/// floor and truncation toward zero on negative v); out_max / out_min (the rounded value is the largest /
/// smallest output, not saturated); out_saturated_high / out_saturated_low; acc_clipped (a saturating
/// accumulator clamped a partial sum), acc_wrapped (a wrapping accumulator wrapped); acc_at_max / acc_at_min
/// (the final accumulator equals the proof's extreme).
/// </summary>
public static class DatapathBranch
{
    public const string RoundExact = "round_exact";
    public const string RoundBelowHalf = "round_below_half";
    public const string RoundAboveHalf = "round_above_half";
    public const string TieEvenPositive = "round_tie_even_pos";
    public const string TieOddPositive = "round_tie_odd_pos";
    public const string TieEvenNegative = "round_tie_even_neg";
    public const string TieOddNegative = "round_tie_odd_neg";
    public const string OutputMax = "out_max";
    public const string OutputMin = "out_min";
    public const string OutputSaturatedHigh = "out_saturated_high";
    public const string OutputSaturatedLow = "out_saturated_low";
    public const string AccumulatorClipped = "acc_clipped";
    public const string AccumulatorWrapped = "acc_wrapped";
    public const string AccumulatorAtMax = "acc_at_max";
    public const string AccumulatorAtMin = "acc_at_min";

    /// <summary>Every branch name, in report order.</summary>
    public static IReadOnlyList<string> All { get; } =
    [
        RoundExact, RoundBelowHalf, RoundAboveHalf, TieEvenPositive, TieOddPositive, TieEvenNegative, TieOddNegative,
        OutputMax, OutputMin, OutputSaturatedHigh, OutputSaturatedLow,
        AccumulatorClipped, AccumulatorWrapped, AccumulatorAtMax, AccumulatorAtMin,
    ];

    /// <summary>The branches the weighted-sample codes of one pixel exercise.</summary>
    public static IReadOnlyList<string> Of(IntegerDesign design, IReadOnlyList<long> weightedCodes) =>
        Of(design, weightedCodes, BitExactModel.Run(design, weightedCodes));

    /// <summary>The same, given the bit-exact model's result for these codes.</summary>
    public static IReadOnlyList<string> Of(IntegerDesign design, IReadOnlyList<long> weightedCodes, BitExactResult result)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(weightedCodes);
        ArgumentNullException.ThrowIfNull(result);
        var branches = new List<string> { RoundingBranch(design, result.Accumulator) };
        var max = (long)TwosComplement.MaxValue(design.OutputBits);
        var min = (long)TwosComplement.MinValue(design.OutputBits);
        if (result.OutputSaturated)
        {
            branches.Add(result.Output == max ? OutputSaturatedHigh : OutputSaturatedLow);
        }
        else if (result.Output == max)
        {
            branches.Add(OutputMax);
        }
        else if (result.Output == min)
        {
            branches.Add(OutputMin);
        }

        if (result.AccumulatorClipped)
        {
            branches.Add(AccumulatorClipped);
        }

        if (design.Accumulator == AccumulatorMode.Wrap && Wraps(design, weightedCodes))
        {
            branches.Add(AccumulatorWrapped);
        }

        var final = design.Proof.Checks.FirstOrDefault(c => c.Name == "accumulator_final");
        if (final is not null && result.Accumulator == final.MaxValue)
        {
            branches.Add(AccumulatorAtMax);
        }

        if (final is not null && result.Accumulator == final.MinValue)
        {
            branches.Add(AccumulatorAtMin);
        }

        return branches;
    }

    /// <summary>The rounding branch of the final accumulator value.</summary>
    public static string RoundingBranch(IntegerDesign design, Int128 accumulator)
    {
        ArgumentNullException.ThrowIfNull(design);
        if (design.Shift == 0)
        {
            return RoundExact;
        }

        var v = accumulator * design.PostMultiplier;
        var q = v >> design.Shift;
        var r = v - (q << design.Shift);
        var half = Int128.One << (design.Shift - 1);
        if (r == 0)
        {
            return RoundExact;
        }

        if (r != half)
        {
            return r < half ? RoundBelowHalf : RoundAboveHalf;
        }

        var even = Int128.IsEvenInteger(q);
        return v > 0 ? (even ? TieEvenPositive : TieOddPositive) : (even ? TieEvenNegative : TieOddNegative);
    }

    private static bool Wraps(IntegerDesign design, IReadOnlyList<long> codes)
    {
        Int128 exact = 0;
        for (var k = 0; k < codes.Count; k++)
        {
            exact += (Int128)design.Coefficients[k] * BitExactModel.ToSample(codes[k], design.AdcBits, design.Coding);
            if (TwosComplement.Wrap(exact, design.AccBits) != exact)
            {
                return true;
            }
        }

        return false;
    }
}
