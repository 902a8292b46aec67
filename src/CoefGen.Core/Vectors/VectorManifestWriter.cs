using System.Text;
using System.Text.Json;
using CoefGen.Core.Emit;

namespace CoefGen.Core.Vectors;

/// <summary>The text of manifest.json: widths, modes, seed, readout SHA-256, pixel kinds, branch coverage and every data file's SHA-256.</summary>
internal static class VectorManifestWriter
{
    private static readonly UTF8Encoding Utf8 = new(encoderShouldEmitUTF8Identifier: false);

    public static string Text(GoldenVectorSource set, int pixels, VectorCounts counts, IReadOnlyList<VectorFileEntry> files, string toolName, string toolVersion)
    {
        var d = set.Design;
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true, NewLine = "\n" }))
        {
            w.WriteStartObject();
            w.WriteString("schema", VectorFiles.ManifestSchema);
            w.WriteString("tool", toolName + " " + toolVersion);
            w.WriteString("design", d.Name);
            w.WriteString("readout_file", set.ReadoutFileName);
            w.WriteString("readout_sha256", set.ReadoutSha256);
            w.WriteNumber("seed", set.Seed);
            w.WriteNumber("pixels", pixels);
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
            Kinds(w, counts.Kinds);
            w.WriteStartObject("branches");
            foreach (var (branch, n) in counts.Branches)
            {
                w.WriteNumber(branch, n);
            }

            w.WriteEndObject();
            w.WriteStartObject("unreached_branches");
            foreach (var (target, reason) in set.UnreachedBranches)
            {
                w.WriteString(target, reason);
            }

            w.WriteEndObject();
            Files(w, files);
            w.WriteEndObject();
        }

        return Utf8.GetString(stream.ToArray()) + "\n";
    }

    /// <summary>The "kinds" object: pixels per kind in order of first appearance.</summary>
    internal static void Kinds(Utf8JsonWriter w, IEnumerable<(string Kind, int Count)> kinds)
    {
        w.WriteStartObject("kinds");
        foreach (var (kind, n) in kinds)
        {
            w.WriteNumber(kind, n);
        }

        w.WriteEndObject();
    }

    /// <summary>The "files" array: name, line count and SHA-256 of every file.</summary>
    internal static void Files(Utf8JsonWriter w, IReadOnlyList<VectorFileEntry> files)
    {
        w.WriteStartArray("files");
        foreach (var f in files)
        {
            w.WriteStartObject();
            w.WriteString("name", f.Name);
            w.WriteNumber("lines", f.Lines);
            w.WriteString("sha256", f.Sha256);
            w.WriteEndObject();
        }

        w.WriteEndArray();
    }
}
