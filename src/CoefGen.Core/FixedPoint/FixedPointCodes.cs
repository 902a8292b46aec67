namespace CoefGen.Core.FixedPoint;

/// <summary>Stable diagnostic codes of the fixed-point stage (CG2xxx: arithmetic). Tests assert on these.</summary>
public static class FixedPointCodes
{
    /// <summary>The readout names a target profile that is not in the catalog.</summary>
    public const string UnknownTarget = "CG2001";

    /// <summary>The coefficient width cannot hold one sample's weight (fewer than 2 signed bits, or none left for the scale).</summary>
    public const string CoefficientTooNarrow = "CG2002";

    /// <summary>The accumulator is narrower than one full-width product.</summary>
    public const string AccumulatorNarrowerThanProduct = "CG2003";

    /// <summary>The ADC codes do not fit the multiplier's sample operand.</summary>
    public const string AdcWiderThanSampleOperand = "CG2004";

    /// <summary>More weighted samples than the target stores coefficients for.</summary>
    public const string TooManyCoefficients = "CG2005";

    /// <summary>A width outside what the target or the model allows.</summary>
    public const string BadWidth = "CG2006";

    /// <summary>An unknown mode name (normalize, rounding, accumulator).</summary>
    public const string BadMode = "CG2007";

    /// <summary>A target profile file is not valid TOML or not valid UTF-8.</summary>
    public const string ProfileSyntax = "CG2010";

    /// <summary>A target profile key is missing, of the wrong type or out of range.</summary>
    public const string ProfileBadValue = "CG2011";

    /// <summary>A target profile has a key this schema does not know.</summary>
    public const string ProfileUnknownKey = "CG2012";

    /// <summary>A target profile's name differs from its file name, or two profiles share a name.</summary>
    public const string ProfileNameMismatch = "CG2013";

    /// <summary>A weight, prediction or datapath figure of the design is not a finite number.</summary>
    public const string NotFinite = "CG2030";

    /// <summary>Warning: the quantised coefficients no longer have the shape of the real weights.</summary>
    public const string ShapeLostInQuantisation = "CG2031";

    /// <summary>No coefficient scale fits the weights into the coefficient width.</summary>
    public const string NoCoefficientScale = "CG2032";
}
