namespace CoefGen.Core.Emit;

/// <summary>
/// Output paths are relative to the output folder and must stay inside it. Refused: empty paths, absolute
/// paths, drive letters or any ':', backslashes (so a path means the same on every OS), "." or ".."
/// segments, empty segments. The accepted form uses '/' separators.
/// </summary>
public static class OutputPathPolicy
{
    /// <summary>Null when <paramref name="path"/> is acceptable, otherwise why not.</summary>
    public static string? Check(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        if (path.Length == 0)
        {
            return "the output path is empty";
        }

        if (path.Contains('\\', StringComparison.Ordinal))
        {
            return "the output path uses a backslash; use '/'";
        }

        if (path.Contains(':', StringComparison.Ordinal))
        {
            return "the output path has a drive letter or ':'";
        }

        if (path.StartsWith('/') || Path.IsPathRooted(path))
        {
            return "the output path is absolute; give it relative to the output folder";
        }

        foreach (var segment in path.Split('/'))
        {
            if (segment is "" or "." or "..")
            {
                return $"the output path has a '{segment}' segment; it must stay inside the output folder";
            }

            if (segment.Any(c => char.IsControl(c)))
            {
                return "the output path contains a control character";
            }
        }

        return null;
    }
}
