using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Instrument;

/// <summary>The instrument file when no error was found, and every diagnostic.</summary>
public sealed record InstrumentLoadResult(InstrumentSpec? Spec, IReadOnlyList<Diagnostic> Diagnostics);
