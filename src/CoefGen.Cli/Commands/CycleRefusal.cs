using CoefGen.Cli.Io;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout;

namespace CoefGen.Cli.Commands;

/// <summary>
/// The stages that still take only the classic two-window cycle (the sweep's window searches; `fit` and noise.capture
/// take a cycle since issue 11) refuse a general cycle with a located error instead of writing something wrong.
/// </summary>
internal static class CycleRefusal
{
    /// <summary>True (after printing CG1255) when <paramref name="d"/> has a general cycle.</summary>
    public static bool Refuse(ReadoutDescription d, string what, TextWriter error)
    {
        if (d.Timing.Cycle.IsClassic)
        {
            return false;
        }

        DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error(CycleCodes.TwoWindowOnly, d.LocationOf("timing.window"),
            $"{what} takes the classic two-window cycle ([timing.reset] and [timing.signal]) only; this file lists {d.Timing.Cycle.Windows.Count} windows ([[timing.window]]). `coefgen design` designs, predicts and proves the integer weights of a general cycle", "timing.window")]);
        return true;
    }
}
