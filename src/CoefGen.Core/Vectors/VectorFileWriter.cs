using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using CoefGen.Core.Emit;

namespace CoefGen.Core.Vectors;

/// <summary>
/// Streams every vector file of a <see cref="GoldenVectorSource"/> pixel by pixel into streams the caller opens
/// by file name (a folder it chose, a staging folder, memory): memory stays independent of the pixel count. The
/// SHA-256 and line count of each file are taken while writing; the manifest is opened and written last.
/// '\n' line ends, invariant culture, no clock: the same vectors give the same bytes.
/// </summary>
public static class VectorFileWriter
{
    /// <summary>Progress is reported after this many pixels (and at the end).</summary>
    public const int ProgressStride = 4096;

    /// <summary>The data files in the order they are written (the manifest follows them).</summary>
    public static IReadOnlyList<string> DataFiles { get; } =
    [
        VectorFileNames.StimulusHex, VectorFileNames.StimulusDecimal, VectorFileNames.ExpectedOutputHex,
        VectorFileNames.ExpectedAccumulatorHex, VectorFileNames.ExpectedDecimal, VectorFileNames.Table,
    ];

    /// <summary>
    /// Writes the data files, then the manifest. <paramref name="open"/> returns a writable stream for a file
    /// name (the writer disposes it); <paramref name="progress"/> gets the pixels written so far. The manifest also
    /// lists the SHA-256 of <paramref name="alongside"/>: files the caller writes into the same folder (the reference
    /// datapath, packages and testbenches), so a tampered or stale one is caught like a vector file.
    /// </summary>
    public static void Write(GoldenVectorSource vectors, Func<string, Stream> open, string toolName, string toolVersion, IProgress<int>? progress = null,
        IReadOnlyList<(string Name, byte[] Bytes)>? alongside = null)
    {
        ArgumentNullException.ThrowIfNull(vectors);
        ArgumentNullException.ThrowIfNull(open);
        ArgumentNullException.ThrowIfNull(toolName);
        ArgumentNullException.ThrowIfNull(toolVersion);
        var d = vectors.Design;
        var outs = DataFiles.Select(name => new HashingWriter(name, open(name))).ToArray();
        var counts = new VectorCounts();
        try
        {
            outs[5].Line(TableHeader);
            var i = 0;
            foreach (var p in vectors.Pixels)
            {
                WritePixel(outs, i, p, d.AdcBits, d.OutputBits, d.AccBits, d.OutputFracBits, vectors.AduPerElectron);
                counts.Add(d, p);
                i++;
                if (progress is not null && i % ProgressStride == 0)
                {
                    progress.Report(i);
                }
            }

            progress?.Report(i);
            foreach (var w in outs)
            {
                w.Finish();
            }

            var files = (alongside ?? []).Select(a => Entry(a.Name, a.Bytes))
                .Concat(outs.Select(w => new VectorFileEntry(w.Name, w.Lines, w.Sha256))).ToList();
            using var manifest = new HashingWriter(VectorFileNames.Manifest, open(VectorFileNames.Manifest));
            manifest.Raw(VectorManifestWriter.Text(vectors, i, counts, files, toolName, toolVersion));
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

    /// <summary>The header line of vectors.csv.</summary>
    internal const string TableHeader = "pixel,kind,charge_adu,charge_e,expected_output,expected_output_adu,expected_accumulator,accumulator_clipped,output_saturated";

    /// <summary>One pixel's lines in the first six data files (<see cref="DataFiles"/> order), shared with the two-stage writer.</summary>
    internal static void WritePixel(IReadOnlyList<HashingWriter> outs, int i, GoldenPixel p, int adcBits, int outputBits, int accBits, int outputFracBits, double aduPerElectron)
    {
        var (stimHex, stimDec, outHex, accHex, expDec, table) = (outs[0], outs[1], outs[2], outs[3], outs[4], outs[5]);
        var e = p.Expected;
        foreach (var c in p.Codes)
        {
            stimHex.Line(VectorFiles.UnsignedHex(c, adcBits));
        }

        stimDec.Line(string.Join(' ', p.Codes.Select(Dec)));
        outHex.Line(LiteralFormat.MaskedHex(e.Output, outputBits));
        accHex.Line(LiteralFormat.MaskedHex(e.Accumulator, accBits));
        expDec.Line(Dec(e.Output) + " " + Dec(e.Accumulator));
        var scale = Math.ScaleB(1.0, -outputFracBits);
        table.Line(string.Create(CultureInfo.InvariantCulture,
            $"{i},{p.Kind},{R(p.ChargeAdu)},{R(p.ChargeAdu / aduPerElectron)},{Dec(e.Output)},{R(e.Output * scale)},{Dec(e.Accumulator)},{(e.AccumulatorClipped ? 1 : 0)},{(e.OutputSaturated ? 1 : 0)}"));
    }

    /// <summary>A file entry of the manifest for bytes written beside the vectors.</summary>
    internal static VectorFileEntry Entry(string name, byte[] bytes) => new(name, LineCount(bytes), Convert.ToHexStringLower(SHA256.HashData(bytes)));

    private static int LineCount(byte[] bytes) => bytes.Count(b => b == (byte)'\n');

    private static string Dec(long v) => v.ToString(CultureInfo.InvariantCulture);

    private static string R(double v) => v.ToString("R", CultureInfo.InvariantCulture);
}
