namespace CoefGen.Core.Instrument;

/// <summary>
/// An instrument file as written: a base readout file, its modes and channels (each a set of overrides of base keys),
/// which mode x channel tables to design (all when not listed) and what to emit.
/// </summary>
public sealed record InstrumentSpec
{
    public required string Name { get; init; }

    public required string SourcePath { get; init; }

    /// <summary>The base readout file, relative to the instrument file's folder, as written.</summary>
    public required string BasePath { get; init; }

    public required Diagnostics.SourceLocation BaseLocation { get; init; }

    public required IReadOnlyList<InstrumentVariant> Modes { get; init; }

    public required IReadOnlyList<InstrumentVariant> Channels { get; init; }

    /// <summary>The designed (mode index, channel index) pairs, mode-major; every combination unless `tables` lists a subset.</summary>
    public required IReadOnlyList<(int Mode, int Channel)> Tables { get; init; }

    public required IReadOnlyList<InstrumentEmitEntry> Emit { get; init; }

    /// <summary>Lower-case hex SHA-256 of the instrument file's bytes.</summary>
    public required string ContentSha256 { get; init; }
}
