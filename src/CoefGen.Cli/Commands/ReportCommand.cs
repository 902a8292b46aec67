using System.CommandLine;
using System.Security.Cryptography;
using CoefGen.Cli.Io;
using CoefGen.Cli.Output;
using CoefGen.Core.Instrument;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Study;

namespace CoefGen.Cli.Commands;

/// <summary>`coefgen report FILE --out DIR`: the design as an HTML page and a Markdown page with SVG charts.</summary>
internal static class ReportCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var file = new Argument<FileInfo>("readout") { Description = "The readout file (TOML), or an instrument file: then a summary page in DIR and each table's report in DIR/MODE_CHANNEL/." };
        var outDir = new Option<DirectoryInfo>("--out", "-o") { Description = "Folder for report.html, report.md and the Markdown's charts.", Required = true };
        var requireSafe = UnsafeDesign.RequireSafeOption();
        var cmd = new Command(
            "report",
            "Write the design report: a safety banner, the description and noise sources as understood, weights and step response against " +
            "time, the noise spectrum, |H(f)|^2, where each scheme's noise comes from, the noise budget, the integer datapath and its width " +
            "proof, the time/frequency cross-check, warnings and the emitted files with their SHA-256. report.html is self-contained " +
            "(inline SVG, no external resources); report.md links report-chart-N.svg. Every number is the one `design --json` prints. " +
            "Exit 2 on bad input, 1 with --require-safe when the width proof rejects the design (the report is written either way).")
        {
            file, outDir, requireSafe,
        };
        cmd.SetAction(parse =>
        {
            var path = parse.GetRequiredValue(file).ToString();
            var dir = parse.GetRequiredValue(outDir).FullName;
            if (InstrumentRunner.IsInstrument(path))
            {
                return Instrument(path, dir, parse.GetValue(requireSafe), output, error);
            }

            var result = DesignRunner.TryRun(path, error);
            if (result is null)
            {
                return ExitCodes.BadInput;
            }

            using var batch = new OutputBatch();
            if (AddPages(result, batch, dir, "", error, ReadCounts(path, result)) is not int charts || batch.Commit(error) is null)
            {
                return ExitCodes.BadInput;
            }

            output.WriteLine($"wrote {Path.Combine(dir, "report.html")} and report.md with {charts} charts");
            return UnsafeDesign.RequireSafe(result, parse.GetValue(requireSafe), error) ?? ExitCodes.Ok;
        });
        return cmd;
    }

    /// <summary>An instrument: DIR/report.html and report.md (every table, the shared datapath) and each table's report in DIR/MODE_CHANNEL/.</summary>
    private static int Instrument(string path, string dir, bool requireSafe, TextWriter output, TextWriter error)
    {
        var design = InstrumentRunner.TryRun(path, error);
        if (design is null)
        {
            return ExitCodes.BadInput;
        }

        using var batch = new OutputBatch();
        foreach (var t in design.Tables)
        {
            if (AddPages(t.Result, batch, dir, InstrumentReport.TableFolder(t), error) is null)
            {
                error.WriteLine($"  (table {t.Label})");
                return ExitCodes.BadInput;
            }
        }

        var title = $"Instrument report: {design.Spec.Name}";
        var markdown = ReportMarkdown.Render(title, InstrumentReport.Build(design, ToolInfo.Version, "report.md"), []);
        var html = ReportHtml.Render(title, InstrumentReport.Build(design, ToolInfo.Version, "report.html"));
        batch.Add(dir, "--out", "report.md", Utf8Text.Encode(markdown), "--out");
        batch.Add(dir, "--out", "report.html", Utf8Text.Encode(html), "--out");
        if (batch.Commit(error) is null)
        {
            return ExitCodes.BadInput;
        }

        output.WriteLine($"wrote {Path.Combine(dir, "report.html")} and report.md (every table, the shared datapath) and {design.Tables.Count} table reports in {Path.Combine(dir, "MODE_CHANNEL")}");
        return design.Tables.Select(t => UnsafeDesign.RequireSafe(t.Result, requireSafe, error)).FirstOrDefault(c => c is not null) ?? ExitCodes.Ok;
    }

    /// <summary>A cycle with a read count: the cycle designed again at other read counts (null for every other readout).</summary>
    private static ReadCountCurve? ReadCounts(string path, DesignResult result) =>
        !result.Description.Timing.Cycle.IsClassic && InputFiles.ReadReadoutBytes(path, out _) is { } bytes
            ? ReadCountStudy.Run(new System.Text.UTF8Encoding(false).GetString(bytes), result, SweepCommand.PointFor(path))
            : null;

    /// <summary>Adds one design's report.html, report.md and charts under DIR/<paramref name="folder"/>; the chart count, or null on bad input.</summary>
    private static int? AddPages(DesignResult result, OutputBatch batch, string dir, string folder, TextWriter error, ReadCountCurve? readCounts = null)
    {
        var emitted = new List<EmittedFile>();
        var entries = result.Description.Emit.Select(e => (e.Template, e.Path)).ToList();
        if (entries.Count > 0)
        {
            var artefacts = ArtefactPlan.Render(result, entries, error);
            if (artefacts is null)
            {
                return null;
            }

            for (var i = 0; i < artefacts.Count; i++)
            {
                var bytes = artefacts[i].ToBytes();
                emitted.Add(new EmittedFile(entries[i].Template, artefacts[i].RelativePath, bytes.Length, Convert.ToHexStringLower(SHA256.HashData(bytes))));
            }
        }

        var sections = DesignReport.Build(result, new ReportContext(ToolInfo.Version, emitted) { ReadCounts = readCounts });
        var title = $"Design report: {result.Description.Name}";
        var charts = new List<(string Name, string Svg)>();
        var markdown = ReportMarkdown.Render(title, sections, charts);
        var html = ReportHtml.Render(title, sections);
        foreach (var (name, svg) in charts)
        {
            batch.Add(dir, "--out", Path.Combine(folder, name), Utf8Text.Encode(svg), "--out");
        }

        batch.Add(dir, "--out", Path.Combine(folder, "report.md"), Utf8Text.Encode(markdown), "--out");
        batch.Add(dir, "--out", Path.Combine(folder, "report.html"), Utf8Text.Encode(html), "--out");
        return charts.Count;
    }
}
