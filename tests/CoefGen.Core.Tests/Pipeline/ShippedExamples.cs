using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;
using CoefGen.Core.Tests.Emit;

namespace CoefGen.Core.Tests.Pipeline;

/// <summary>The readout files in examples/ and the profiles in targets/, loaded as the CLI loads them.</summary>
public static class ShippedExamples
{
    private static readonly Lazy<TargetCatalog> LazyCatalog = new(() => TargetCatalog.Create(
        Directory.GetFiles(Path.Combine(RepoPaths.Root, "targets"), "*.toml").Order(StringComparer.Ordinal)
            .Select(f => (Path.GetFileNameWithoutExtension(f), File.ReadAllBytes(f), Path.Combine("targets", Path.GetFileName(f))))));

    public static string Folder => Path.Combine(RepoPaths.Root, "examples");

    public static TargetCatalog Catalog => LazyCatalog.Value;

    /// <summary>File names of every examples/*.toml, ordinal order.</summary>
    public static IReadOnlyList<string> Names =>
        [.. Directory.GetFiles(Folder, "*.toml").Select(f => Path.GetFileName(f)).Order(StringComparer.Ordinal)];

    public static TheoryData<string> All() => new(Names);

    /// <summary>Loads one example; files it names resolve next to it. Fails the test on any load error.</summary>
    public static ReadoutDescription Load(string name)
    {
        var path = Path.Combine(Folder, name);
        var result = ReadoutLoader.Load(File.ReadAllBytes(path), Path.Combine("examples", name), ReadRelative);
        Assert.True(result.Description is not null, string.Join("\n", result.Diagnostics));
        return result.Description!;
    }

    private static byte[]? ReadRelative(string relative)
    {
        var path = Path.Combine(Folder, relative);
        return File.Exists(path) ? File.ReadAllBytes(path) : null;
    }
}
