using System.CommandLine;
using System.Globalization;
using CoefGen.Cli.Io;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Vectors;

namespace CoefGen.Cli.Commands;

/// <summary>`coefgen verify FILE --vectors DIR --dut DUMP [--format auto|hex|decimal]`.</summary>
internal static class VerifyCommand
{
    /// <summary>Mismatches listed one by one before the rest is only counted.</summary>
    public const int ListedMismatches = 20;

    public static Command Create(TextWriter output, TextWriter error)
    {
        var file = new Argument<FileInfo>("readout") { Description = "The readout file the vectors were generated from." };
        var vectors = new Option<DirectoryInfo>("--vectors") { Description = "Folder written by `coefgen vectors`.", Required = true };
        var dut = new Option<FileInfo>("--dut") { Description = "The DUT's output dump: one value per pixel, one per line.", Required = true };
        var format = new Option<string>("--format")
        {
            Description = "How the dump is written: auto (default), hex (the output word's bits, two's complement at the output width) or decimal (signed).",
            DefaultValueFactory = _ => "auto",
        };
        format.AcceptOnlyFromAmong("auto", "hex", "decimal");
        var cmd = new Command(
            "verify",
            "Compare a DUT's output dump with the golden expected outputs, pixel by pixel. " +
            "Exit 0 when every pixel matches, 1 on a mismatch, 2 on bad input (wrong count, unparsable line, vectors of another readout file).")
        {
            file, vectors, dut, format,
        };
        cmd.SetAction(parse =>
        {
            var readoutPath = parse.GetRequiredValue(file).ToString();
            var dir = parse.GetRequiredValue(vectors).ToString();
            var dumpPath = parse.GetRequiredValue(dut).ToString();
            var load = InputFiles.LoadReadout(readoutPath);
            if (load.Description is null || load.Diagnostics.Any(d => d.Severity == Severity.Error))
            {
                return DiagnosticPrinter.PrintFailure(error, load.Diagnostics);
            }

            var manifestPath = Path.Combine(dir, VectorFileNames.Manifest);
            if (Read(manifestPath, error) is not { } manifestText)
            {
                return ExitCodes.BadInput;
            }

            var (manifest, manifestProblems) = VectorManifest.Parse(manifestText, manifestPath);
            if (manifest is null)
            {
                return DiagnosticPrinter.PrintFailure(error, manifestProblems);
            }

            if (!string.Equals(manifest.ReadoutSha256, load.Description.ContentSha256, StringComparison.OrdinalIgnoreCase))
            {
                return DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error(VectorCodes.OtherReadout, SourceLocation.FileOnly(manifestPath),
                    $"these vectors were generated from a readout file with SHA-256 {manifest.ReadoutSha256}, not from {readoutPath} ({load.Description.ContentSha256}); regenerate them with `coefgen vectors`")]);
            }

            var expectedPath = Path.Combine(dir, VectorFileNames.ExpectedDecimal);
            if (Read(expectedPath, error) is not { } expectedText)
            {
                return ExitCodes.BadInput;
            }

            var (expected, expectedProblems) = ExpectedOutputs.Parse(expectedText, expectedPath, manifest.Pixels);
            if (expected is null)
            {
                return DiagnosticPrinter.PrintFailure(error, expectedProblems);
            }

            if (Read(dumpPath, error) is not { } dumpText)
            {
                return ExitCodes.BadInput;
            }

            var wanted = parse.GetValue(format) switch { "hex" => DumpFormat.Hex, "decimal" => DumpFormat.DecimalText, _ => DumpFormat.Auto };
            var dump = DumpReader.Parse(dumpText, dumpPath, manifest.OutputBits, wanted);
            if (dump.Values is null)
            {
                return DiagnosticPrinter.PrintFailure(error, dump.Diagnostics);
            }

            if (dump.Values.Count != expected.Count)
            {
                return DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error(VectorCodes.DumpCount, SourceLocation.FileOnly(dumpPath),
                    $"{dump.Values.Count} values, but the vectors hold {expected.Count} pixels (one value per pixel, in pixel order)")]);
            }

            return Report(OutputComparison.Compare(expected, dump.Values), dump.Format, manifest, output);
        });
        return cmd;
    }

    private static int Report(OutputComparison c, DumpFormat format, VectorManifest manifest, TextWriter output)
    {
        var word = format == DumpFormat.Hex ? "hex" : "decimal";
        output.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"compared {c.Compared} pixels ({word} dump, {manifest.OutputBits}-bit output, 1 LSB = 2^-{manifest.OutputFracBits} ADU)"));
        if (c.Matches)
        {
            output.WriteLine("match: every output equals the bit-exact model");
            return ExitCodes.Ok;
        }

        output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"MISMATCH in {c.Mismatches.Count} of {c.Compared} pixels"));
        output.WriteLine("  pixels are numbered from 0 in file order: pixel k is line k + 1 of the dump and of the expected-output files");
        output.WriteLine("  pixel      expected           got  difference (LSB)");
        foreach (var m in c.Mismatches.Take(ListedMismatches))
        {
            var diff = m.DifferenceLsb;
            output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  {m.Pixel,5}  {m.Expected,12}  {m.Got,12}  {(diff.Sign > 0 ? "+" : "")}{diff}"));
        }

        if (c.Mismatches.Count > ListedMismatches)
        {
            output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  ... and {c.Mismatches.Count - ListedMismatches} more"));
        }

        return ExitCodes.Difference;
    }

    private static string? Read(string path, TextWriter error)
    {
        try
        {
            return File.ReadAllText(path);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            var reason = ex is FileNotFoundException or DirectoryNotFoundException ? "file not found" : ex.Message;
            DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error(VectorCodes.FileUnreadable, SourceLocation.FileOnly(path), "cannot read: " + reason)]);
            return null;
        }
    }
}
