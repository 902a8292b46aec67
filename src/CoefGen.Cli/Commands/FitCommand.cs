using System.CommandLine;
using CoefGen.Cli.Io;
using CoefGen.Cli.Output;
using CoefGen.Core.Capture;
using CoefGen.Core.Diagnostics;

namespace CoefGen.Cli.Commands;

/// <summary>`coefgen fit CAPTURE --readout FILE [--out DIR] [--json]`: spectrum, model fit and held-out comparison from a capture.</summary>
internal static class FitCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var capture = new Argument<FileInfo>("capture") { Description = "Idle samples: CSV (one pixel cycle per row, or one code per line with --stream) or raw little-endian .i16/.i32." };
        var readout = new Option<FileInfo>("--readout") { Description = "The readout file of the channel (ADC, timing, weights).", Required = true };
        var outDir = new Option<DirectoryInfo?>("--out") { Description = "Write fit_spectrum.csv, fit_spectrum.svg and (pixel cycles) fit_weights.csv here." };
        var json = new Option<bool>("--json") { Description = "Print one JSON document (schema coefgen.fit/1) instead of the summary." };
        var stream = new Option<bool>("--stream") { Description = "The capture is one continuous stream of idle samples, not pixel cycles." };
        var format = new Option<string?>("--format") { Description = "csv, raw16 or raw32 (default: from the extension; .i16/.raw16 and .i32/.raw32 are raw)." };
        var segment = new Option<int?>("--segment") { Description = "Welch segment length, a power of two (default: about 15 segments)." };
        var fixPole = new Option<bool>("--fix-pole") { Description = "Hold the pole at noise.front_end_pole_hz instead of fitting it." };
        var cmd = new Command(
            "fit",
            "Estimate the noise spectrum of a capture (Welch, with confidence bands), fit white + 1/f + pole on the log " +
            "spectrum, print the values with uncertainties and a ready-to-paste [noise] section, and for pixel cycles compare " +
            "boxcar, weighted and both optimal schemes on held-out cycles. Exit 2 on bad input.")
        {
            capture, readout, outDir, json, stream, format, segment, fixPole,
        };
        cmd.SetAction(parse => Run(
            parse.GetRequiredValue(capture).ToString(), parse.GetRequiredValue(readout).ToString(), parse.GetValue(outDir)?.ToString(),
            parse.GetValue(json), parse.GetValue(stream), parse.GetValue(format), parse.GetValue(segment), parse.GetValue(fixPole), output, error));
        return cmd;
    }

    private static int Run(string capturePath, string readoutPath, string? outDir, bool json, bool stream, string? format, int? segment, bool fixPole, TextWriter output, TextWriter error)
    {
        var load = InputFiles.LoadReadout(readoutPath);
        if (load.Description is null || load.Diagnostics.Any(d => d.Severity == Severity.Error))
        {
            return DiagnosticPrinter.PrintFailure(error, load.Diagnostics);
        }

        var d = load.Description;
        var file = SourceLocation.FileOnly(capturePath);
        CaptureEncoding encoding;
        switch (format)
        {
            case null: encoding = CaptureFormat.EncodingFromFileName(capturePath); break;
            case "csv": encoding = CaptureEncoding.Csv; break;
            case "raw16": encoding = CaptureEncoding.Raw16; break;
            case "raw32": encoding = CaptureEncoding.Raw32; break;
            default:
                return DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error(CaptureCodes.WrongLayout, SourceLocation.FileOnly("--format"), $"'{SafeText.Excerpt(format)}' is not allowed; allowed: csv, raw16, raw32")]);
        }

        if (segment is int l && (l < 64 || (l & (l - 1)) != 0))
        {
            return DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error(CaptureCodes.TooFewSamples, SourceLocation.FileOnly("--segment"), $"--segment {l} must be a power of two >= 64")]);
        }

        if (InputFile.TryRead(capturePath, "capture", InputFile.CaptureLimit, file, CaptureCodes.Unreadable, null, out var problem) is not { } bytes)
        {
            return DiagnosticPrinter.PrintFailure(error, [problem!]);
        }

        var layout = stream ? CaptureLayout.Stream : CaptureLayout.PixelSynchronous;
        var parsed = CaptureParser.Parse(bytes, capturePath, new CaptureFormat(encoding, layout, d.Timing.PixelSamples), d.Adc);
        if (parsed.Capture is null)
        {
            return DiagnosticPrinter.PrintFailure(error, parsed.Diagnostics);
        }

        CaptureAnalysisResult analysis;
        try
        {
            analysis = CaptureAnalysis.Run(d, parsed.Capture, new CaptureAnalysisOptions(segment, fixPole));
        }
        catch (InputException ex)
        {
            return DiagnosticPrinter.PrintFailure(error, ex.Diagnostics);
        }

        DiagnosticPrinter.Print(error, analysis.Warnings);
        if (outDir is not null)
        {
            using var batch = new OutputBatch();
            batch.Add(outDir, "--out", "fit_spectrum.csv", Utf8Text.Encode(FitFiles.SpectrumCsv(analysis)), "--out");
            batch.Add(outDir, "--out", "fit_spectrum.svg", Utf8Text.Encode(FitFiles.SpectrumSvg(analysis)), "--out");
            if (analysis.Validation.Count > 0)
            {
                batch.Add(outDir, "--out", "fit_weights.csv", Utf8Text.Encode(FitFiles.WeightsCsv(analysis)), "--out");
            }

            if (batch.Commit(error) is null)
            {
                return ExitCodes.BadInput;
            }
        }

        output.Write(json ? FitJson.Render(d, analysis) : FitText.Render(d, analysis));
        return ExitCodes.Ok;
    }
}
