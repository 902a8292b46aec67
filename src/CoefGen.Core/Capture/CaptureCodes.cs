namespace CoefGen.Core.Capture;

/// <summary>Stable diagnostic codes of the capture stage (CG5xxx).</summary>
public static class CaptureCodes
{
    /// <summary>Raw data whose length is not a whole number of samples, or of pixel cycles.</summary>
    public const string Truncated = "CG5001";

    /// <summary>A CSV field that is not an integer ADC code.</summary>
    public const string NotNumeric = "CG5002";

    /// <summary>A CSV row whose number of codes differs from the cycle length.</summary>
    public const string WrongRowLength = "CG5003";

    /// <summary>A code outside the range of the ADC described in the readout file.</summary>
    public const string OutOfRange = "CG5004";

    /// <summary>Too few samples (or pixel cycles) for a spectrum, a covariance or a validation.</summary>
    public const string TooFewSamples = "CG5005";

    /// <summary>The capture file cannot be read (CLI).</summary>
    public const string Unreadable = "CG5006";

    /// <summary>The capture cannot be used as asked (e.g. a stream where pixel cycles are needed).</summary>
    public const string WrongLayout = "CG5007";

    /// <summary>The noise model could not be fitted to the spectrum.</summary>
    public const string FitFailed = "CG5008";

    /// <summary>A general cycle with more weighted samples than the dense capture covariance takes.</summary>
    public const string CycleTooLarge = "CG5009";

    /// <summary>Warning: the capture is quieter than quantisation of a live input allows (a stuck ADC).</summary>
    public const string StuckAdc = "CG5010";

    /// <summary>Warning: a term of the noise model cannot be resolved from the spectrum and is left out of the fit.</summary>
    public const string TermNotResolved = "CG5011";
}
