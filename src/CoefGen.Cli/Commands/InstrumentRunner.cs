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
        try
        {
            return InstrumentLoader.IsInstrument(File.ReadAllBytes(path));
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            return false;
        }
    }

    /// <summary>Designs every table; on bad input prints the diagnostics and returns null.</summary>
    public static InstrumentDesign? TryRun(string path, TextWriter error) => TryRun(path, File.ReadAllBytes(path), error, null);

    /// <summary>As <see cref="TryRun(string, TextWriter)"/> from given bytes; <paramref name="readBase"/> replaces reading the base from disk (a git revision).</summary>
    public static InstrumentDesign? TryRun(string path, byte[] content, TextWriter error, Func<string, byte[]?>? readBase)
    {
        var load = InstrumentLoader.Load(content, path);
        if (load.Spec is not InstrumentSpec spec)
        {
            DiagnosticPrinter.PrintFailure(error, load.Diagnostics);
            return null;
        }

        DiagnosticPrinter.Print(error, load.Diagnostics);
        var dir = Path.GetDirectoryName(path) ?? "";
        var basePath = Path.Combine(dir, spec.BasePath);
        var baseBytes = readBase is null ? TryRead(basePath) : readBase(basePath);
        if (baseBytes is null)
        {
            DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error(InstrumentCodes.BaseUnreadable, spec.BaseLocation, $"cannot read the base readout file '{spec.BasePath}'", "base")]);
            return null;
        }

        var baseDir = Path.GetDirectoryName(Path.GetFullPath(basePath)) ?? ".";
        try
        {
            var design = InstrumentDesigner.Design(spec, baseBytes, basePath, rel => readBase is null ? TryRead(Path.Combine(baseDir, rel)) : readBase(Path.Combine(Path.GetDirectoryName(basePath) ?? "", rel)), InputFiles.LoadTargets());
            DiagnosticPrinter.Print(error, design.Warnings);
            return design;
        }
        catch (InputException ex)
        {
            DiagnosticPrinter.PrintFailure(error, ex.Diagnostics);
            return null;
        }
    }

    private static byte[]? TryRead(string path)
    {
        try
        {
            return File.ReadAllBytes(path);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            return null;
        }
    }
}
