using System.Globalization;
using System.Text.RegularExpressions;
using CoefGen.Core.Tests.Vectors;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// A shipped example with its [fixed_point] section replaced, chosen to drive the reference datapath through
/// branches the shipped designs never reach: output saturation, exact rounding ties, accumulator wrap or clip.
/// </summary>
/// <param name="Example">The example it edits.</param>
/// <param name="Rounding">half-up, half-even or truncate.</param>
/// <param name="Accumulator">wrap or saturate.</param>
/// <param name="Exact">normalize = "exact" (post-multiplier) instead of "shift".</param>
/// <param name="Shift">For normalize = shift: the wanted right shift, so output_frac_bits = P - Shift and a tie needs only Shift low bits.</param>
/// <param name="OutputFracBits">For normalize = exact: the output fraction bits.</param>
/// <param name="OutputRangeAdu">output_bits = frac bits + this + 1: the output holds +-2^this ADU, far below a full-scale charge.</param>
/// <param name="NarrowAccumulator">
/// An accumulator below what the proof needs. Wrap: coef_bits + ADC bits, the narrowest the resolver accepts (the
/// partial sums wrap on every pixel, the final one only on rail patterns). Saturate: one bit below the proof's
/// partial-sum width, so rail and full-charge pixels clip and noise pixels do not (at the narrowest width the
/// DC offset alone clips every pixel).
/// </param>
/// <param name="Ghdl">Also simulate in GHDL (on the first <see cref="EdgeVariant.GhdlPixels"/> pixels).</param>
public sealed record EdgeVariant(
    string Example, string Rounding, string Accumulator, bool Exact, int Shift, int OutputFracBits, int OutputRangeAdu, bool NarrowAccumulator, bool Ghdl)
{
    public const int IcarusPixels = 300;

    public const int GhdlPixels = 50;

    /// <summary>The example's text with a new [fixed_point] section (same target and coefficient width).</summary>
    /// <param name="p">The example's coefficient scale P.</param>
    /// <param name="coefBits">The example's coefficient width.</param>
    /// <param name="adcBits">The ADC width.</param>
    /// <param name="partialSumBits">The example's proven partial-sum width.</param>
    public string Toml(int p, int coefBits, int adcBits, int partialSumBits)
    {
        var frac = Exact ? OutputFracBits : p - Shift;
        var text = File.ReadAllText(ExampleDesigns.ExamplePath(Example));
        var target = Regex.Match(text, "(?m)^target = \"([^\"]+)\"").Groups[1].Value;
        List<string> lines =
        [
            "[fixed_point]",
            $"target = \"{target}\"",
            Line("coef_bits", coefBits),
            $"rounding = \"{Rounding}\"",
            $"accumulator = \"{Accumulator}\"",
            $"normalize = \"{(Exact ? "exact" : "shift")}\"",
            Line("output_frac_bits", frac),
            Line("output_bits", frac + OutputRangeAdu + 1),
        ];
        if (NarrowAccumulator)
        {
            lines.Add(Line("acc_bits", Accumulator == "wrap" ? coefBits + adcBits : partialSumBits - 1));
        }

        var edited = Regex.Replace(text, @"\[fixed_point\][^\[]*", string.Join('\n', lines) + "\n\n");
        Assert.NotEqual(text, edited);
        return edited;
    }

    public override string ToString() =>
        $"{Path.GetFileNameWithoutExtension(Example)} {Rounding} {Accumulator}{(NarrowAccumulator ? "(narrow)" : "")} {(Exact ? "exact" : "shift " + Shift.ToString(CultureInfo.InvariantCulture))}";

    private static string Line(string key, int value) => key + " = " + value.ToString(CultureInfo.InvariantCulture);
}
