using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Emit;

/// <summary>The text of one render, or the diagnostics that stopped it (then <see cref="Text"/> is null).</summary>
public sealed record RenderResult(string? Text, IReadOnlyList<Diagnostic> Diagnostics)
{
    public bool Succeeded => Text is not null;

    public static RenderResult Failed(Diagnostic diagnostic) => new(null, [diagnostic]);
}
