namespace CoefGen.Core.FixedPoint;

/// <summary>
/// The arithmetic of one hardware target, read from a targets/*.toml file (schema in targets/README.md).
/// Every width is a signed two's-complement width in bits.
/// </summary>
public sealed record TargetProfile
{
    /// <summary>Profile name, equal to the file name without ".toml" (e.g. "dsp18x27-acc48").</summary>
    public required string Name { get; init; }

    public required string Description { get; init; }

    /// <summary>Multiplier operand that takes the coefficient.</summary>
    public required int CoefOperandBits { get; init; }

    /// <summary>Multiplier operand that takes the sample.</summary>
    public required int SampleOperandBits { get; init; }

    public required int AccBits { get; init; }

    public required AccumulatorMode Accumulator { get; init; }

    /// <summary>Operand width available for the post-multiplier (normalize = exact).</summary>
    public required int PostMultiplierBits { get; init; }

    /// <summary>Width of the register that holds acc * M before the final shift.</summary>
    public required int PostProductBits { get; init; }

    public required NormalizeMode Normalize { get; init; }

    public required RoundingMode Rounding { get; init; }

    public required int OutputBits { get; init; }

    /// <summary>Fractional output bits, or null to use the recommended value.</summary>
    public int? OutputFracBits { get; init; }

    /// <summary>Largest number of coefficients the target stores.</summary>
    public required int MaxCoefficients { get; init; }

    /// <summary>Bits per stored coefficient word, when the storage is narrower or wider than the operand; null = operand width.</summary>
    public int? CoefStorageBits { get; init; }

    /// <summary>Where the profile was read from (for messages).</summary>
    public required string SourcePath { get; init; }
}
