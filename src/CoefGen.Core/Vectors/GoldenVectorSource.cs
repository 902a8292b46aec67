using CoefGen.Core.FixedPoint;

namespace CoefGen.Core.Vectors;

/// <summary>
/// Golden vectors whose pixels are produced while they are enumerated (once): what the file writer streams to
/// disk so that memory does not depend on the pixel count. The other members describe the whole set.
/// </summary>
public sealed record GoldenVectorSource
{
    public required IntegerDesign Design { get; init; }

    public required ulong Seed { get; init; }

    public required string ReadoutFileName { get; init; }

    public required string ReadoutSha256 { get; init; }

    public required double BaselineAdu { get; init; }

    public required double FullScaleChargeAdu { get; init; }

    public required double AduPerElectron { get; init; }

    public required double AddedConstantV2 { get; init; }

    public required double DiagonalLoadingV2 { get; init; }

    public required IReadOnlyList<(string Target, string Reason)> UnreachedBranches { get; init; }

    /// <summary>How many pixels <see cref="Pixels"/> yields.</summary>
    public required int PixelCount { get; init; }

    public required IEnumerable<GoldenPixel> Pixels { get; init; }
}
