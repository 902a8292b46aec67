namespace CoefGen.Core.FixedPoint;

/// <summary>What the accumulator does when a running sum leaves its width.</summary>
public enum AccumulatorMode
{
    /// <summary>Two's-complement wrap-around (addition mod 2^M): safe when the final value fits.</summary>
    Wrap,

    /// <summary>Clamps every partial sum: safe only when every partial sum fits.</summary>
    Saturate,
}
