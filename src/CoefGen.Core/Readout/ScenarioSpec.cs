namespace CoefGen.Core.Readout;

/// <summary>
/// The noise scenarios of a readout file ([scenarios]): named variants of the noise description that the
/// robust scheme must stay good for, and that the regret table compares every scheme against.
/// Scenarios change the noise covariance only; the sample grid, step response and constraints stay nominal.
/// </summary>
/// <param name="Objective">What the robust scheme minimises over the cases.</param>
/// <param name="Cases">The scenarios in file order (the nominal noise first when it is included); at least one.</param>
public sealed record ScenarioSpec(RobustObjective Objective, IReadOnlyList<NoiseScenario> Cases);

/// <summary>One noise variant: the nominal noise with some keys overridden.</summary>
/// <param name="Name">Label in tables and charts (unique within the file).</param>
/// <param name="Overrides">Dotted noise keys and their values in the key's own unit (empty = the nominal noise).</param>
public sealed record NoiseScenario(string Name, IReadOnlyList<NoiseOverride> Overrides);

/// <summary>One overridden noise key, e.g. noise.source[0].flicker_corner_hz = 20000.</summary>
/// <param name="Key">The dotted key, as `sweep --vary` names it.</param>
/// <param name="Value">The value in the key's own unit (Hz, nV/sqrt(Hz)).</param>
public sealed record NoiseOverride(string Key, double Value);

/// <summary>The robust scheme's objective over the scenarios.</summary>
public enum RobustObjective
{
    /// <summary>Minimise the largest read noise over the scenarios (minimax).</summary>
    WorstCase,

    /// <summary>Minimise the largest ratio to each scenario's own optimum (minimax regret: the worst case over C_i / optimum_i).</summary>
    Regret,

    /// <summary>Minimise the mean read noise variance over the scenarios (one solve on the mean covariance).</summary>
    Mean,
}
