using System.Numerics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace CoefGen.Core.Tests.FixedPoint;

public class WidthProverTests
{
    [Property(MaxTest = 120)]
    public Property Named_worst_case_patterns_reach_the_stated_extremes_and_no_input_goes_beyond() =>
        Prop.ForAll(DatapathCase.Arbitrary(), dc =>
        {
            var d = dc.Build();
            var final = Check(d, "accumulator_final");
            var partial = Check(d, "accumulator_partial");
            var (_, _, finalSum) = FixedPointFixtures.Reference(d, final.WorstCaseCodes!);
            var finalHit = finalSum == (BigInteger.Abs(final.MinValue) > final.MaxValue ? final.MinValue : final.MaxValue);
            var partialTarget = BigInteger.Abs(partial.MinValue) > partial.MaxValue ? partial.MinValue : partial.MaxValue;
            var partialHit = Prefixes(d, partial.WorstCaseCodes!).Contains(partialTarget);
            var inside = Enumerable.Range(0, dc.Inputs.Length).All(p =>
            {
                var prefixes = Prefixes(d, dc.Codes(p));
                return prefixes[^1] >= final.MinValue && prefixes[^1] <= final.MaxValue
                    && prefixes.All(v => v >= partial.MinValue && v <= partial.MaxValue);
            });
            return finalHit && partialHit && inside;
        });

    [Property(MaxTest = 120)]
    public Property When_the_proof_says_unsafe_its_pattern_overflows_and_when_safe_the_model_matches_the_true_sum() =>
        Prop.ForAll(DatapathCase.Arbitrary(), dc =>
        {
            var d = dc.Build();
            var decisive = Check(d, d.Accumulator == AccumulatorMode.Wrap ? "accumulator_final" : "accumulator_partial");
            var lo = TwosComplement.MinValue(d.AccBits);
            var hi = TwosComplement.MaxValue(d.AccBits);
            var prefixes = Prefixes(d, decisive.WorstCaseCodes!);
            var overflows = d.Accumulator == AccumulatorMode.Wrap
                ? prefixes[^1] < lo || prefixes[^1] > hi
                : prefixes.Any(v => v < lo || v > hi);
            if (!decisive.Fits)
            {
                return overflows && d.Proof.Advice.Count > 0;
            }

            // Safe: the register always ends on the true sum, for the worst case and every random input.
            return !overflows && Enumerable.Range(0, dc.Inputs.Length).All(p =>
            {
                var codes = dc.Codes(p);
                return BitExactModel.Run(d, codes).Accumulator == FixedPointFixtures.Reference(d, codes).TrueSum;
            });
        });

    [Fact]
    public void Zero_sum_weights_need_one_accumulator_bit_less_than_the_naive_bound()
    {
        // PHYSICS.md §6, derived: N = 64 per window, weights -1 then +1, 16-bit codes x in [-32768, 32767].
        // Naive: sum|w| max|x| = 128 * 32768 = 2^22, which needs ceil(log2(2^22 + 1)) + 1 = 24 signed bits.
        // With sum w = 0 the extreme is 64 * 32767 - 64 * (-32768) = 64 * 65535 = 4194240 < 2^22, i.e. 23 bits.
        long[] c = [.. Enumerable.Repeat(-1L, 64), .. Enumerable.Repeat(1L, 64)];
        var s = FixedPointFixtures.Settings(coefBits: 2, accBits: 48);
        var proof = WidthProver.Prove(c, 16, AdcCoding.TwosComplement, s, 1, 0, 0);
        var final = proof.Checks.Single(x => x.Name == "accumulator_final");
        Assert.Equal(new BigInteger(4194240), final.MaxValue);
        Assert.Equal(new BigInteger(-4194240), final.MinValue);
        Assert.Equal(23, final.RequiredBits);
        Assert.Equal(24, TwosComplement.RequiredBits(-(BigInteger.One << 22), BigInteger.One << 22));
        // The pattern: every reset sample at -32768 and every signal sample at +32767 (or the reverse).
        Assert.Equal(4194240, Math.Abs(c.Zip(final.WorstCaseCodes!, (w, x) => w * x).Sum()));
    }

    [Fact]
    public void An_accumulator_one_bit_short_is_reported_with_its_deficit_and_an_overflowing_pattern()
    {
        // The 23-bit case above in a 22-bit saturating accumulator: the worst case 4194240 needs one bit more.
        long[] c = [.. Enumerable.Repeat(-1L, 64), .. Enumerable.Repeat(1L, 64)];
        var s = FixedPointFixtures.Settings(coefBits: 2, accBits: 22, acc: AccumulatorMode.Saturate);
        var proof = WidthProver.Prove(c, 16, AdcCoding.TwosComplement, s, 1, 0, 0);
        var partial = proof.Checks.Single(x => x.Name == "accumulator_partial");
        Assert.False(proof.Safe);
        Assert.Equal(23, partial.RequiredBits);
        Assert.Equal(-1, partial.MarginBits);
        Assert.Contains(proof.Advice, a => a.Contains("widen it by 1 bits (to 23)", StringComparison.Ordinal));
        var sum = c.Zip(partial.WorstCaseCodes!, (w, x) => w * x).Sum();
        Assert.True(sum > (1 << 21) - 1 || sum < -(1 << 21));
    }

    [Property(MaxTest = 100)]
    public Property Over_the_adc_box_no_running_sum_reaches_beyond_the_final_extremes() =>
        Prop.ForAll(DatapathCase.Arbitrary(), dc =>
        {
            // Derived: 0 is a valid sample, so each vertex term max(c x_max, c x_min) is >= 0 and the extreme
            // prefix sums grow monotonically; the worst running sum is the worst final sum. A saturating
            // accumulator therefore needs the same width as a wrapping one for a guarantee over all inputs; the
            // difference (PHYSICS.md §6) is what happens to inputs that overflow an undersized register.
            var d = dc.Build();
            var final = Check(d, "accumulator_final");
            var partial = Check(d, "accumulator_partial");
            return partial.MaxValue == final.MaxValue && partial.MinValue == final.MinValue;
        });

    private static WidthCheck Check(IntegerDesign d, string name) => d.Proof.Checks.Single(c => c.Name == name);

    /// <summary>True running sums 0, c0 x0, c0 x0 + c1 x1, ... in BigInteger.</summary>
    private static BigInteger[] Prefixes(IntegerDesign d, IReadOnlyList<long> codes)
    {
        var sums = new BigInteger[codes.Count + 1];
        for (var k = 0; k < codes.Count; k++)
        {
            sums[k + 1] = sums[k] + (d.Coefficients[k] * (BigInteger)BitExactModel.ToSample(codes[k], d.AdcBits, d.Coding));
        }

        return sums;
    }
}
