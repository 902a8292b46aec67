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
/// <param name="FracBelowP">output_frac_bits = P - this. For normalize = shift it is the right shift, so a tie needs only this many
/// low bits; for normalize = exact a negative value gives a shift of a few bits after the post-multiplier (a tie then needs
/// a shift above the trailing zero bits of M).</param>
/// <param name="OutputRangeAdu">output_bits = frac bits + this + 1: the output holds +-2^this ADU, far below a full-scale charge.</param>
/// <param name="NarrowAccumulator">
/// An accumulator below what the proof needs. Wrap: coef_bits + ADC bits, the narrowest the resolver accepts (the
/// partial sums wrap on every pixel, the final one on rail and full-charge patterns). Saturate: one bit below the proof's
/// partial-sum width, so rail and full-charge pixels clip and noise pixels do not (at the narrowest width the
/// DC offset alone clips every pixel).
/// </param>
/// <param name="Ghdl">Also simulate in GHDL (on the first <see cref="EdgeVariant.GhdlPixels"/> pixels).</param>
/// <param name="CoefBits">coef_bits, or null for the example's. At 18 bits the integer gain is 2^P to 17 bits, so the
/// post-multiplier comes out a power of two (a plain shift); at 10 bits it does not.</param>
public sealed record EdgeVariant(
    string Example, string Rounding, string Accumulator, bool Exact, int FracBelowP, int OutputRangeAdu, bool NarrowAccumulator, bool Ghdl, int? CoefBits = null)
{
    public const int IcarusPixels = 300;

    public const int GhdlPixels = 50;

    /// <summary>
    /// The example's text with a new [fixed_point] section (same target). P and the proven partial-sum width do not
    /// depend on the output or accumulator settings, so they come from a probe run of the same variant
    /// (<see cref="ProbeToml"/>); <paramref name="coefBits"/> is the example's width when <see cref="CoefBits"/> is null.
    /// </summary>
    public string Toml(int p, int coefBits, int adcBits, int partialSumBits)
    {
        var frac = p - FracBelowP;
        coefBits = CoefBits ?? coefBits;
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
        if (NarrowAccumulator && partialSumBits > 0)
        {
            lines.Add(Line("acc_bits", Accumulator == "wrap" ? coefBits + adcBits : partialSumBits - 1));
        }

        var edited = Regex.Replace(text, @"\[fixed_point\][^\[]*", string.Join('\n', lines) + "\n\n");
        Assert.NotEqual(text, edited);
        return edited;
    }

    /// <summary>The variant with a full-width accumulator and a valid fraction width, to learn P and the partial-sum width.</summary>
    public string ProbeToml(int coefBits, int adcBits) => Toml(Math.Max(FracBelowP, 0), coefBits, adcBits, 0);

    public override string ToString() =>
        $"{Path.GetFileNameWithoutExtension(Example)} {Rounding} {Accumulator}{(NarrowAccumulator ? "(narrow)" : "")} {(Exact ? "exact" : "shift")} frac P{(-FracBelowP).ToString("+0;-0", CultureInfo.InvariantCulture)}{(CoefBits is int b ? " coef " + b.ToString(CultureInfo.InvariantCulture) : "")}";

    private static string Line(string key, int value) => key + " = " + value.ToString(CultureInfo.InvariantCulture);
}
