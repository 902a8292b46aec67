using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Readout;

/// <summary>
/// One readout channel as understood from its readout file. Every instance is valid: it only comes
/// out of <see cref="ReadoutLoader"/> (or a test) after all checks passed.
/// </summary>
public sealed record ReadoutDescription
{
    /// <summary>Identifier prefix for emitted code.</summary>
    public required string Name { get; init; }

    /// <summary>Path the description was read from, as given (for messages).</summary>
    public required string SourcePath { get; init; }

    /// <summary>Lower-case hex SHA-256 of the readout file's bytes (provenance in emitted files).</summary>
    public required string ContentSha256 { get; init; }

    public required AdcSpec Adc { get; init; }

    public required SensorSpec Sensor { get; init; }

    public required TimingSpec Timing { get; init; }

    public required NoiseSpec Noise { get; init; }

    public required WeightsSpec Weights { get; init; }

    public required FixedPointSpec FixedPoint { get; init; }

    public required IReadOnlyList<EmitSpec> Emit { get; init; }

    /// <summary>The noise scenarios ([scenarios]), or null when the file names none.</summary>
    public ScenarioSpec? Scenarios { get; init; }

    /// <summary>Source location of each key that was given, by dotted path (e.g. "fixed_point.coef_bits").</summary>
    public IReadOnlyDictionary<string, SourceLocation> KeyLocations { get; init; } = new Dictionary<string, SourceLocation>();

    /// <summary>Where a key was written, or the file itself when it was not written.</summary>
    public SourceLocation LocationOf(string dottedKey) =>
        KeyLocations.TryGetValue(dottedKey, out var loc) ? loc : SourceLocation.FileOnly(SourcePath);
}
