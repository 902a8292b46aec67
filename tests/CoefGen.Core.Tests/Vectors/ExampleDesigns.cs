using System.Collections.Concurrent;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;
using CoefGen.Core.Tests.Emit;

namespace CoefGen.Core.Tests.Vectors;

/// <summary>Shipped examples (and edited copies) run through the whole pipeline, cached per text.</summary>
public static class ExampleDesigns
{
    private static readonly ConcurrentDictionary<string, DesignResult> Cache = new();

    private static readonly Lazy<TargetCatalog> LazyCatalog = new(() => TargetCatalog.Create(
        Directory.GetFiles(Path.Combine(RepoPaths.Root, "targets"), "*.toml").Order(StringComparer.Ordinal)
            .Select(f => (Path.GetFileNameWithoutExtension(f), File.ReadAllBytes(f)))));

    /// <summary>The shipped target profiles.</summary>
    public static TargetCatalog Catalog => LazyCatalog.Value;

    public static string ExamplePath(string example) => Path.Combine(RepoPaths.Root, "examples", example);

    public static DesignResult Load(string example) => FromText(File.ReadAllText(ExamplePath(example)), example);

    /// <summary>Runs an edited copy of an example; files it names resolve in examples/.</summary>
    public static DesignResult FromText(string toml, string name) => Cache.GetOrAdd(name + "\n" + toml, _ =>
    {
        var load = ReadoutLoader.Load(System.Text.Encoding.UTF8.GetBytes(toml), name, rel => File.ReadAllBytes(ExamplePath(rel)));
        Assert.True(load.Description is not null, string.Join("\n", load.Diagnostics));
        return DesignPipeline.Run(load.Description!, Catalog);
    });

    /// <summary>The integer design of another scheme of the same readout, on the same fixed-point settings.</summary>
    public static IntegerDesign DesignFor(DesignResult r, WeightScheme scheme)
    {
        var w = r.Weights.Single(x => x.Scheme == scheme);
        var d = r.Description;
        return FixedPointDesigner.Design(d.Name, r.Grid, w.H, r.Covariance, d.Adc, r.FixedPointSettings, d.Timing.PixelSamples);
    }
}
