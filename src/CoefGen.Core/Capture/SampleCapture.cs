namespace CoefGen.Core.Capture;

/// <summary>
/// A parsed capture: signed codes (offset-binary already converted to two's complement), row-major,
/// <see cref="Rows"/> rows of <see cref="CycleLength"/> codes. A stream is one row per sample
/// internally flattened: <see cref="CycleLength"/> is 1 for a stream.
/// </summary>
public sealed class SampleCapture
{
    public SampleCapture(string sourcePath, CaptureLayout layout, int cycleLength, long[] codes)
    {
        ArgumentNullException.ThrowIfNull(sourcePath);
        ArgumentNullException.ThrowIfNull(codes);
        if (cycleLength < 1 || codes.Length % cycleLength != 0 || (layout == CaptureLayout.Stream && cycleLength != 1))
        {
            throw new ArgumentException("codes must be a whole number of cycles; a stream has cycle length 1");
        }

        SourcePath = sourcePath;
        Layout = layout;
        CycleLength = cycleLength;
        Codes = codes;
    }

    public string SourcePath { get; }

    public CaptureLayout Layout { get; }

    /// <summary>Samples per pixel cycle; 1 for a stream.</summary>
    public int CycleLength { get; }

    /// <summary>All codes in time order, signed.</summary>
    public IReadOnlyList<long> Codes { get; }

    /// <summary>Pixel cycles (for a stream, samples).</summary>
    public int Rows => Codes.Count / CycleLength;

    public int SampleCount => Codes.Count;

    /// <summary>Code of sample <paramref name="position"/> in cycle <paramref name="row"/>.</summary>
    public long At(int row, int position) => Codes[(row * CycleLength) + position];
}
