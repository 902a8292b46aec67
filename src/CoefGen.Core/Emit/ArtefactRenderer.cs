using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Emit;

/// <summary>Renders every [[emit]] entry in memory; writing (atomically) is the caller's job.</summary>
public static class ArtefactRenderer
{
    /// <summary>
    /// Each entry names a built-in template ("c-header", ...) or a template path relative to
    /// <paramref name="userTemplateBaseDir"/> (the readout file's folder), and an output path relative to
    /// the output folder. All-or-nothing: when any entry fails, no artefact is returned, so a caller can
    /// never write half of a run.
    /// </summary>
    public static ArtefactRenderResult RenderAll(
        TemplateModel model,
        IReadOnlyList<(string Template, string OutputPath)> entries,
        string builtinTemplateDir,
        string userTemplateBaseDir,
        CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(entries);
        ArgumentNullException.ThrowIfNull(builtinTemplateDir);
        ArgumentNullException.ThrowIfNull(userTemplateBaseDir);

        var diagnostics = new DiagnosticBag();
        var artefacts = new List<RenderedArtefact>();
        var seen = new HashSet<string>(StringComparer.OrdinalIgnoreCase);
        foreach (var (template, outputPath) in entries)
        {
            cancellationToken.ThrowIfCancellationRequested();
            var problem = OutputPathPolicy.Check(outputPath);
            if (problem is not null)
            {
                diagnostics.Error(TemplateDiagnosticCodes.OutputPathRefused, SourceLocation.FileOnly(outputPath), problem, "emit.path");
                continue;
            }

            // Case-insensitive: two names differing only in case collide on Windows and macOS checkouts.
            if (!seen.Add(outputPath))
            {
                diagnostics.Error(TemplateDiagnosticCodes.DuplicateOutputPath, SourceLocation.FileOnly(outputPath),
                    "two emit entries write this output path", "emit.path");
                continue;
            }

            var templatePath = BuiltinTemplates.TryGet(template, out var builtin)
                ? Path.Combine(builtinTemplateDir, builtin.FileName)
                : Path.Combine(userTemplateBaseDir, template);
            var result = TemplateRenderer.RenderFile(model, templatePath, cancellationToken);
            diagnostics.AddRange(result.Diagnostics);
            if (result.Text is not null)
            {
                artefacts.Add(new RenderedArtefact(outputPath, result.Text));
            }
        }

        return diagnostics.HasErrors
            ? new ArtefactRenderResult([], diagnostics.Items)
            : new ArtefactRenderResult(artefacts, diagnostics.Items);
    }
}
