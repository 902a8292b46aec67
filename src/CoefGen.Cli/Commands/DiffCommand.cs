using System.CommandLine;
using CoefGen.Cli.Diagnostics;
using CoefGen.Cli.Io;
using CoefGen.Cli.Output;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Instrument;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;

namespace CoefGen.Cli.Commands;

/// <summary>`coefgen diff A B` or `coefgen diff A --rev REV`: what changed in the designs between two versions.</summary>
internal static class DiffCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var before = new Argument<FileInfo>("before") { Description = "A readout or instrument file (the old version; with --rev, the file whose old and current state are compared)." };
        var after = new Argument<FileInfo?>("after") { Description = "The new version (omit with --rev).", Arity = ArgumentArity.ZeroOrOne };
        var rev = new Option<string?>("--rev") { Description = "Compare the file as it was in this git revision (e.g. HEAD, HEAD~1, a tag) with the file on disk." };
        var json = new Option<bool>("--json") { Description = "Print one JSON document (schema coefgen.diff/1) instead of the table." };
        var cmd = new Command(
            "diff",
            "Design two versions of a readout or instrument file and list, table by table, what changed: cycle and realised windows, " +
            "read noise of every scheme, coefficient count, P, shift, post-multiplier, widths and margins, and the largest coefficient change. " +
            "Exit 0 when nothing changed, 1 when something did, 2 on bad input. Writes nothing.")
        {
            before, after, rev, json,
        };
        cmd.SetAction(parse =>
        {
            var a = parse.GetRequiredValue(before).ToString();
            var b = parse.GetValue(after)?.ToString();
            var revision = parse.GetValue(rev);
            if ((b is null) == (revision is null))
            {
                return DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error(DiffCodes.Arguments, SourceLocation.FileOnly(a),
                    "give either a second file (coefgen diff OLD NEW) or --rev REV (coefgen diff FILE --rev HEAD~1), not both and not neither")]);
            }

            Func<string, byte[]?> readOld = InstrumentRunner.TryRead;
            var oldLabel = a;
            if (revision is not null)
            {
                if (GitRevision.Read(revision, a, out var problem) is null)
                {
                    return DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error(DiffCodes.Revision, SourceLocation.FileOnly(a), $"cannot read the file at revision '{revision}': {problem}")]);
                }

                readOld = p => GitRevision.Read(revision, p, out _);
                oldLabel = $"{a} at {revision}";
            }

            var old = Summaries(a, readOld, error);
            var @new = old is null ? null : Summaries(b ?? a, InstrumentRunner.TryRead, error);
            if (old is null || @new is null)
            {
                return ExitCodes.BadInput;
            }

            var entries = DesignDiff.Compare(old, @new);
            output.Write(parse.GetValue(json) ? DiffJson.Render(oldLabel, b ?? a, entries) : DiffText.Render(oldLabel, b ?? a, entries));
            return entries.Count == 0 ? ExitCodes.Ok : ExitCodes.Difference;
        });
        return cmd;
    }

    /// <summary>The summaries of every table of the file (one, labelled "design", for a readout file), or null after printing the problems.</summary>
    private static IReadOnlyList<TableSummary>? Summaries(string path, Func<string, byte[]?> read, TextWriter error)
    {
        var bytes = read(path);
        if (bytes is null)
        {
            DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error("CG0002", SourceLocation.FileOnly(path), "cannot read the file")]);
            return null;
        }

        if (InstrumentLoader.IsInstrument(bytes))
        {
            var design = InstrumentRunner.TryRun(path, read, error, frequencyCheck: false);
            return design is null ? null : TableSummary.Of(design);
        }

        var dir = Path.GetDirectoryName(path) ?? "";
        var load = ReadoutLoader.Load(bytes, path, rel => read(Path.Combine(dir, rel)));
        if (load.Description is null || load.Diagnostics.Any(d => d.Severity == Severity.Error))
        {
            DiagnosticPrinter.PrintFailure(error, load.Diagnostics);
            return null;
        }

        try
        {
            var result = DesignPipeline.Run(load.Description, InputFiles.LoadTargets(), frequencyCheck: false);
            return TwoStageRefusal.Refuse(result, "diff", error) ? null : [TableSummary.Of("design", result)];
        }
        catch (InputException ex)
        {
            DiagnosticPrinter.PrintFailure(error, ex.Diagnostics);
            return null;
        }
    }
}
