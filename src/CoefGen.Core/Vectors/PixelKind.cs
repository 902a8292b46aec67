namespace CoefGen.Core.Vectors;

/// <summary>The stable names of the pixel kinds in the vector files (CSV column "kind", manifest counts).</summary>
public static class PixelKind
{
    /// <summary>Baseline only, no noise: the DC offset must cancel exactly (sum c = 0), output 0.</summary>
    public const string DcOffset = "dc_offset";

    /// <summary>Every sample at the bottom rail.</summary>
    public const string RailsLow = "rails_low";

    /// <summary>Every sample at the top rail.</summary>
    public const string RailsHigh = "rails_high";

    /// <summary>Reset window at the bottom rail, signal window at the top rail (largest positive output).</summary>
    public const string ResetLowSignalHigh = "reset_low_signal_high";

    /// <summary>Reset window at the top rail, signal window at the bottom rail (largest negative output).</summary>
    public const string ResetHighSignalLow = "reset_high_signal_low";

    /// <summary>Samples alternate bottom rail, top rail, starting with the bottom one.</summary>
    public const string Alternating = "alternating";

    /// <summary>Samples alternate top rail, bottom rail.</summary>
    public const string AlternatingInverted = "alternating_inverted";

    /// <summary>Weighted samples at baseline, every other sample at alternating rails: the output must ignore them.</summary>
    public const string OutsideWindowsRails = "outside_windows_rails";

    /// <summary>Prefix of the width proof's worst-case patterns: "worst_" + check name.</summary>
    public const string WorstPrefix = "worst_";

    /// <summary>Zero charge with noise: the population of the noise check.</summary>
    public const string Noise = "noise";

    /// <summary>Half the full-scale charge, with noise.</summary>
    public const string ChargeMid = "charge_mid";

    /// <summary>The charge that puts the settled signal level on the top rail, with noise (clips as an ADC would).</summary>
    public const string ChargeFull = "charge_full";
}
