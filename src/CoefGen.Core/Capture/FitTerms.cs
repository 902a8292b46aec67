namespace CoefGen.Core.Capture;

/// <summary>
/// Which terms of white + 1/f + pole a spectrum fit estimates. The white level is always fitted; the pole is
/// fitted, held at a given value, or absent (the white part then ends at Nyquist, as a brick-wall limit at
/// rate / 2 in the readout file would make it).
/// </summary>
/// <param name="Flicker">The 1/f corner is fitted (otherwise it is 0).</param>
/// <param name="FitPole">The pole is fitted.</param>
/// <param name="HeldPoleHz">The pole when not fitted: the held value, or null for no pole.</param>
public sealed record FitTerms(bool Flicker, bool FitPole, double? HeldPoleHz)
{
    public const string FlickerTerm = "1/f";

    public const string PoleTerm = "pole";

    /// <summary>Fitted log parameters: W, then f_c and f_p when fitted.</summary>
    public int ParameterCount => 1 + (Flicker ? 1 : 0) + (FitPole ? 1 : 0);

    /// <summary>The terms of the full model this fit leaves out.</summary>
    public IReadOnlyList<string> Unresolved =>
        [.. Flicker ? Array.Empty<string>() : [FlickerTerm], .. FitPole || HeldPoleHz is not null ? Array.Empty<string>() : [PoleTerm]];

    /// <summary>From the full model down to white alone, in the order they are tried.</summary>
    public static IReadOnlyList<FitTerms> Candidates(double? heldPoleHz) =>
        heldPoleHz is double held
            ? [new(true, false, held), new(false, false, held)]
            : [new(true, true, null), new(false, true, null), new(true, false, null), new(false, false, null)];
}
