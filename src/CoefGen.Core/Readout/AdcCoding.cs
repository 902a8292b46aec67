namespace CoefGen.Core.Readout;

/// <summary>How the ADC presents its codes. Internally every code is a signed two's-complement value.</summary>
public enum AdcCoding
{
    /// <summary>Codes run from -2^(B-1) to 2^(B-1)-1.</summary>
    TwosComplement,

    /// <summary>Codes run from 0 to 2^B-1; the model subtracts 2^(B-1) (flips the MSB) before the MAC.</summary>
    OffsetBinary,
}
