using CoefGen.Cli.Io;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Instrument;

namespace CoefGen.Cli.Commands;

/// <summary>Shared by the commands that accept an instrument file: detect it, load it and its base, design every table.</summary>
internal static class InstrumentRunner
{
    /// <summary>True when <paramref name="path"/> is a readable instrument file (a top-level `base` key) rather than a readout file.</summary>
    public static bool IsInstrument(string path)
    {
        return TryRead(path) is byte[] content && InstrumentLoader.IsInstrument(content);
    }

    /// <summary>Designs every table; on bad input prints the diagnostics and returns null.</summary>
    public static InstrumentDesign? TryRun(string path, TextWriter error) => TryRun(path, TryRead, error);

    /// <summary>As <see cref="TryRun(string, TextWriter)"/> reading every file (instrument, base, files the base names) through <paramref name="read"/> (e.g. a git revision).</summary>
    public static InstrumentDesign? TryRun(string path, Func<string, byte[]?> read, TextWriter error, bool frequencyCheck = true)
    {
        var content = read(path);
        if (content is null)
        {
            DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error("CG0002", SourceLocation.FileOnly(path), "cannot read the instrument file")]);
            return null;
        }

        var load = InstrumentLoader.Load(content, path);
        if (load.Spec is not InstrumentSpec spec)
        {
            DiagnosticPrinter.PrintFailure(error, load.Diagnostics);
            return null;
        }

        DiagnosticPrinter.Print(error, load.Diagnostics);
        var basePath = Path.Combine(Path.GetDirectoryName(path) ?? "", spec.BasePath);
        var baseBytes = read(basePath);
        if (baseBytes is null)
        {
            DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error(InstrumentCodes.BaseUnreadable, spec.BaseLocation, $"cannot read the base readout file '{spec.BasePath}'", "base")]);
            return null;
        }

        var baseDir = Path.GetDirectoryName(basePath) ?? "";
        try
        {
            var design = InstrumentDesigner.Design(spec, baseBytes, basePath, rel => read(Path.Combine(baseDir, rel)), InputFiles.LoadTargets(), frequencyCheck);
            DiagnosticPrinter.Print(error, design.Warnings);
            return design;
        }
        catch (InputException ex)
        {
            DiagnosticPrinter.PrintFailure(error, ex.Diagnostics);
            return null;
        }
    }

    /// <summary>The file's bytes, or null when it cannot be read.</summary>
    public static byte[]? TryRead(string path) => InputFile.TryRead(path, "input file", InputFile.ReadoutLimit, out _, out _);
}
