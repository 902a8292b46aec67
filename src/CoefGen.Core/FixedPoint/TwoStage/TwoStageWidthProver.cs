using System.Numerics;
using CoefGen.Core.Readout;

namespace CoefGen.Core.FixedPoint.TwoStage;

/// <summary>
/// Widths of both stages over every ADC code. Stage 1 is the one-stage proof of the per-read table (WidthProver:
/// exact vertex bounds). Each read's samples are its own, so the reads' first sums vary independently over
/// [lo1, hi1] (after the stage-1 rounding shift) and the second sum is extreme at the vertex acc1_j = hi1 or lo1 by the sign of w_j: the same
/// vertex argument one level up, so every bound is exact and reached by the codes it carries.
/// </summary>
public static class TwoStageWidthProver
{
    public static WidthProof Prove(IReadOnlyList<long> g, IReadOnlyList<long> w, int adcBits, AdcCoding coding, FixedPointSettings settings, int stage1Shift, int shift)
    {
        ArgumentNullException.ThrowIfNull(g);
        ArgumentNullException.ThrowIfNull(w);
        ArgumentNullException.ThrowIfNull(settings);
        var one = WidthProver.Prove(g, adcBits, coding, settings, 1, 0, 0);
        var checks = one.Checks
            .Where(c => c.Name is "coefficient" or "product" or "accumulator_final" or "accumulator_partial")
            .Select(c => c with { Name = "stage1_" + c.Name, WorstCaseCodes = c.WorstCaseCodes is null ? null : Repeat(c.WorstCaseCodes, w.Count) })
            .ToList();
        var first = checks.Single(c => c.Name == "stage1_accumulator_final");
        // The rounding shift is monotonic, so the vertex that makes acc1 extreme also makes acc1 >> s1 extreme.
        var lo1 = (BigInteger)BitExactModel.RoundShift((Int128)first.MinValue, stage1Shift, settings.Rounding);
        var hi1 = (BigInteger)BitExactModel.RoundShift((Int128)first.MaxValue, stage1Shift, settings.Rounding);
        BigInteger xMin = -(BigInteger.One << (adcBits - 1));
        var xMax = -xMin - 1;
        long[] ReadCodes(bool up) => [.. g.Select(c => BitExactModel.ToCode((long)(Math.Sign(c) * (up ? 1 : -1) > 0 ? xMax : Math.Sign(c) == 0 ? BigInteger.Zero : xMin), adcBits, coding))];
        var upCodes = ReadCodes(true);
        var downCodes = ReadCodes(false);

        // Codes of the whole cycle for which read j's first sum is hi1 when w_j * sign > 0, lo1 when < 0 (reads from upTo on: 0).
        long[] Cycle(int sign, int upTo) => [.. Enumerable.Range(0, w.Count).SelectMany(j =>
            j >= upTo || w[j] == 0 ? g.Select(_ => BitExactModel.ToCode(0, adcBits, coding)) : (Math.Sign(w[j]) * sign > 0 ? upCodes : downCodes))];

        checks.Add(Check("stage2_coefficient", w.Min(), w.Max(), settings.CoefBits, null));
        var (pMin, pMax, pAt) = (BigInteger.Zero, BigInteger.Zero, 0);
        BigInteger hi = 0, lo = 0, preMax = 0, preMin = 0;
        int preMaxAt = 0, preMinAt = 0;
        for (var j = 0; j < w.Count; j++)
        {
            var a = w[j] * hi1;
            var b = w[j] * lo1;
            if (BigInteger.Max(BigInteger.Abs(a), BigInteger.Abs(b)) > BigInteger.Max(BigInteger.Abs(pMin), pMax))
            {
                pAt = j;
            }

            pMin = BigInteger.Min(pMin, BigInteger.Min(a, b));
            pMax = BigInteger.Max(pMax, BigInteger.Max(a, b));
            hi += BigInteger.Max(a, b);
            lo += BigInteger.Min(a, b);
            if (hi > preMax)
            {
                (preMax, preMaxAt) = (hi, j + 1);
            }

            if (lo < preMin)
            {
                (preMin, preMinAt) = (lo, j + 1);
            }
        }

        var productCodes = Enumerable.Range(0, w.Count * g.Count).Select(_ => BitExactModel.ToCode(0, adcBits, coding)).ToArray();
        (Math.Sign(w[pAt]) >= 0 ? upCodes : downCodes).CopyTo(productCodes, pAt * g.Count);
        checks.Add(Check("stage2_product", pMin, pMax, settings.AccBits, productCodes));
        var finalUp = BigInteger.Abs(lo) <= hi;
        var finalCodes = Cycle(finalUp ? 1 : -1, w.Count);
        var wrap = settings.Accumulator == AccumulatorMode.Wrap;
        checks.Add(Check("stage2_accumulator_final", lo, hi, settings.AccBits, finalCodes, wrap));
        var partialUp = BigInteger.Abs(preMin) <= preMax;
        checks.Add(Check("stage2_accumulator_partial", preMin, preMax, settings.AccBits, Cycle(partialUp ? 1 : -1, partialUp ? preMaxAt : preMinAt), !wrap));
        var outMin = BitExactModel.RoundShift((Int128)lo, shift, settings.Rounding);
        var outMax = BitExactModel.RoundShift((Int128)hi, shift, settings.Rounding);
        checks.Add(Check("output", (BigInteger)outMin, (BigInteger)outMax, settings.OutputBits, finalCodes));
        var advice = checks.Where(c => c.Required && !c.Fits)
            .Select(c => $"{c.Name} needs {c.RequiredBits} bits but {c.AvailableBits} are available: widen it by {-c.MarginBits} bits or narrow coef_bits by {-c.MarginBits}")
            .ToList();
        return new WidthProof { Checks = checks, Advice = advice };
    }

    private static long[] Repeat(IReadOnlyList<long> readCodes, int reads) => [.. Enumerable.Range(0, reads).SelectMany(_ => readCodes)];

    private static WidthCheck Check(string name, BigInteger min, BigInteger max, int available, IReadOnlyList<long>? codes, bool required = true) =>
        new(name, min, max, TwosComplement.RequiredBits(min, max), available, required, codes);
}
