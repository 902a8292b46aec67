using CoefGen.Cli.Io;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Emit;
using CoefGen.Core.Instrument;

namespace CoefGen.Cli.Commands;

/// <summary>Renders an instrument's [[emit]] list in memory: combined packages once, other templates once per table. All or nothing.</summary>
internal static class InstrumentArtefacts
{
    public static IReadOnlyList<RenderedArtefact>? Render(InstrumentDesign design, TextWriter error) => Render(design, error, out _);

    /// <summary>As <see cref="Render(InstrumentDesign, TextWriter)"/>, with the instrument-file location of the [[emit]] entry behind each artefact.</summary>
    public static IReadOnlyList<RenderedArtefact>? Render(InstrumentDesign design, TextWriter error, out IReadOnlyList<string> origins)
    {
        var spec = design.Spec;
        var from = new List<string>();
        origins = from;
        if (spec.Emit.Count == 0)
        {
            DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error("CG3101", SourceLocation.FileOnly(spec.SourcePath),
                $"nothing to emit: add [[emit]] entries (template, path) to the instrument file; combined templates: {string.Join(", ", InstrumentTemplates.All.Select(t => t.Name))}")]);
            return null;
        }

        var userBase = Path.GetDirectoryName(Path.GetFullPath(spec.SourcePath)) ?? ".";
        var diagnostics = new List<Diagnostic>();
        var artefacts = new List<RenderedArtefact>();
        var combined = InstrumentTemplateModel.Create(design, ToolInfo.Name, ToolInfo.Version);
        foreach (var e in spec.Emit)
        {
            if (InstrumentTemplates.TryGet(e.Template, out var t))
            {
                Add(ArtefactRenderer.RenderAll(combined, [(Path.Combine(ResourceLocator.TemplatesDir, t.FileName), e.Path)], ResourceLocator.TemplatesDir, userBase), diagnostics, artefacts);
                from.AddRange(Enumerable.Repeat(e.Location.ToString(), artefacts.Count - from.Count));
                continue;
            }

            foreach (var table in design.Tables)
            {
                var r = table.Result;
                var provenance = new Provenance(ToolInfo.Name, ToolInfo.Version, $"{Path.GetFileName(spec.SourcePath)} table {table.Label}",
                    r.Description.ContentSha256, r.ChosenPrediction.Label, r.ChosenPrediction.SigmaElectrons, r.ChosenPrediction.SigmaAdu);
                var model = TemplateModel.Create(r.Datapath, provenance);
                Add(ArtefactRenderer.RenderAll(model, [(e.Template, e.PathFor(table.Mode, table.Channel))], ResourceLocator.TemplatesDir, userBase), diagnostics, artefacts);
                from.AddRange(Enumerable.Repeat(e.Location.ToString(), artefacts.Count - from.Count));
            }
        }

        foreach (var dup in artefacts.GroupBy(a => a.RelativePath, StringComparer.OrdinalIgnoreCase).Where(g => g.Count() > 1))
        {
            diagnostics.Add(Diagnostic.Error(TemplateDiagnosticCodes.DuplicateOutputPath, SourceLocation.FileOnly(dup.Key), "two emit entries write this output path", "emit.path"));
        }

        if (diagnostics.Any(d => d.Severity == Severity.Error))
        {
            DiagnosticPrinter.PrintFailure(error, diagnostics);
            return null;
        }

        DiagnosticPrinter.Print(error, diagnostics);
        return artefacts;
    }

    private static void Add(ArtefactRenderResult result, List<Diagnostic> diagnostics, List<RenderedArtefact> artefacts)
    {
        diagnostics.AddRange(result.Diagnostics);
        artefacts.AddRange(result.Artefacts);
    }
}
