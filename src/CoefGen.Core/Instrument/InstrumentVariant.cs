using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Instrument;

/// <summary>One readout mode or one video channel: a name and the base keys it sets, in file order.</summary>
public sealed record InstrumentVariant(string Name, SourceLocation Location, IReadOnlyList<InstrumentOverride> Overrides);
