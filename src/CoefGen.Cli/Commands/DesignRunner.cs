using CoefGen.Cli.Io;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Pipeline;

namespace CoefGen.Cli.Commands;

/// <summary>Shared by every command that starts from a readout file: load, validate, run the pipeline.</summary>
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
            DiagnosticPrinter.Print(error, result.Warnings);
            return result;
        }
        catch (InputException ex)
        {
            DiagnosticPrinter.PrintFailure(error, ex.Diagnostics);
            return null;
        }
    }
}
