using CoefGen.Core.FixedPoint;

namespace CoefGen.Core.Vectors;

/// <summary>One pixel cycle of stimulus and what the datapath must produce for it.</summary>
/// <param name="Kind">One of <see cref="PixelKind"/>.</param>
/// <param name="ChargeAdu">Charge step at the ADC input in ADU (settled level minus baseline).</param>
/// <param name="Codes">Every sample of the cycle as the ADC writes it (PixelSamples codes, the readout's coding).</param>
/// <param name="Expected">The bit-exact model's accumulator and output for these codes.</param>
public sealed record GoldenPixel(string Kind, double ChargeAdu, IReadOnlyList<long> Codes, BitExactResult Expected)
{
    /// <summary>Two-stage datapath only: the rounded first sum r_j of every read (the intermediate between the stages); null otherwise.</summary>
    public IReadOnlyList<long>? ReadSums { get; init; }
}
