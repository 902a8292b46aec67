using System.Diagnostics.CodeAnalysis;

namespace CoefGen.Core.Vectors;

/// <summary>The generated stimulus and expected results of one readout, in memory, with what is needed to describe them.</summary>
public sealed record GoldenVectorSet : GoldenVectorInfo
{
    [SetsRequiredMembers]
    public GoldenVectorSet(GoldenVectorInfo info, IReadOnlyList<GoldenPixel> pixels)
        : base(info)
    {
        Pixels = pixels;
    }

    public required IReadOnlyList<GoldenPixel> Pixels { get; init; }

    /// <summary>The same vectors as a stream (for the writer).</summary>
    public GoldenVectorSource AsStream() => new(this, Pixels);
}
