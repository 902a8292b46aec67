namespace CoefGen.Cli.Io;

/// <summary>
/// The path with every symbolic link resolved, segment by segment (what the file system will really open),
/// for the parts that exist; missing trailing segments are appended as written.
/// </summary>
internal static class RealPath
{
    private const int MaxLinks = 40;

    public static string Of(string path)
    {
        var links = 0;
        return Resolve(Path.GetFullPath(path), ref links);
    }

    /// <summary>True when <paramref name="path"/> is <paramref name="folder"/> or inside it (both already resolved).</summary>
    public static bool IsInside(string path, string folder)
    {
        var comparison = OperatingSystem.IsLinux() ? StringComparison.Ordinal : StringComparison.OrdinalIgnoreCase;
        var root = Path.TrimEndingDirectorySeparator(folder);
        return string.Equals(path, root, comparison) || path.StartsWith(root + Path.DirectorySeparatorChar, comparison);
    }

    private static string Resolve(string full, ref int links)
    {
        var root = Path.GetPathRoot(full) ?? "/";
        var current = root;
        var segments = full[root.Length..].Split(Path.DirectorySeparatorChar, StringSplitOptions.RemoveEmptyEntries);
        for (var i = 0; i < segments.Length; i++)
        {
            var next = Path.Combine(current, segments[i]);
            var info = new FileInfo(next);
            if (info.LinkTarget is string target && links++ < MaxLinks)
            {
                var resolved = Path.GetFullPath(Path.IsPathRooted(target) ? target : Path.Combine(current, target));
                current = Resolve(resolved, ref links);
                continue;
            }

            if (!info.Exists && !Directory.Exists(next))
            {
                return Path.Combine([current, .. segments[i..]]);
            }

            current = next;
        }

        return current;
    }
}
