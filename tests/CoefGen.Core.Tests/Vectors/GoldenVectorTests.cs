using System.Globalization;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;
using CoefGen.Core.Vectors;

namespace CoefGen.Core.Tests.Vectors;

public class GoldenVectorTests
{
    private static GoldenVectorSet Make(string example, int pixels, ulong seed = 1) =>
        GoldenVectorGenerator.Generate(ExampleDesigns.Load(example), new VectorOptions(pixels, seed));

    [Fact]
    public void The_same_seed_gives_identical_bytes_and_another_seed_other_noise()
    {
        var a = VectorFiles.Render(Make("slowscan_spectro.toml", 300), "coefgen", "t");
        var b = VectorFiles.Render(Make("slowscan_spectro.toml", 300), "coefgen", "t");
        var c = VectorFiles.Render(Make("slowscan_spectro.toml", 300, seed: 2), "coefgen", "t");
        Assert.Equal(a, b);
        Assert.NotEqual(a.Single(f => f.Name == VectorFileNames.StimulusHex).Text, c.Single(f => f.Name == VectorFileNames.StimulusHex).Text);
    }

    [Theory]
    [InlineData("slowscan_spectro.toml")]
    [InlineData("fast_imaging.toml")]
    public void Every_expected_value_is_the_bit_exact_model_of_its_codes_and_the_files_agree(string example)
    {
        var set = Make(example, 200);
        var d = set.Design;
        var files = VectorFiles.Render(set, "coefgen", "t").ToDictionary(f => f.Name, f => f.Text);
        var hex = Lines(files[VectorFileNames.StimulusHex]);
        var dec = Lines(files[VectorFileNames.StimulusDecimal]);
        var outHex = Lines(files[VectorFileNames.ExpectedOutputHex]);
        var expected = Lines(files[VectorFileNames.ExpectedDecimal]);
        Assert.Equal(set.Pixels.Count * d.PixelSamples, hex.Length);
        Assert.Equal(set.Pixels.Count, dec.Length);
        var digits = (d.AdcBits + 3) / 4;
        for (var p = 0; p < set.Pixels.Count; p++)
        {
            var codes = dec[p].Split(' ').Select(s => long.Parse(s, CultureInfo.InvariantCulture)).ToArray();
            Assert.Equal(set.Pixels[p].Codes, codes);
            for (var k = 0; k < d.PixelSamples; k++)
            {
                var h = hex[(p * d.PixelSamples) + k];
                Assert.Equal(digits, h.Length);
                var v = long.Parse(h, NumberStyles.HexNumber, CultureInfo.InvariantCulture);
                Assert.Equal(codes[k] & ((1L << d.AdcBits) - 1), v);
            }

            var model = BitExactModel.RunCycle(d, codes);
            var outWord = long.Parse(outHex[p], NumberStyles.HexNumber, CultureInfo.InvariantCulture);
            Assert.Equal(model.Output, (long)TwosComplement.Wrap(outWord, d.OutputBits));
            Assert.Equal($"{model.Output} {model.Accumulator}", expected[p]);
        }
    }

    [Fact]
    public void Edge_cases_come_first_and_give_the_outputs_the_arithmetic_demands()
    {
        var set = Make("fast_imaging.toml", 40);
        var d = set.Design;
        var byKind = set.Pixels.GroupBy(p => p.Kind).ToDictionary(g => g.Key, g => g.First());
        Assert.Equal(PixelKind.DcOffset, set.Pixels[0].Kind);

        // sum c = 0 exactly: any constant input, and anything outside the windows, gives 0.
        foreach (var kind in new[] { PixelKind.DcOffset, PixelKind.RailsLow, PixelKind.RailsHigh, PixelKind.OutsideWindowsRails })
        {
            Assert.Equal(0, byKind[kind].Expected.Output);
        }

        // Offset binary: rails are code 0 and 2^B - 1.
        Assert.All(byKind[PixelKind.RailsLow].Codes, c => Assert.Equal(0, c));
        Assert.All(byKind[PixelKind.RailsHigh].Codes, c => Assert.Equal((1L << d.AdcBits) - 1, c));
        var up = byKind[PixelKind.ResetLowSignalHigh].Expected.Output;
        Assert.Equal(-up, byKind[PixelKind.ResetHighSignalLow].Expected.Output);
        Assert.True(up > 0);

        // The proof's worst case for the final accumulator reaches its extreme.
        var check = d.Proof.Checks.Single(c => c.Name == "accumulator_final");
        var worst = set.Pixels.First(p => p.Kind == PixelKind.WorstPrefix + check.Name);
        Assert.True(worst.Expected.Accumulator == check.MaxValue || worst.Expected.Accumulator == check.MinValue);
        Assert.True(set.Pixels.Count(p => p.Kind == PixelKind.Noise) > 20);
    }

    [Fact]
    public void Known_charges_come_out_at_their_size_in_ADU()
    {
        var set = Make("slowscan_spectro.toml", 400);
        var scale = Math.ScaleB(1.0, -set.Design.OutputFracBits);
        var mid = set.Pixels.Where(p => p.Kind == PixelKind.ChargeMid).ToArray();
        Assert.True(mid.Length >= 30);

        // Noise is ~0.3 ADU and the settling gain error 0.13 ppm: each output within 3 ADU of the charge.
        Assert.All(mid, p => Assert.InRange(p.Expected.Output * scale, p.ChargeAdu - 3, p.ChargeAdu + 3));

        // Full scale puts the settled level on the top rail: about half the signal samples clip, the output falls short.
        var full = set.Pixels.Where(p => p.Kind == PixelKind.ChargeFull).ToArray();
        Assert.All(full, p => Assert.InRange(p.Expected.Output * scale, p.ChargeAdu - 20, p.ChargeAdu + 0.5));
        Assert.Contains(full.SelectMany(p => p.Codes), c => c == (1L << (set.Design.AdcBits - 1)) - 1);
    }

    private static string[] Lines(string text) => text.Split('\n', StringSplitOptions.RemoveEmptyEntries);
}
