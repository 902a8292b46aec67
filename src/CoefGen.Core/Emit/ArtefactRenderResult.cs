using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Emit;

/// <summary>Every artefact of one emit run, or (when any entry failed) none and the diagnostics of all entries.</summary>
public sealed record ArtefactRenderResult(IReadOnlyList<RenderedArtefact> Artefacts, IReadOnlyList<Diagnostic> Diagnostics)
{
    public bool Succeeded => !Diagnostics.Any(d => d.Severity == Severity.Error);
}
