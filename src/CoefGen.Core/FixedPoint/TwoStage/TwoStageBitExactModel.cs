namespace CoefGen.Core.FixedPoint.TwoStage;

/// <summary>
/// The two-stage integer datapath bit for bit. acc1 is exact (its width is proved, so it never wraps), then rounded by Stage1Shift; acc2 wraps or
/// saturates at AccBits as the one-stage model does; the output is rounded and saturated by the same rule.
/// </summary>
public static class TwoStageBitExactModel
{
    /// <summary>Result of one cycle: the per-read sums, the second accumulator and the output.</summary>
    public sealed record Result(IReadOnlyList<long> Stage1, Int128 Acc2, long Output, bool Clipped, bool Saturated);

    /// <summary><paramref name="codes"/>: ADC codes of the weighted samples in grid order (read j holds j*m .. j*m+m-1).</summary>
    public static Result Run(TwoStageIntegerDesign d, IReadOnlyList<long> codes, AccumulatorMode mode)
    {
        ArgumentNullException.ThrowIfNull(d);
        ArgumentNullException.ThrowIfNull(codes);
        var m = d.Table.Count;
        var n = d.ReadWeights.Count;
        if (codes.Count != m * n)
        {
            throw new ArgumentException($"{codes.Count} codes for {n} reads of {m}");
        }

        var stage1 = new long[n];
        Int128 acc2 = 0;
        var clipped = false;
        for (var j = 0; j < n; j++)
        {
            Int128 acc1 = 0;
            for (var p = 0; p < m; p++)
            {
                acc1 += (Int128)d.Table[p] * BitExactModel.ToSample(codes[(j * m) + p], d.AdcBits, d.Coding);
            }

            acc1 = BitExactModel.RoundShift(acc1, d.Stage1Shift, d.Rounding);
            stage1[j] = (long)acc1;
            var sum = acc2 + (acc1 * d.ReadWeights[j]);
            acc2 = mode == AccumulatorMode.Wrap ? TwosComplement.Wrap(sum, d.AccBits) : TwosComplement.Saturate(sum, d.AccBits);
            clipped |= acc2 != sum;
        }

        var rounded = BitExactModel.RoundShift(acc2, d.Shift, d.Rounding);
        var output = TwosComplement.Saturate(rounded, d.OutputBits);
        return new Result(stage1, acc2, (long)output, clipped && mode == AccumulatorMode.Saturate, output != rounded);
    }
}
