namespace CoefGen.Core.Capture;

/// <summary>What a capture file holds and how to read it.</summary>
/// <param name="Encoding">Text or raw integers.</param>
/// <param name="Layout">Pixel cycles or one stream.</param>
/// <param name="CycleLength">Samples per pixel cycle (the readout's pixel_samples); ignored for a stream.</param>
public sealed record CaptureFormat(CaptureEncoding Encoding, CaptureLayout Layout, int CycleLength)
{
    /// <summary>
    /// The encoding implied by a file name: ".i16" / ".raw16" raw int16, ".i32" / ".raw32" raw int32,
    /// anything else CSV text.
    /// </summary>
    public static CaptureEncoding EncodingFromFileName(string fileName)
    {
        ArgumentNullException.ThrowIfNull(fileName);
        var ext = Path.GetExtension(fileName).ToUpperInvariant();
        return ext switch
        {
            ".I16" or ".RAW16" => CaptureEncoding.Raw16,
            ".I32" or ".RAW32" => CaptureEncoding.Raw32,
            _ => CaptureEncoding.Csv,
        };
    }
}
