namespace CoefGen.Cli.Tests;

/// <summary>Finds files of the checkout (examples/, templates/) from the test binary's folder.</summary>
internal static class RepoPaths
{
    public static string Root { get; } = FindRoot();

    public static string Example(string name) => Path.Combine(Root, "examples", name);

    /// <summary>A fresh folder for one test's files.</summary>
    public static string TempDir() => Directory.CreateTempSubdirectory("coefgen-cli-").FullName;

    private static string FindRoot()
    {
        for (var dir = new DirectoryInfo(AppContext.BaseDirectory); dir is not null; dir = dir.Parent)
        {
            if (File.Exists(Path.Combine(dir.FullName, "CoefGen.sln")))
            {
                return dir.FullName;
            }
        }

        throw new InvalidOperationException("CoefGen.sln not found above " + AppContext.BaseDirectory);
    }
}
