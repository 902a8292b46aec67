using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Vectors;

/// <summary>Values read from a dump (null on any error), the accumulators when the dump has them, the format used, and the problems found.</summary>
public sealed record DumpReadResult(IReadOnlyList<long>? Values, IReadOnlyList<long>? Accumulators, DumpFormat Format, IReadOnlyList<Diagnostic> Diagnostics);
