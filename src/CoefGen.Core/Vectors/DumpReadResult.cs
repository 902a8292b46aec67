using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Vectors;

/// <summary>Values read from a dump (null on any error), the format used, and the problems found.</summary>
public sealed record DumpReadResult(IReadOnlyList<long>? Values, DumpFormat Format, IReadOnlyList<Diagnostic> Diagnostics);
