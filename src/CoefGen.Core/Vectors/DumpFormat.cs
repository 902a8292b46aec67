namespace CoefGen.Core.Vectors;

/// <summary>How the values of a DUT dump are written.</summary>
public enum DumpFormat
{
    /// <summary>Decide once from the whole text (see <see cref="DumpReader.Detect"/>).</summary>
    Auto,

    /// <summary>Signed decimal, one value per line.</summary>
    DecimalText,

    /// <summary>Hex (optionally 0x-prefixed) of the output word, read as two's complement at the output width.</summary>
    Hex,
}
