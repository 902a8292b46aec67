using CoefGen.Cli.Io;
using CoefGen.Core.Capture;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;

namespace CoefGen.Cli.Commands;

/// <summary>Shared by every command that starts from a readout file: load, validate, run the pipeline, apply a capture.</summary>
internal static class DesignRunner
{
    /// <summary>Runs the design; on bad input prints every diagnostic to <paramref name="error"/> and returns null.</summary>
    public static DesignResult? TryRun(string readoutPath, TextWriter error)
    {
        var load = InputFiles.LoadReadout(readoutPath);
        if (load.Description is null || load.Diagnostics.Any(d => d.Severity == Severity.Error))
        {
            DiagnosticPrinter.PrintFailure(error, load.Diagnostics);
            return null;
        }

        DiagnosticPrinter.Print(error, load.Diagnostics);
        var catalog = InputFiles.LoadTargets();
        try
        {
            var result = DesignPipeline.Run(load.Description, catalog);
            if (load.Description.Noise.CapturePath is string capturePath)
            {
                var capture = LoadCapture(load.Description, readoutPath, capturePath, error);
                if (capture is null)
                {
                    return null;
                }

                result = CaptureDesign.Apply(result, capture);
            }

            DiagnosticPrinter.Print(error, result.Warnings);
            return result;
        }
        catch (InputException ex)
        {
            DiagnosticPrinter.PrintFailure(error, ex.Diagnostics);
            return null;
        }
    }

    private static SampleCapture? LoadCapture(ReadoutDescription d, string readoutPath, string capturePath, TextWriter error)
    {
        var path = InputFiles.ResolveRelative(readoutPath, capturePath);
        if (InputFile.TryRead(path, "capture", InputFile.CaptureLimit, d.LocationOf("noise.capture"), CaptureCodes.Unreadable, "noise.capture", out var problem) is not { } bytes)
        {
            DiagnosticPrinter.PrintFailure(error, [problem!]);
            return null;
        }

        var format = new CaptureFormat(CaptureFormat.EncodingFromFileName(capturePath), CaptureLayout.PixelSynchronous, d.Timing.PixelSamples);
        var parsed = CaptureParser.Parse(bytes, Path.Combine(Path.GetDirectoryName(readoutPath) ?? "", capturePath), format, d.Adc);
        if (parsed.Capture is null)
        {
            DiagnosticPrinter.PrintFailure(error, parsed.Diagnostics);
            return null;
        }

        return parsed.Capture;
    }
}
