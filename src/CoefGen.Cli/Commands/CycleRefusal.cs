using CoefGen.Cli.Io;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout;

namespace CoefGen.Cli.Commands;

/// <summary>
/// A stage asked for something a general cycle does not have (the sweep's window searches on a cycle with no read count
/// and no pedestal/signal read, or the split of a ramp) refuses with a located error instead of writing something wrong.
/// </summary>
internal static class CycleRefusal
{
    /// <summary>CG1255 at timing.window with the caller's reason; returns the exit code (2).</summary>
    public static int RefuseWith(ReadoutDescription d, string message, TextWriter error)
    {
        DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error(CycleCodes.TwoWindowOnly, d.LocationOf("timing.window"), message, "timing.window")]);
        return ExitCodes.BadInput;
    }
}
