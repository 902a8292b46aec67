using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;

namespace CoefGen.Benchmarks;

/// <summary>The repository's examples/ and targets/, found by walking up from the binary to CoefGen.sln.</summary>
public static class RepoFiles
{
    public static string Root { get; } = FindRoot();

    public static string Examples => Path.Combine(Root, "examples");

    /// <summary>File names of examples/*.toml, ordinal order.</summary>
    public static IReadOnlyList<string> ExampleNames() =>
        [.. Directory.GetFiles(Examples, "*.toml").Select(f => Path.GetFileName(f)).Order(StringComparer.Ordinal)];

    public static TargetCatalog Targets() => TargetCatalog.Create(
        Directory.GetFiles(Path.Combine(Root, "targets"), "*.toml").Order(StringComparer.Ordinal)
            .Select(f => (Path.GetFileNameWithoutExtension(f), File.ReadAllBytes(f), Path.Combine("targets", Path.GetFileName(f)))));

    /// <summary>Loads one example as the CLI does (files it names resolve next to it); throws on load errors.</summary>
    public static ReadoutDescription LoadExample(string name) =>
        Load(File.ReadAllBytes(Path.Combine(Examples, name)), Path.Combine("examples", name), relative =>
        {
            var path = Path.Combine(Examples, relative);
            return File.Exists(path) ? File.ReadAllBytes(path) : null;
        });

    public static ReadoutDescription Load(byte[] content, string sourcePath, Func<string, byte[]?> readRelative)
    {
        var result = ReadoutLoader.Load(content, sourcePath, readRelative);
        return result.Description ?? throw new InvalidOperationException(
            $"{sourcePath} does not load:\n" + string.Join("\n", result.Diagnostics));
    }

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
