namespace CoefGen.Core.FixedPoint;

/// <summary>Placeholder so the contract compiles; the fixed-point stage replaces it.</summary>
public static class BitExactModel
{
}
