using System.Globalization;
using System.Numerics;
using System.Security.Cryptography;
using System.Text;
using System.Text.Json;
using CoefGen.Core.Emit;

namespace CoefGen.Core.Vectors;

/// <summary>
/// The text of every vector file for a <see cref="GoldenVectorSet"/>: '\n' line ends, invariant culture,
/// no clock, so the same set gives the same bytes. Writing them (atomically) is the caller's job.
/// </summary>
public static class VectorFiles
{
    public const string ManifestSchema = "coefgen.vectors/1";

    private static readonly UTF8Encoding Utf8 = new(encoderShouldEmitUTF8Identifier: false);

    /// <summary>
    /// All files, the manifest last (it carries the SHA-256 of the others and of <paramref name="alongside"/>, the files
    /// written into the same folder with the vectors, such as the reference datapath and testbenches).
    /// </summary>
    public static IReadOnlyList<(string Name, string Text)> Render(GoldenVectorSet set, string toolName, string toolVersion, IReadOnlyList<(string Name, string Text)>? alongside = null)
    {
        ArgumentNullException.ThrowIfNull(set);
        ArgumentNullException.ThrowIfNull(toolName);
        ArgumentNullException.ThrowIfNull(toolVersion);
        var d = set.Design;
        var files = new List<(string Name, string Text)>
        {
            (VectorFileNames.StimulusHex, Lines(set.Pixels.SelectMany(p => p.Codes), c => UnsignedHex(c, d.AdcBits))),
            (VectorFileNames.StimulusDecimal, Lines(set.Pixels, p => string.Join(' ', p.Codes.Select(Dec)))),
            (VectorFileNames.ExpectedOutputHex, Lines(set.Pixels, p => LiteralFormat.MaskedHex(p.Expected.Output, d.OutputBits))),
            (VectorFileNames.ExpectedAccumulatorHex, Lines(set.Pixels, p => LiteralFormat.MaskedHex(p.Expected.Accumulator, d.AccBits))),
            (VectorFileNames.ExpectedDecimal, Lines(set.Pixels, p => Dec(p.Expected.Output) + " " + Dec(p.Expected.Accumulator))),
            (VectorFileNames.Table, Table(set)),
        };
        files.Add((VectorFileNames.Manifest, Manifest(set, [.. alongside ?? [], .. files], toolName, toolVersion)));
        return files;
    }

    /// <summary>Lower-case hex of a non-negative code (offset binary) or a two's-complement code, masked to <paramref name="bits"/>.</summary>
    public static string UnsignedHex(long code, int bits)
    {
        var mask = (BigInteger.One << bits) - 1;
        var digits = (bits + 3) / 4;
        var v = new BigInteger(code) & mask;
        var s = v.ToString("x", CultureInfo.InvariantCulture).TrimStart('0');
        return s.PadLeft(digits, '0');
    }

    /// <summary>Lower-case hex SHA-256 of the UTF-8 bytes of <paramref name="text"/>.</summary>
    public static string Sha256(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        return Convert.ToHexStringLower(SHA256.HashData(Utf8.GetBytes(text)));
    }

    private static string Dec(long v) => v.ToString(CultureInfo.InvariantCulture);

    private static string R(double v) => v.ToString("R", CultureInfo.InvariantCulture);

    private static string Lines<T>(IEnumerable<T> items, Func<T, string> line)
    {
        var sb = new StringBuilder();
        foreach (var item in items)
        {
            sb.Append(line(item)).Append('\n');
        }

        return sb.ToString();
    }

    private static string Table(GoldenVectorSet set)
    {
        var sb = new StringBuilder("pixel,kind,charge_adu,charge_e,expected_output,expected_output_adu,expected_accumulator,accumulator_clipped,output_saturated\n");
        var scale = Math.ScaleB(1.0, -set.Design.OutputFracBits);
        for (var i = 0; i < set.Pixels.Count; i++)
        {
            var p = set.Pixels[i];
            var e = p.Expected;
            sb.Append(CultureInfo.InvariantCulture, $"{i},{p.Kind},{R(p.ChargeAdu)},{R(p.ChargeAdu / set.AduPerElectron)},{Dec(e.Output)},")
              .Append(CultureInfo.InvariantCulture, $"{R(e.Output * scale)},{Dec(e.Accumulator)},{(e.AccumulatorClipped ? 1 : 0)},{(e.OutputSaturated ? 1 : 0)}\n");
        }

        return sb.ToString();
    }

    private static string Manifest(GoldenVectorSet set, IReadOnlyList<(string Name, string Text)> files, string toolName, string toolVersion)
    {
        var d = set.Design;
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true, NewLine = "\n" }))
        {
            w.WriteStartObject();
            w.WriteString("schema", ManifestSchema);
            w.WriteString("tool", toolName + " " + toolVersion);
            w.WriteString("design", d.Name);
            w.WriteString("readout_file", set.ReadoutFileName);
            w.WriteString("readout_sha256", set.ReadoutSha256);
            w.WriteNumber("seed", set.Seed);
            w.WriteNumber("pixels", set.Pixels.Count);
            w.WriteNumber("pixel_samples", d.PixelSamples);
            w.WriteNumber("coef_count", d.Coefficients.Count);
            w.WriteNumber("adc_bits", d.AdcBits);
            w.WriteString("coding", ModelText.Word(d.Coding));
            w.WriteNumber("coef_bits", d.CoefBits);
            w.WriteNumber("acc_bits", d.AccBits);
            w.WriteString("accumulator", ModelText.Word(d.Accumulator));
            w.WriteNumber("output_bits", d.OutputBits);
            w.WriteNumber("output_frac_bits", d.OutputFracBits);
            w.WriteString("rounding", ModelText.Word(d.Rounding));
            w.WriteNumber("shift", d.Shift);
            w.WriteNumber("post_multiplier", d.PostMultiplier);
            w.WriteNumber("baseline_adu", set.BaselineAdu);
            w.WriteNumber("full_scale_charge_adu", set.FullScaleChargeAdu);
            w.WriteNumber("adu_per_electron", set.AduPerElectron);
            w.WriteNumber("noise_added_constant_v2", set.AddedConstantV2);
            w.WriteNumber("noise_diagonal_loading_v2", set.DiagonalLoadingV2);
            w.WriteStartObject("kinds");
            foreach (var g in set.Pixels.GroupBy(p => p.Kind))
            {
                w.WriteNumber(g.Key, g.Count());
            }

            w.WriteEndObject();
            w.WriteStartArray("files");
            foreach (var (name, text) in files)
            {
                w.WriteStartObject();
                w.WriteString("name", name);
                w.WriteNumber("lines", text.Count(ch => ch == '\n'));
                w.WriteString("sha256", Sha256(text));
                w.WriteEndObject();
            }

            w.WriteEndArray();
            w.WriteEndObject();
        }

        return Utf8.GetString(stream.ToArray()) + "\n";
    }
}
