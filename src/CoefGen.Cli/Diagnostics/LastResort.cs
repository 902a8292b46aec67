using CoefGen.Cli.Io;
using CoefGen.Core.Diagnostics;

namespace CoefGen.Cli.Diagnostics;

/// <summary>
/// What the shell does with an exception no command turned into a diagnostic: a file-system failure is the
/// environment's (exit 2); anything else is a bug, reported in one line with CG9000 and exit 3. The stack
/// trace is printed only with --debug, so CI logs never carry one by accident.
/// </summary>
internal static class LastResort
{
    public static int Report(Exception ex, bool debug, TextWriter error)
    {
        if (ex is InputException { Diagnostics.Count: > 0 } input)
        {
            return DiagnosticPrinter.PrintFailure(error, input.Diagnostics);
        }

        if (ex is IOException or UnauthorizedAccessException)
        {
            DiagnosticPrinter.Fail(error, CliCodes.FileSystem, "coefgen", $"file system: {ex.Message}");
            PrintTrace(ex, debug, error);
            return ExitCodes.BadInput;
        }

        var what = ex is OutOfMemoryException ? "out of memory" : ex.Message;
        error.WriteLine(SafeText.Excerpt($"coefgen: error {CliCodes.Internal}: internal error: {what}" +
            (debug ? "" : " (this is a bug; rerun with --debug for the details and report it)"), DiagnosticPrinter.MaxLineLength));
        PrintTrace(ex, debug, error);
        return ExitCodes.Internal;
    }

    private static void PrintTrace(Exception ex, bool debug, TextWriter error)
    {
        if (debug)
        {
            error.WriteLine(ex.ToString());
        }
    }
}
