using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Instrument;

/// <summary>One key of the base readout file set by a mode or channel: its dotted path, its TOML literal as written, and where.</summary>
public sealed record InstrumentOverride(string Key, string Literal, SourceLocation Location);
