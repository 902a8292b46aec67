namespace CoefGen.Core.Vectors;

/// <summary>One pixel whose DUT output differs; <see cref="DifferenceLsb"/> = got - expected in output LSB.</summary>
public sealed record OutputMismatch(int Pixel, long Expected, long Got)
{
    public System.Numerics.BigInteger DifferenceLsb => (System.Numerics.BigInteger)Got - Expected;
}
