using CoefGen.Core.Diagnostics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;

namespace CoefGen.Cli.Io;

/// <summary>Reads the readout file (and the files it names) and the target profiles for Core.</summary>
internal static class InputFiles
{
    /// <summary>Loads and validates a readout file; a missing or unreadable file is a diagnostic, not an exception.</summary>
    public static LoadResult LoadReadout(string path)
    {
        if (ReadReadoutBytes(path, out var problem) is not { } content)
        {
            return new LoadResult(null, [problem!]);
        }

        var baseDir = Path.GetDirectoryName(Path.GetFullPath(path)) ?? ".";
        return ReadoutLoader.Load(content, path, (string relative, out string? why) => ReadRelative(baseDir, relative, out why));
    }

    /// <summary>The readout file's bytes (a regular file within <see cref="InputFile.ReadoutLimit"/>), or null with the diagnostic.</summary>
    public static byte[]? ReadReadoutBytes(string path, out Diagnostic? problem) =>
        InputFile.TryRead(path, "readout file", InputFile.ReadoutLimit, SourceLocation.FileOnly(path), "CG0002", null, out problem);

    /// <summary>All target profiles shipped with the tool.</summary>
    public static TargetCatalog LoadTargets()
    {
        var dir = ResourceLocator.TargetsDir;
        var files = Directory.Exists(dir)
            ? Directory.GetFiles(dir, "*.toml").OrderBy(f => f, StringComparer.Ordinal)
                .Select(f => (Path.GetFileNameWithoutExtension(f), File.ReadAllBytes(f), Path.Combine("targets", Path.GetFileName(f))))
                .ToArray()
            : [];
        return TargetCatalog.Create(files);
    }

    /// <summary>Resolves a path written inside the readout file against the readout file's folder.</summary>
    public static string ResolveRelative(string readoutPath, string relative)
    {
        var baseDir = Path.GetDirectoryName(Path.GetFullPath(readoutPath)) ?? ".";
        return Path.GetFullPath(Path.Combine(baseDir, relative));
    }

    /// <summary>Reads a file the readout names (psd_table) relative to its folder, within <see cref="InputFile.PsdTableLimit"/>.</summary>
    public static byte[]? ReadRelative(string baseDir, string relative, out string? problem) =>
        InputFile.TryRead(Path.Combine(baseDir, relative), "spectrum table", InputFile.PsdTableLimit, out _, out problem);
}
