using CoefGen.Cli.Io;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Emit;
using CoefGen.Core.Pipeline;

namespace CoefGen.Cli.Commands;

/// <summary>Turns a design into rendered artefacts: the readout's [[emit]] entries, or ad-hoc --format / --template ones.</summary>
internal static class ArtefactPlan
{
    public static Provenance ProvenanceOf(DesignResult r)
    {
        if (r.IsTwoStage)
        {
            // The emitted weights are the two-stage ones: their own noise, not the full optimum's.
            var sigmaV = Math.Sqrt(r.TwoStage!.Real.VarianceV2);
            return new(ToolInfo.Name, ToolInfo.Version, Path.GetFileName(r.Description.SourcePath), r.Description.ContentSha256,
                r.ChosenPrediction.Label + " two-stage", sigmaV / r.Description.Sensor.VoltsAtAdcPerElectron, sigmaV / r.Description.Adc.LsbV);
        }

        return new(
            ToolInfo.Name,
            ToolInfo.Version,
            Path.GetFileName(r.Description.SourcePath),
            r.Description.ContentSha256,
            r.ChosenPrediction.Label,
            r.ChosenPrediction.SigmaElectrons,
            r.ChosenPrediction.SigmaAdu);
    }

    /// <summary>The template model of the design's datapath: the full table's, or the two-stage one with form = "two-stage".</summary>
    public static TemplateModel ModelOf(DesignResult r)
    {
        if (!r.IsTwoStage)
        {
            return TemplateModel.Create(r.Datapath, ProvenanceOf(r));
        }

        var two = r.TwoStage!;
        return TwoStageTemplateModel.Create(r.Description.Name, two.Quantised, two.Layout, r.FixedPointSettings, r.Description.Timing.PixelSamples,
            r.Grid.SampleIndex[0], ProvenanceOf(r));
    }

    /// <summary>Entries to render: explicit formats and template override the file's [[emit]] list.</summary>
    public static IReadOnlyList<(string Template, string OutputPath)> Entries(DesignResult r, IReadOnlyList<string> formats, string? template, string? templateOut)
    {
        var prefix = IdentifierPrefix.FromName(r.Description.Name);
        var list = new List<(string, string)>();
        foreach (var f in formats)
        {
            var name = BuiltinTemplates.TryGet(f, out var b) ? b.DefaultOutputName(prefix) : f;
            list.Add((f, name));
        }

        if (template is not null)
        {
            list.Add((Path.GetFullPath(template), templateOut ?? Path.GetFileNameWithoutExtension(template)));
        }

        if (list.Count == 0)
        {
            list.AddRange(r.Description.Emit.Select(e => (e.Template, e.Path)));
        }

        return list;
    }

    /// <summary>Where each entry's output name comes from, to locate a name the file system refuses (same order as <see cref="Entries"/>).</summary>
    public static IReadOnlyList<string> Origins(DesignResult r, IReadOnlyList<string> formats, string? template)
    {
        var list = formats.Select(_ => r.Description.LocationOf("name").ToString()).ToList();
        if (template is not null)
        {
            list.Add("--template-out");
        }

        if (list.Count == 0)
        {
            list.AddRange(r.Description.Emit.Select((_, i) => r.Description.LocationOf($"emit[{i}].path").ToString()));
        }

        return list;
    }

    /// <summary>The built-in templates that can render this design (a two-stage design has its own).</summary>
    private static IReadOnlyList<BuiltinTemplate> FormTemplates(DesignResult r) => r.IsTwoStage ? BuiltinTemplates.TwoStage : BuiltinTemplates.All;

    /// <summary>Renders everything in memory; on failure prints the diagnostics and returns null.</summary>
    public static IReadOnlyList<RenderedArtefact>? Render(DesignResult r, IReadOnlyList<(string Template, string OutputPath)> entries, TextWriter error)
    {
        if (entries.Count == 0)
        {
            DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error("CG3101", SourceLocation.FileOnly(r.Description.SourcePath),
                $"nothing to emit: add [[emit]] entries (template, path) to the readout file or pass --format {string.Join('|', FormTemplates(r).Select(t => t.Name))}")]);
            return null;
        }

        foreach (var (template, _) in entries)
        {
            if (!BuiltinTemplates.TryGet(template, out _) && !Path.IsPathRooted(template) && !template.Contains('.', StringComparison.Ordinal))
            {
                var known = string.Join(", ", FormTemplates(r).Select(t => t.Name));
                DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error("CG3102", r.Description.LocationOf("emit"),
                    $"'{template}' is neither a built-in template ({known}) nor a template file path")]);
                return null;
            }

            // A built-in template is written for one datapath: the full table's fields are not in the two-stage model and back.
            if (BuiltinTemplates.TryGet(template, out _) && BuiltinTemplates.IsTwoStage(template) != r.IsTwoStage)
            {
                var fit = string.Join(", ", FormTemplates(r).Select(t => t.Name));
                var why = r.IsTwoStage
                    ? $"'{template}' writes a full coefficient table, but this file sets form = \"two-stage\" (the full table is not quantised)"
                    : $"'{template}' writes the two-stage tables, which need form = \"two-stage\" in [weights]";
                DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error("CG3103", TemplateLocation(r, template), $"{why}; built-in templates for this design: {fit}")]);
                return null;
            }
        }

        var userBase = Path.GetDirectoryName(Path.GetFullPath(r.Description.SourcePath)) ?? ".";
        var unreadable = entries.Where(e => !BuiltinTemplates.TryGet(e.Template, out _))
            .Select(e => InputFile.TryRead(Path.Combine(userBase, e.Template), "template", InputFile.TemplateLimit,
                TemplateLocation(r, e.Template), TemplateDiagnosticCodes.TemplateNotFound, null, out var problem) is null ? problem : null)
            .OfType<Diagnostic>().ToList();
        if (unreadable.Count > 0)
        {
            DiagnosticPrinter.PrintFailure(error, unreadable);
            return null;
        }

        var model = ModelOf(r);
        var result = ArtefactRenderer.RenderAll(model, entries, ResourceLocator.TemplatesDir, userBase);
        if (!result.Succeeded)
        {
            DiagnosticPrinter.PrintFailure(error, result.Diagnostics);
            return null;
        }

        DiagnosticPrinter.Print(error, result.Diagnostics);
        return result.Artefacts;
    }

    /// <summary>Where a template path was written: its [[emit]] entry in the readout file, else the path itself (--template).</summary>
    private static SourceLocation TemplateLocation(DesignResult r, string template)
    {
        var i = r.Description.Emit.ToList().FindIndex(e => e.Template == template);
        return i >= 0 ? r.Description.LocationOf($"emit[{i}].template") : SourceLocation.FileOnly(template);
    }

    public static string DefaultOutDir(string readoutPath) => Path.GetDirectoryName(Path.GetFullPath(readoutPath)) ?? ".";
}
