using System.CommandLine;
using CoefGen.Cli.Io;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Pipeline;

namespace CoefGen.Cli.Commands;

/// <summary>What commands that write firmware artefacts do when the width proof says the datapath can overflow.</summary>
internal static class UnsafeDesign
{
    /// <summary>The located diagnostic naming every failed check and the proof's advice.</summary>
    public static Diagnostic Describe(DesignResult r, bool asError)
    {
        var failed = r.Proof.Checks.Where(c => c.Required && !c.Fits)
            .Select(c => $"{CheckLabel.Of(c.Name)} needs {c.RequiredBits} bits, has {c.AvailableBits}");
        var advice = r.Proof.Advice.Count > 0 ? " Change: " + string.Join(" ", r.Proof.Advice.Select(a => a.TrimEnd().EndsWith('.') ? a.TrimEnd() : a.TrimEnd() + ".")) : "";
        var message = $"the integer design is NOT SAFE for every input in the ADC range ({string.Join("; ", failed)}).{advice}";
        var location = r.Description.LocationOf("fixed_point");
        return asError
            ? Diagnostic.Error("CG2020", location, message + " Nothing was written; pass --allow-unsafe to write it anyway.")
            : Diagnostic.Warning("CG2020", location, message);
    }

    /// <summary>Prints the refusal and returns the exit code, or null when the design is safe or unsafe output is allowed.</summary>
    public static int? Refuse(DesignResult r, bool allowUnsafe, TextWriter error)
    {
        if (r.Proof.Safe)
        {
            return null;
        }

        if (allowUnsafe)
        {
            DiagnosticPrinter.Print(error, [Describe(r, asError: false)]);
            return null;
        }

        return DiagnosticPrinter.PrintFailure(error, [Describe(r, asError: true)]);
    }

    /// <summary>`--require-safe` of design and report: exit 1 after the output when the proof rejects the design.</summary>
    public static Option<bool> RequireSafeOption() =>
        new("--require-safe") { Description = "Exit 1 (after writing the output) when the width proof says the integer datapath can overflow." };

    /// <summary>With --require-safe and an unsafe design: prints CG2020 as an error and returns 1; otherwise null.</summary>
    public static int? RequireSafe(DesignResult r, bool required, TextWriter error)
    {
        if (!required || r.Proof.Safe)
        {
            return null;
        }

        var d = Describe(r, asError: false);
        DiagnosticPrinter.Print(error, [Diagnostic.Error(d.Code, d.Location, d.Message + " (--require-safe)")]);
        return ExitCodes.Difference;
    }
}
