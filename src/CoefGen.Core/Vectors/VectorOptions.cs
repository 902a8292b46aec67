namespace CoefGen.Core.Vectors;

/// <summary>What to generate: how many pixel cycles, from which seed.</summary>
/// <param name="Pixels">Pixel cycles (at least 1); the edge cases come first, so small counts still hold them.</param>
/// <param name="Seed">PRNG seed; the same seed and readout give the same bytes.</param>
public sealed record VectorOptions(int Pixels = VectorOptions.DefaultPixels, ulong Seed = VectorOptions.DefaultSeed)
{
    public const int DefaultPixels = 1000;

    public const ulong DefaultSeed = 1;

    /// <summary>Largest pixel count accepted (keeps the files below a few hundred MB).</summary>
    public const int MaxPixels = 1_000_000;
}
