using CoefGen.Core.Pipeline;
using CoefGen.Core.Tests.Vectors;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>fast_imaging with normalize = "exact" and truncation: a design with a real post-multiplier.</summary>
public static class PostMultiplierExample
{
    public static DesignResult FastExactTruncate()
    {
        var toml = File.ReadAllText(ExampleDesigns.ExamplePath("fast_imaging.toml"))
            .Replace("rounding = \"half-even\"", "rounding = \"truncate\"\nnormalize = \"exact\"", StringComparison.Ordinal);
        var r = ExampleDesigns.FromText(toml, "fast_exact.toml");
        Assert.True(r.Datapath.PostMultiplierBits > 0);
        return r;
    }
}
