using System.Globalization;
using System.Text;
using CoefGen.Core.Emit;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>Test stimulus and vector files, written independently of the templates (from the design's own numbers).</summary>
public static class Vectors
{
    /// <summary>Pixel cycles of ADC codes as the ADC writes them: edge patterns first (rails, rails in opposition, zero), then random.</summary>
    public static List<long[]> Codes(IntegerDesign d, int randomCount, int seed)
    {
        var lo = d.Coding == AdcCoding.OffsetBinary ? 0L : -(1L << (d.AdcBits - 1));
        var hi = lo + (1L << d.AdcBits) - 1;
        var mid = d.Coding == AdcCoding.OffsetBinary ? 1L << (d.AdcBits - 1) : 0L;
        long[] Fill(Func<int, long> f) => Enumerable.Range(0, d.PixelSamples).Select(f).ToArray();
        var list = new List<long[]>
        {
            Fill(_ => lo), Fill(_ => hi), Fill(_ => mid),
            Fill(i => d.Reset!.Contains(i) ? lo : hi), Fill(i => d.Reset!.Contains(i) ? hi : lo),
            Fill(i => i % 2 == 0 ? lo : hi), Fill(i => i % 2 == 0 ? hi : lo),
        };
        var rng = new Random(seed);
        for (var n = 0; n < randomCount; n++)
        {
            list.Add(Fill(_ => lo + rng.NextInt64(hi - lo + 1)));
        }

        return list;
    }

    /// <summary>One line per cycle: expected output, then the cycle's codes (decimal, for the C harness).</summary>
    public static string ExpectedFile(IntegerDesign d, IEnumerable<long[]> cycles)
    {
        var sb = new StringBuilder();
        foreach (var c in cycles)
        {
            sb.Append(ReferenceArithmetic.Apply(d, c).ToString(CultureInfo.InvariantCulture));
            foreach (var code in c)
            {
                sb.Append(' ').Append(code.ToString(CultureInfo.InvariantCulture));
            }

            sb.Append('\n');
        }

        return sb.ToString();
    }

    /// <summary>One coefficient per line as hex masked to CoefBits ($readmemh form).</summary>
    public static string CoefHex(IntegerDesign d) =>
        string.Concat(d.Coefficients.Select(c => LiteralFormat.MaskedHex(c, d.CoefBits) + "\n"));

    /// <summary>One sample index per line, 32-bit hex.</summary>
    public static string IndexHex(IntegerDesign d) =>
        string.Concat(d.SampleIndex.Select(i => LiteralFormat.MaskedHex(i, 32) + "\n"));

    /// <summary>For VHDL: masked hex coefficient, a space, decimal sample index.</summary>
    public static string VhdlVectors(IntegerDesign d) =>
        string.Concat(d.Coefficients.Select((c, k) =>
            LiteralFormat.MaskedHex(c, d.CoefBits) + " " + d.SampleIndex[k].ToString(CultureInfo.InvariantCulture) + "\n"));
}
