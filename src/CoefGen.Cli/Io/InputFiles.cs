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
        byte[] content;
        try
        {
            content = File.ReadAllBytes(path);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            var reason = ex is FileNotFoundException or DirectoryNotFoundException ? "file not found" : ex.Message;
            return new LoadResult(null, [Diagnostic.Error("CG0002", SourceLocation.FileOnly(path), $"cannot read the readout file: {reason}")]);
        }

        var baseDir = Path.GetDirectoryName(Path.GetFullPath(path)) ?? ".";
        return ReadoutLoader.Load(content, path, relative => ReadRelative(baseDir, relative));
    }

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

    private static byte[]? ReadRelative(string baseDir, string relative)
    {
        try
        {
            return File.ReadAllBytes(Path.Combine(baseDir, relative));
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException or ArgumentException or NotSupportedException)
        {
            return null;
        }
    }
}
