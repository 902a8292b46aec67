namespace CoefGen.Core.Capture;

/// <summary>How the capture bytes encode ADC codes.</summary>
public enum CaptureEncoding
{
    /// <summary>UTF-8 text, one row per line, codes separated by commas (a stream has one code per line).</summary>
    Csv,

    /// <summary>Raw little-endian signed 16-bit codes.</summary>
    Raw16,

    /// <summary>Raw little-endian signed 32-bit codes.</summary>
    Raw32,
}
