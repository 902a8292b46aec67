using System.Globalization;
using System.Text;
using System.Text.Json;
using CoefGen.Core.Emit;

namespace CoefGen.Core.Vectors.TwoStage;

/// <summary>
/// Streams the vector files of a <see cref="TwoStageVectorSource"/>: the same files, formats and manifest schema as
/// <see cref="VectorFileWriter"/> (so `verify` and the testbenches read them unchanged; the accumulator is the second
/// stage's), plus the read sums of every pixel as the intermediate dump between the stages.
/// </summary>
public static class TwoStageVectorFileWriter
{
    /// <summary>One line per pixel: the rounded first sums r_0 .. r_(N-1) in decimal.</summary>
    public const string ReadSums = "expected_read_sums.txt";

    /// <summary>The data files in the order they are written (the manifest follows them).</summary>
    public static IReadOnlyList<string> DataFiles { get; } = [.. VectorFileWriter.DataFiles, ReadSums];

    public static void Write(TwoStageVectorSource vectors, Func<string, Stream> open, string toolName, string toolVersion, IProgress<int>? progress = null,
        IReadOnlyList<(string Name, byte[] Bytes)>? alongside = null)
    {
        ArgumentNullException.ThrowIfNull(vectors);
        ArgumentNullException.ThrowIfNull(open);
        var d = vectors.Design;
        var outs = DataFiles.Select(name => new HashingWriter(name, open(name))).ToArray();
        var kinds = new List<(string Kind, int Count)>();
        try
        {
            outs[5].Line(VectorFileWriter.TableHeader);
            var i = 0;
            foreach (var p in vectors.Pixels)
            {
                VectorFileWriter.WritePixel(outs, i, p, d.AdcBits, d.OutputBits, d.AccBits, d.OutputFracBits, vectors.AduPerElectron);
                outs[6].Line(string.Join(' ', p.ReadSums!.Select(v => v.ToString(CultureInfo.InvariantCulture))));
                var k = kinds.FindIndex(x => x.Kind == p.Kind);
                if (k < 0)
                {
                    kinds.Add((p.Kind, 1));
                }
                else
                {
                    kinds[k] = (p.Kind, kinds[k].Count + 1);
                }

                i++;
                if (progress is not null && i % VectorFileWriter.ProgressStride == 0)
                {
                    progress.Report(i);
                }
            }

            progress?.Report(i);
            foreach (var w in outs)
            {
                w.Finish();
            }

            var files = (alongside ?? []).Select(a => VectorFileWriter.Entry(a.Name, a.Bytes))
                .Concat(outs.Select(w => new VectorFileEntry(w.Name, w.Lines, w.Sha256))).ToList();
            using var manifest = new HashingWriter(VectorFileNames.Manifest, open(VectorFileNames.Manifest));
            manifest.Raw(Manifest(vectors, i, kinds, files, toolName, toolVersion));
            manifest.Finish();
        }
        finally
        {
            foreach (var w in outs)
            {
                w.Dispose();
            }
        }
    }

    /// <summary>All files in memory (tests): name and text, the manifest last.</summary>
    public static IReadOnlyList<(string Name, string Text)> Render(TwoStageVectorSource vectors, string toolName, string toolVersion)
    {
        var streams = new List<(string Name, MemoryStream Stream)>();
        Write(vectors, name =>
        {
            var s = new MemoryStream();
            streams.Add((name, s));
            return s;
        }, toolName, toolVersion);
        return [.. streams.Select(s => (s.Name, Encoding.UTF8.GetString(s.Stream.ToArray())))];
    }

    private static string Manifest(TwoStageVectorSource v, int pixels, List<(string Kind, int Count)> kinds, List<VectorFileEntry> files, string toolName, string toolVersion)
    {
        var d = v.Design;
        using var stream = new MemoryStream();
        using (var w = new Utf8JsonWriter(stream, new JsonWriterOptions { Indented = true, NewLine = "\n" }))
        {
            w.WriteStartObject();
            w.WriteString("schema", VectorFiles.ManifestSchema);
            w.WriteString("tool", toolName + " " + toolVersion);
            w.WriteString("design", v.Name);
            w.WriteString("form", "two-stage");
            w.WriteString("readout_file", v.ReadoutFileName);
            w.WriteString("readout_sha256", v.ReadoutSha256);
            w.WriteNumber("seed", v.Seed);
            w.WriteNumber("pixels", pixels);
            w.WriteNumber("pixel_samples", v.PixelSamples);
            w.WriteNumber("read_count", v.Layout.Reads);
            w.WriteNumber("per_read_count", v.Layout.PerRead);
            w.WriteNumber("read_period", v.Layout.Period);
            w.WriteNumber("adc_bits", d.AdcBits);
            w.WriteString("coding", ModelText.Word(d.Coding));
            w.WriteNumber("p1", d.P1);
            w.WriteNumber("p2", d.P2);
            w.WriteNumber("stage1_shift", d.Stage1Shift);
            w.WriteNumber("stage1_acc_bits", d.Stage1AccBits);
            w.WriteNumber("acc_bits", d.AccBits);
            w.WriteString("accumulator", ModelText.Word(v.Accumulator));
            w.WriteNumber("output_bits", d.OutputBits);
            w.WriteNumber("output_frac_bits", d.OutputFracBits);
            w.WriteString("rounding", ModelText.Word(d.Rounding));
            w.WriteNumber("shift", d.Shift);
            w.WriteNumber("baseline_adu", v.BaselineAdu);
            w.WriteNumber("full_scale_charge_adu", v.FullScaleChargeAdu);
            w.WriteNumber("adu_per_electron", v.AduPerElectron);
            VectorManifestWriter.Kinds(w, kinds);
            VectorManifestWriter.Files(w, files);
            w.WriteEndObject();
        }

        return Encoding.UTF8.GetString(stream.ToArray()) + "\n";
    }

}
