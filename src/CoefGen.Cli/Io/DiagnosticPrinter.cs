using System.Globalization;
using CoefGen.Core.Diagnostics;

namespace CoefGen.Cli.Io;

/// <summary>
/// Prints diagnostics one per line, errors and warnings, in the order found. At most <see cref="MaxShown"/> are
/// printed, then "N more not shown"; every line is escaped and capped (<see cref="SafeText"/>), so no input can
/// flood or garble the terminal.
/// </summary>
internal static class DiagnosticPrinter
{
    /// <summary>Diagnostics printed before the rest are only counted.</summary>
    public const int MaxShown = 50;

    /// <summary>Longest printed diagnostic line.</summary>
    public const int MaxLineLength = 600;

    public static void Print(TextWriter error, IEnumerable<Diagnostic> diagnostics)
    {
        var count = 0;
        foreach (var d in diagnostics)
        {
            if (count++ < MaxShown)
            {
                error.WriteLine(SafeText.Excerpt(d.ToString(), MaxLineLength));
            }
        }

        if (count > MaxShown)
        {
            error.WriteLine(string.Create(CultureInfo.InvariantCulture, $"... {count - MaxShown} more not shown."));
        }
    }

    public static int PrintFailure(TextWriter error, IReadOnlyList<Diagnostic> diagnostics)
    {
        Print(error, diagnostics);
        var errors = diagnostics.Count(d => d.Severity == Severity.Error);
        error.WriteLine(errors == 1 ? "1 error." : string.Create(CultureInfo.InvariantCulture, $"{errors} errors."));
        return ExitCodes.BadInput;
    }

    /// <summary>One error, printed as a failure (exit 2).</summary>
    public static int Fail(TextWriter error, string code, string location, string message) =>
        PrintFailure(error, [Diagnostic.Error(code, SourceLocation.FileOnly(location), message)]);
}
