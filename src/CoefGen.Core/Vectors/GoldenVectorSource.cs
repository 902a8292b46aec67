using System.Diagnostics.CodeAnalysis;

namespace CoefGen.Core.Vectors;

/// <summary>
/// Golden vectors whose pixels are produced while they are enumerated (once): what the file writer streams to
/// disk so that memory does not depend on the pixel count.
/// </summary>
public sealed record GoldenVectorSource : GoldenVectorInfo
{
    [SetsRequiredMembers]
    public GoldenVectorSource(GoldenVectorInfo info, IEnumerable<GoldenPixel> pixels)
        : base(info)
    {
        Pixels = pixels;
    }

    public required IEnumerable<GoldenPixel> Pixels { get; init; }
}
