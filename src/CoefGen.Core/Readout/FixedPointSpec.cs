namespace CoefGen.Core.Readout;

/// <summary>
/// The [fixed_point] section as written: a target profile name and optional overrides.
/// Null means "take it from the target profile / the default". Resolution happens in the FixedPoint stage.
/// </summary>
public sealed record FixedPointSpec(
    string? Target,
    int? CoefBits,
    int? SampleBits,
    int? AccBits,
    int? OutputBits,
    int? OutputFracBits,
    string? Normalize,
    string? Rounding,
    string? Accumulator);
