using CoefGen.Core.Diagnostics;

namespace CoefGen.Cli.Io;

/// <summary>Prints diagnostics one per line, errors and warnings, in the order found.</summary>
internal static class DiagnosticPrinter
{
    public static void Print(TextWriter error, IEnumerable<Diagnostic> diagnostics)
    {
        foreach (var d in diagnostics)
        {
            error.WriteLine(d.ToString());
        }
    }

    public static int PrintFailure(TextWriter error, IReadOnlyList<Diagnostic> diagnostics)
    {
        Print(error, diagnostics);
        var errors = diagnostics.Count(d => d.Severity == Severity.Error);
        error.WriteLine(errors == 1 ? "1 error." : $"{errors} errors.");
        return ExitCodes.BadInput;
    }
}
