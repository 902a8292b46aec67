using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;
using CoefGen.Core.Vectors;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// How often the expected data of a vector set takes each edge branch of the datapath, counted from the
/// model's own results and an independent full-precision sum (so a count cannot be produced by the HDL under test).
/// </summary>
/// <param name="Pixels">Pixels counted.</param>
/// <param name="OutputHigh">Outputs equal to the top output rail (2^(OutputBits-1) - 1) that the model flags as saturated.</param>
/// <param name="OutputLow">Outputs equal to the bottom output rail (-2^(OutputBits-1)) that the model flags as saturated.</param>
/// <param name="Ties">Unsaturated outputs whose pre-shift value acc * M lies exactly half-way between two output codes.</param>
/// <param name="TiesOddQuotient">Ties whose truncated quotient is odd (half-even rounds these up).</param>
/// <param name="NegativeTies">Ties of a negative pre-shift value (half-up rounds these towards zero, truncate away from it).</param>
/// <param name="AccumulatorClipped">Pixels where a saturating accumulator clipped a partial sum.</param>
/// <param name="AccumulatorWrapped">Pixels whose accumulator differs from the exact sum of products (wrap-around, or a clip).</param>
public sealed record EdgeBranchCounts(
    int Pixels, int OutputHigh, int OutputLow, int Ties, int TiesOddQuotient, int NegativeTies, int AccumulatorClipped, int AccumulatorWrapped)
{
    public static EdgeBranchCounts Of(IntegerDesign d, IReadOnlyList<GoldenPixel> pixels)
    {
        ArgumentNullException.ThrowIfNull(d);
        ArgumentNullException.ThrowIfNull(pixels);
        var top = (1L << (d.OutputBits - 1)) - 1;
        var bottom = -(1L << (d.OutputBits - 1));
        var half = d.Shift > 0 ? Int128.One << (d.Shift - 1) : Int128.Zero;
        var mask = (Int128.One << d.Shift) - 1;
        int high = 0, low = 0, ties = 0, odd = 0, negative = 0, clipped = 0, wrapped = 0;
        foreach (var px in pixels)
        {
            var e = px.Expected;
            high += e.OutputSaturated && e.Output == top ? 1 : 0;
            low += e.OutputSaturated && e.Output == bottom ? 1 : 0;
            clipped += e.AccumulatorClipped ? 1 : 0;
            wrapped += ExactSum(d, px.Codes) != e.Accumulator ? 1 : 0;
            var m = (Int128)e.Accumulator * d.PostMultiplier;
            if (d.Shift > 0 && !e.OutputSaturated && (m & mask) == half)
            {
                ties++;
                odd += Int128.IsOddInteger(m >> d.Shift) ? 1 : 0;
                negative += m < 0 ? 1 : 0;
            }
        }

        return new EdgeBranchCounts(pixels.Count, high, low, ties, odd, negative, clipped, wrapped);
    }

    /// <summary>sum c_k x_k with no width limit, from the codes as the ADC wrote them.</summary>
    private static Int128 ExactSum(IntegerDesign d, IReadOnlyList<long> codes)
    {
        Int128 sum = 0;
        for (var k = 0; k < d.Coefficients.Count; k++)
        {
            var code = codes[d.SampleIndex[k]];
            var x = d.Coding == AdcCoding.OffsetBinary ? code - (1L << (d.AdcBits - 1)) : code;
            sum += (Int128)d.Coefficients[k] * x;
        }

        return sum;
    }
}
