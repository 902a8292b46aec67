namespace CoefGen.Core.Tests.Emit;

/// <summary>Finds the repository from the test binaries (the csproj does not copy templates or golden files).</summary>
public static class RepoPaths
{
    public static string Root { get; } = FindRoot();

    public static string Templates => Path.Combine(Root, "templates");

    public static string Golden => Path.Combine(Root, "tests", "CoefGen.Core.Tests", "Emit", "Golden");

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
