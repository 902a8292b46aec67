using System.Globalization;
using System.Numerics;
using CoefGen.Core.Readout;

namespace CoefGen.Core.FixedPoint;

/// <summary>
/// Proves every width of the datapath for every input in the ADC range x in [MinCode, MaxCode] (signed, after
/// offset-binary conversion). The sum c x over the box is extreme at a vertex: x = max where c &gt; 0 and min
/// where c &lt; 0 (or the reverse), so the bounds are exact and each is reached by the pattern it names.
/// Running partial sums take the same vertex per sample, so the extreme prefix is the max over k of the
/// prefix sums of max(c x_max, c x_min). Wrap is safe when the final value fits (addition mod 2^M, PHYSICS.md §6);
/// saturation only when every partial sum fits.
/// </summary>
public static class WidthProver
{
    public static WidthProof Prove(IReadOnlyList<long> c, int adcBits, AdcCoding coding, FixedPointSettings settings, long postMultiplier, int shift, int postMultiplierBits)
    {
        ArgumentNullException.ThrowIfNull(c);
        ArgumentNullException.ThrowIfNull(settings);
        if (c.Count == 0 || postMultiplier < 1)
        {
            throw new ArgumentException("need coefficients and a positive post-multiplier");
        }

        var n = c.Count;
        BigInteger xMin = -(BigInteger.One << (adcBits - 1));
        var xMax = -xMin - 1;
        long Code(BigInteger x) => BitExactModel.ToCode((long)x, adcBits, coding);
        var checks = new List<WidthCheck>();
        var advice = new List<string>();

        var cMin = c.Min();
        var cMax = c.Max();
        checks.Add(Check("coefficient", cMin, cMax, settings.CoefBits, true, null));

        // Product: the largest |c_k x| over k and x, formed at full width.
        var (pMin, pMax, pMinAt, pMaxAt) = (BigInteger.Zero, BigInteger.Zero, 0, 0);
        for (var k = 0; k < n; k++)
        {
            var a = c[k] * xMax;
            var b = c[k] * xMin;
            if (BigInteger.Min(a, b) < pMin)
            {
                (pMin, pMinAt) = (BigInteger.Min(a, b), k);
            }

            if (BigInteger.Max(a, b) > pMax)
            {
                (pMax, pMaxAt) = (BigInteger.Max(a, b), k);
            }
        }

        var pAt = BigInteger.Abs(pMin) > pMax ? pMinAt : pMaxAt;
        var pCodes = Enumerable.Repeat(Code(0), n).ToArray();
        pCodes[pAt] = Code(BigInteger.Abs(pMin) > pMax ? (c[pAt] > 0 ? xMin : xMax) : (c[pAt] > 0 ? xMax : xMin));
        checks.Add(Check("product", pMin, pMax, settings.CoefBits + settings.SampleBits, true, pCodes));

        // Final accumulator and running partial sums, with the vertex patterns that reach them.
        BigInteger hiSum = 0, loSum = 0, preMax = 0, preMin = 0;
        int preMaxAt = 0, preMinAt = 0;
        for (var k = 0; k < n; k++)
        {
            hiSum += BigInteger.Max(c[k] * xMax, c[k] * xMin);
            loSum += BigInteger.Min(c[k] * xMax, c[k] * xMin);
            if (hiSum > preMax)
            {
                (preMax, preMaxAt) = (hiSum, k + 1);
            }

            if (loSum < preMin)
            {
                (preMin, preMinAt) = (loSum, k + 1);
            }
        }

        var finalUp = BigInteger.Abs(loSum) <= hiSum;
        var finalCodes = Pattern(c, n, finalUp, xMin, xMax, Code);
        var wrap = settings.Accumulator == AccumulatorMode.Wrap;
        var final = Check("accumulator_final", loSum, hiSum, settings.AccBits, wrap, finalCodes);
        checks.Add(final);
        var partialUp = BigInteger.Abs(preMin) <= preMax;
        var partialCodes = Pattern(c, partialUp ? preMaxAt : preMinAt, partialUp, xMin, xMax, Code);
        var partial = Check("accumulator_partial", preMin, preMax, settings.AccBits, !wrap, partialCodes);
        checks.Add(partial);

        var m = (BigInteger)postMultiplier;
        var post = Check("post_multiply", loSum * m, hiSum * m, settings.PostProductBits, postMultiplier != 1, finalCodes);
        checks.Add(post);

        var outMin = BitExactModel.RoundShift((Int128)(loSum * m), shift, settings.Rounding);
        var outMax = BitExactModel.RoundShift((Int128)(hiSum * m), shift, settings.Rounding);
        var output = Check("output", (BigInteger)outMin, (BigInteger)outMax, settings.OutputBits, true, finalCodes);
        checks.Add(output);

        Advise(checks, advice, settings, n, final, postMultiplierBits);
        return new WidthProof { Checks = checks, Advice = advice };
    }

    private static long[] Pattern(IReadOnlyList<long> c, int upTo, bool up, BigInteger xMin, BigInteger xMax, Func<BigInteger, long> code)
    {
        var codes = new long[c.Count];
        for (var k = 0; k < c.Count; k++)
        {
            var sign = k < upTo ? Math.Sign(c[k]) * (up ? 1 : -1) : 0;
            codes[k] = code(sign > 0 ? xMax : sign < 0 ? xMin : BigInteger.Zero);
        }

        return codes;
    }

    private static WidthCheck Check(string name, BigInteger min, BigInteger max, int available, bool required, IReadOnlyList<long>? codes) =>
        new(name, min, max, TwosComplement.RequiredBits(min, max), available, required, codes);

    private static void Advise(List<WidthCheck> checks, List<string> advice, FixedPointSettings s, int n, WidthCheck final, int postBits)
    {
        foreach (var ch in checks.Where(ch => ch.Required && !ch.Fits))
        {
            var d = -ch.MarginBits;
            var text = ch.Name switch
            {
                "coefficient" => $"coefficients need {ch.RequiredBits} bits: widen coef_bits by {d} (to {ch.RequiredBits})",
                "product" => $"products need {ch.RequiredBits} bits: the multiplier must be {d} bits wider",
                "accumulator_final" => AccumulatorAdvice(ch, s, n, d),
                "accumulator_partial" => final.Fits
                    ? $"running partial sums need {ch.RequiredBits} bits but the final value fits in {s.AccBits}: set accumulator = \"wrap\" (wrap-around is exact when the final value fits), or widen the accumulator by {d} bits (to {ch.RequiredBits})"
                    : AccumulatorAdvice(ch, s, n, d),
                "post_multiply" => $"acc x M needs {ch.RequiredBits} bits: widen the post-multiply register by {d} bits (to {ch.RequiredBits}) or use a post-multiplier {d} bits narrower than {postBits}",
                _ => $"the output needs {ch.RequiredBits} bits: widen output_bits by {d} (to {ch.RequiredBits}) or lower output_frac_bits by {d}",
            };
            advice.Add(text);
        }

    }

    /// <summary>
    /// The worst case |acc| is at most (sum|c| / 2)(x_max - x_min) when sum c = 0 (PHYSICS.md §6): it scales with
    /// 2^P (so with the coefficient width) and, at full-scale coefficients, with the number of samples.
    /// </summary>
    private static string AccumulatorAdvice(WidthCheck ch, FixedPointSettings s, int n, int d)
    {
        var worst = BigInteger.Max(BigInteger.Abs(ch.MinValue), ch.MaxValue);
        var room = TwosComplement.MaxValue(s.AccBits);
        var fewer = (long)(n - (BigInteger)n * room / worst);
        return string.Create(CultureInfo.InvariantCulture,
            $"the accumulator needs {ch.RequiredBits} bits ({ch.Name}): widen it by {d} bits (to {ch.RequiredBits}), or narrow coef_bits by {d} (to {s.CoefBits - d}; the worst case scales with 2^P), or use about {fewer} weighted samples fewer (the worst case grows in proportion to the sample count at full-scale coefficients)");
    }
}
