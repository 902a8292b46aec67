namespace CoefGen.Core.Vectors;

/// <summary>File names written by the vector generator (fixed, so benches and `verify` find them).</summary>
public static class VectorFileNames
{
    /// <summary>One ADC code per line, hex masked to the ADC width, every sample of every cycle in order ($readmemh, $fscanf %h).</summary>
    public const string StimulusHex = "stimulus.hex";

    /// <summary>One pixel cycle per line: PixelSamples decimal codes separated by spaces (VHDL textio, C).</summary>
    public const string StimulusDecimal = "stimulus.txt";

    /// <summary>One expected output per pixel, hex masked to the output width.</summary>
    public const string ExpectedOutputHex = "expected_out.hex";

    /// <summary>One expected accumulator per pixel, hex masked to the accumulator width.</summary>
    public const string ExpectedAccumulatorHex = "expected_acc.hex";

    /// <summary>One pixel per line: expected output and accumulator, decimal.</summary>
    public const string ExpectedDecimal = "expected.txt";

    /// <summary>One row per pixel: index, kind, charge, expected values and flags.</summary>
    public const string Table = "vectors.csv";

    /// <summary>Counts, widths, seed, readout SHA-256, pixel kinds and the SHA-256 of every other file.</summary>
    public const string Manifest = "manifest.json";
}
