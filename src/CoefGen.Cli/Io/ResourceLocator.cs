namespace CoefGen.Cli.Io;

/// <summary>
/// Finds the built-in templates/ and targets/ folders: next to the executable (the build and the
/// .NET tool package copy them there), else in the source tree above it (running from a checkout).
/// </summary>
internal static class ResourceLocator
{
    public static string TemplatesDir => Find("templates");

    public static string TargetsDir => Find("targets");

    private static string Find(string name)
    {
        var beside = Path.Combine(AppContext.BaseDirectory, name);
        if (Directory.Exists(beside))
        {
            return beside;
        }

        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            var candidate = Path.Combine(dir.FullName, name);
            if (File.Exists(Path.Combine(dir.FullName, "CoefGen.sln")) && Directory.Exists(candidate))
            {
                return candidate;
            }
        }

        return beside;
    }
}
