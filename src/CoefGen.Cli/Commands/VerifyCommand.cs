using System.CommandLine;
using System.Globalization;
using CoefGen.Cli.Diagnostics;
using CoefGen.Cli.Io;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Vectors;

namespace CoefGen.Cli.Commands;

/// <summary>`coefgen verify FILE --vectors DIR --dut DUMP [--format auto|hex|decimal]`; an instrument file takes --dut-dir DUMPS.</summary>
internal static class VerifyCommand
{
    /// <summary>Mismatches listed one by one before the rest is only counted.</summary>
    public const int ListedMismatches = 20;

    public static Command Create(TextWriter output, TextWriter error)
    {
        var file = new Argument<FileInfo>("readout") { Description = "The readout file the vectors were generated from, or an instrument file (then --dut-dir instead of --dut)." };
        var vectors = new Option<DirectoryInfo>("--vectors") { Description = "Folder written by `coefgen vectors`.", Required = true };
        var dut = new Option<FileInfo>("--dut") { Description = "The DUT's output dump: one value per pixel, one per line (required for a readout file)." };
        var format = new Option<string>("--format")
        {
            Description = "How the dump is written: auto (default), hex (the output word's bits, two's complement at the output width) or decimal (signed).",
            DefaultValueFactory = _ => "auto",
        };
        format.AcceptOnlyFromAmong("auto", "hex", "decimal");
        var acc = new Option<bool>("--acc")
        {
            Description = "Require the dump's second column (the final accumulator) and compare it too; without --acc it is compared whenever every line has one.",
        };
        var cmd = new Command(
            "verify",
            "Compare a DUT's output dump with the golden expected outputs, pixel by pixel. " +
            "Exit 0 when every pixel matches, 1 on a mismatch, 2 on bad input (wrong count, unparsable line, vectors of another readout file).")
        {
            file, vectors, dut, format, acc,
        };
        var dutDir = new Option<DirectoryInfo>("--dut-dir")
        {
            Description = "For an instrument file: the folder of the DUT's dumps, one per table, named MODE_CHANNEL.txt (the vectors are DIR/MODE_CHANNEL/, as `vectors` writes them).",
        };
        cmd.Add(dutDir);
        cmd.SetAction(parse =>
        {
            var readoutPath = parse.GetRequiredValue(file).ToString();
            var dir = parse.GetRequiredValue(vectors).ToString();
            var wanted = parse.GetValue(format) switch { "hex" => DumpFormat.Hex, "decimal" => DumpFormat.DecimalText, _ => DumpFormat.Auto };
            var dumpPath = parse.GetValue(dut)?.ToString();
            var dumpDir = parse.GetValue(dutDir)?.ToString();
            if (InstrumentRunner.IsInstrument(readoutPath))
            {
                return dumpDir is null
                    ? DiagnosticPrinter.Fail(error, CliCodes.BadOption, "--dut-dir", "an instrument file is verified table by table: give --dut-dir DUMPS holding MODE_CHANNEL.txt per table (not --dut)")
                    : InstrumentVerify.Run(readoutPath, dir, dumpDir, wanted, parse.GetValue(acc), output, error);
            }

            if (dumpPath is null || dumpDir is not null)
            {
                return DiagnosticPrinter.Fail(error, CliCodes.BadOption, dumpDir is null ? "--dut" : "--dut-dir", "a readout file takes --dut DUMP; --dut-dir is for an instrument file");
            }

            var load = InputFiles.LoadReadout(readoutPath);
            if (load.Description is null || load.Diagnostics.Any(d => d.Severity == Severity.Error))
            {
                return DiagnosticPrinter.PrintFailure(error, load.Diagnostics);
            }

            return Table(load.Description.ContentSha256, readoutPath, dir, dumpPath, wanted, parse.GetValue(acc), output, error).Code;
        });
        return cmd;
    }

    /// <summary>Exit code and one-line verdict of comparing one dump with one table's vectors (the details are printed as they are found).</summary>
    internal readonly record struct Verdict(int Code, string Summary);

    /// <summary>Checks the vectors in <paramref name="dir"/> (made from the readout with SHA-256 <paramref name="readoutSha256"/>) against the dump.</summary>
    internal static Verdict Table(string readoutSha256, string readoutPath, string dir, string dumpPath, DumpFormat wanted, bool requireAcc, TextWriter output, TextWriter error)
    {
        var bad = new Verdict(ExitCodes.BadInput, "bad input (see the diagnostic)");
        var manifestPath = Path.Combine(dir, VectorFileNames.Manifest);
        if (Read(manifestPath, error) is not { } manifestText)
        {
            return bad;
        }

        var (manifest, manifestProblems) = VectorManifest.Parse(manifestText, manifestPath);
        if (manifest is null)
        {
            DiagnosticPrinter.PrintFailure(error, manifestProblems);
            return bad;
        }

        if (!string.Equals(manifest.ReadoutSha256, readoutSha256, StringComparison.OrdinalIgnoreCase))
        {
            DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error(VectorCodes.OtherReadout, SourceLocation.FileOnly(manifestPath),
                $"these vectors were generated from a readout file with SHA-256 {manifest.ReadoutSha256}, not from {readoutPath} ({readoutSha256}); regenerate them with `coefgen vectors`")]);
            return bad;
        }

        if (VectorHashes.Check(dir, manifest, error) is { } hashFailure)
        {
            return new Verdict(hashFailure, "vector files do not match their manifest");
        }

        var expectedPath = Path.Combine(dir, VectorFileNames.ExpectedDecimal);
        if (Read(expectedPath, error) is not { } expectedText)
        {
            return bad;
        }

        var (expected, expectedAcc, expectedProblems) = ExpectedOutputs.ParseWithAccumulators(expectedText, expectedPath, manifest.Pixels);
        if (expected is null || expectedAcc is null)
        {
            DiagnosticPrinter.PrintFailure(error, expectedProblems);
            return bad;
        }

        if (Read(dumpPath, error) is not { } dumpText)
        {
            return bad;
        }

        var dump = DumpReader.Parse(dumpText, dumpPath, manifest.OutputBits, manifest.AccBits, wanted);
        if (dump.Values is null)
        {
            DiagnosticPrinter.PrintFailure(error, dump.Diagnostics);
            return bad;
        }

        if (requireAcc && dump.Accumulators is null)
        {
            DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error(VectorCodes.DumpNoAccumulator, SourceLocation.FileOnly(dumpPath),
                manifest.AccBits == 0
                    ? "--acc needs the accumulator width, which this manifest does not list; regenerate the vectors"
                    : $"--acc: every line must hold the output and then the final {manifest.AccBits}-bit accumulator, in the dump's format")]);
            return bad;
        }

        if (dump.Values.Count != expected.Count)
        {
            DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error(VectorCodes.DumpCount, SourceLocation.FileOnly(dumpPath),
                $"{dump.Values.Count} values, but the vectors hold {expected.Count} pixels (one value per pixel, in pixel order)")]);
            return bad;
        }

        var outputs = OutputComparison.Compare(expected, dump.Values);
        var accComparison = dump.Accumulators is null ? null : OutputComparison.Compare(expectedAcc, dump.Accumulators);
        var code = Report(outputs, accComparison, dump.Format, manifest, output);
        var compared = accComparison is null ? "outputs" : "outputs and accumulators";
        var summary = code == ExitCodes.Ok
            ? string.Create(CultureInfo.InvariantCulture, $"match, {outputs.Compared} pixels ({compared})")
            : string.Create(CultureInfo.InvariantCulture,
                $"MISMATCH, {outputs.Mismatches.Count} outputs{(accComparison is null ? "" : $" and {accComparison.Mismatches.Count} accumulators")} of {outputs.Compared} pixels differ");
        return new Verdict(code, summary);
    }

    private static int Report(OutputComparison c, OutputComparison? accumulators, DumpFormat format, VectorManifest manifest, TextWriter output)
    {
        var word = DumpReader.Word(format);
        var what = accumulators is null ? "outputs only: the dump has no accumulator column" : $"outputs and {manifest.AccBits}-bit accumulators";
        output.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"compared {c.Compared} pixels ({word} dump, {what}; {manifest.OutputBits}-bit output, 1 LSB = 2^-{manifest.OutputFracBits} ADU)"));
        if (c.Matches && (accumulators?.Matches ?? true))
        {
            output.WriteLine(accumulators is null ? "match: every output equals the bit-exact model" : "match: every output and accumulator equals the bit-exact model");
            BranchCoverage.Print(manifest, output);
            return ExitCodes.Ok;
        }

        if (c.Matches)
        {
            output.WriteLine("every output matches");
        }
        else
        {
            PrintMismatches("output", c, output);
        }

        if (accumulators is { Matches: false })
        {
            PrintMismatches("accumulator", accumulators, output);
        }

        return ExitCodes.Difference;
    }

    private static void PrintMismatches(string what, OutputComparison c, TextWriter output)
    {
        output.WriteLine(string.Create(CultureInfo.InvariantCulture, $"MISMATCH in {c.Mismatches.Count} of {c.Compared} pixels ({what})"));
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
