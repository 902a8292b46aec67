namespace CoefGen.Core.FixedPoint;

/// <summary>
/// Resolved widths and modes of the integer datapath: the target profile with the readout's overrides applied.
/// Every instance from <see cref="FixedPointSettingsResolver"/> has passed the CG2xxx checks.
/// </summary>
public sealed record FixedPointSettings
{
    public required string TargetName { get; init; }

    public required int CoefBits { get; init; }

    /// <summary>Signed width of a sample at the multiplier (at least the ADC bits).</summary>
    public required int SampleBits { get; init; }

    public required int AccBits { get; init; }

    public required AccumulatorMode Accumulator { get; init; }

    public required int OutputBits { get; init; }

    /// <summary>Fractional output bits, or null to use the recommended value (output rounding adds under 1 % noise).</summary>
    public int? OutputFracBits { get; init; }

    public required RoundingMode Rounding { get; init; }

    public required NormalizeMode Normalize { get; init; }

    /// <summary>Largest post-multiplier operand (normalize = exact).</summary>
    public required int PostMultiplierBits { get; init; }

    /// <summary>Width of the register holding acc * M.</summary>
    public required int PostProductBits { get; init; }

    public required int MaxCoefficients { get; init; }

    /// <summary>Settings taken straight from a profile, with the sample width of the ADC (tests, sweeps).</summary>
    public static FixedPointSettings FromProfile(TargetProfile profile, int adcBits)
    {
        ArgumentNullException.ThrowIfNull(profile);
        return new FixedPointSettings
        {
            TargetName = profile.Name,
            CoefBits = profile.CoefOperandBits,
            SampleBits = adcBits,
            AccBits = profile.AccBits,
            Accumulator = profile.Accumulator,
            OutputBits = profile.OutputBits,
            OutputFracBits = profile.OutputFracBits,
            Rounding = profile.Rounding,
            Normalize = profile.Normalize,
            PostMultiplierBits = profile.PostMultiplierBits,
            PostProductBits = profile.PostProductBits,
            MaxCoefficients = profile.MaxCoefficients,
        };
    }
}
