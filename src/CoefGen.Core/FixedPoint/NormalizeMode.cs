namespace CoefGen.Core.FixedPoint;

/// <summary>How the unit gain is realised in integers.</summary>
public enum NormalizeMode
{
    /// <summary>Signal-window coefficients sum to 2^P (settled samples): the output is a pure shift.</summary>
    Shift,

    /// <summary>A post-multiplier M and a shift realise an arbitrary gain; its error is reported.</summary>
    Exact,
}
