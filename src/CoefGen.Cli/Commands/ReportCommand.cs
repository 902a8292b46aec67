using System.CommandLine;
using System.Security.Cryptography;
using CoefGen.Cli.Io;
using CoefGen.Cli.Output;
using CoefGen.Core.Study;

namespace CoefGen.Cli.Commands;

/// <summary>`coefgen report FILE --out DIR`: the design as an HTML page and a Markdown page with SVG charts.</summary>
internal static class ReportCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var file = new Argument<FileInfo>("readout") { Description = "The readout file (TOML)." };
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
            var result = DesignRunner.TryRun(path, error);
            if (result is null)
            {
                return ExitCodes.BadInput;
            }

            var emitted = new List<EmittedFile>();
            var entries = result.Description.Emit.Select(e => (e.Template, e.Path)).ToList();
            if (entries.Count > 0)
            {
                var artefacts = ArtefactPlan.Render(result, entries, error);
                if (artefacts is null)
                {
                    return ExitCodes.BadInput;
                }

                for (var i = 0; i < artefacts.Count; i++)
                {
                    var bytes = artefacts[i].ToBytes();
                    emitted.Add(new EmittedFile(entries[i].Template, artefacts[i].RelativePath, bytes.Length, Convert.ToHexStringLower(SHA256.HashData(bytes))));
                }
            }

            var sections = DesignReport.Build(result, new ReportContext(ToolInfo.Version, emitted));
            var title = $"Design report: {result.Description.Name}";
            var charts = new List<(string Name, string Svg)>();
            var markdown = ReportMarkdown.Render(title, sections, charts);
            var html = ReportHtml.Render(title, sections);
            var dir = parse.GetRequiredValue(outDir).FullName;
            using var batch = new OutputBatch();
            foreach (var (name, svg) in charts)
            {
                batch.Add(dir, "--out", name, AtomicFile.Encode(svg), "--out");
            }

            batch.Add(dir, "--out", "report.md", AtomicFile.Encode(markdown), "--out");
            batch.Add(dir, "--out", "report.html", AtomicFile.Encode(html), "--out");
            if (batch.Commit(error) is null)
            {
                return ExitCodes.BadInput;
            }

            output.WriteLine($"wrote {Path.Combine(dir, "report.html")} and report.md with {charts.Count} charts");
            return UnsafeDesign.RequireSafe(result, parse.GetValue(requireSafe), error) ?? ExitCodes.Ok;
        });
        return cmd;
    }
}
