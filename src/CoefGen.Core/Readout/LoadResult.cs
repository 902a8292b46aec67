using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Readout;

/// <summary>The outcome of loading a readout file: the description when no error was found, and every diagnostic (warnings may accompany a success).</summary>
public sealed record LoadResult(ReadoutDescription? Description, IReadOnlyList<Diagnostic> Diagnostics)
{
    public bool Succeeded => Description is not null;
}
