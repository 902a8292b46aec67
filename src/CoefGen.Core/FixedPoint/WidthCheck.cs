namespace CoefGen.Core.FixedPoint;

/// <summary>
/// One line of the width proof.
/// </summary>
/// <param name="Name">Stable identifier: "coefficient", "product", "accumulator_final", "accumulator_partial", "post_multiply", "output".</param>
/// <param name="MinValue">Smallest value the quantity can take over all ADC inputs.</param>
/// <param name="MaxValue">Largest value the quantity can take over all ADC inputs.</param>
/// <param name="RequiredBits">Signed bits needed to hold [MinValue, MaxValue].</param>
/// <param name="AvailableBits">Signed bits the target provides.</param>
/// <param name="Required">Whether this check decides safety for the chosen accumulator mode.</param>
/// <param name="WorstCaseCodes">ADC codes (as written by the ADC) of one pixel cycle's weighted samples that reach MaxValue or MinValue, whichever is larger in magnitude; null when not applicable.</param>
public sealed record WidthCheck(
    string Name,
    System.Numerics.BigInteger MinValue,
    System.Numerics.BigInteger MaxValue,
    int RequiredBits,
    int AvailableBits,
    bool Required,
    IReadOnlyList<long>? WorstCaseCodes)
{
    public bool Fits => RequiredBits <= AvailableBits;

    /// <summary>Spare bits (negative when it does not fit).</summary>
    public int MarginBits => AvailableBits - RequiredBits;
}
