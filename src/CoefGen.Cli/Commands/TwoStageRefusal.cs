using CoefGen.Cli.Io;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;

namespace CoefGen.Cli.Commands;

/// <summary>Verbs that take the full-table datapath only refuse form = "two-stage" with a located error instead of writing something wrong.</summary>
internal static class TwoStageRefusal
{
    /// <summary>True (after printing CG1274) when <paramref name="r"/>'s datapath is the two-stage form.</summary>
    public static bool Refuse(DesignResult r, string what, TextWriter error)
    {
        if (!r.IsTwoStage)
        {
            return false;
        }

        DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error(TwoStageCodes.FullTableOnly, r.Description.LocationOf("weights.form"),
            $"{what} takes the full-table datapath only; this file sets form = \"two-stage\". `coefgen design` designs, quantises and proves the two-stage datapath; remove form = \"two-stage\" for {what}", "weights.form")]);
        return true;
    }
}
