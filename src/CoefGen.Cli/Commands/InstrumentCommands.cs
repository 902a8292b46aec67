using CoefGen.Cli.Io;
using CoefGen.Cli.Output;
using CoefGen.Core.Emit;
using CoefGen.Core.Vectors;

namespace CoefGen.Cli.Commands;

/// <summary>design, emit and check when their file is an instrument file: every table at once.</summary>
internal static class InstrumentCommands
{
    public static int Design(string path, bool json, TextWriter output, TextWriter error)
    {
        var design = InstrumentRunner.TryRun(path, error);
        if (design is null)
        {
            return ExitCodes.BadInput;
        }

        output.Write(json ? InstrumentJson.Render(design) : InstrumentText.Render(design));
        return ExitCodes.Ok;
    }

    public static int Emit(string path, string? outDir, bool allowUnsafe, TextWriter output, TextWriter error)
    {
        var design = InstrumentRunner.TryRun(path, error);
        if (design is null)
        {
            return ExitCodes.BadInput;
        }

        foreach (var t in design.Tables)
        {
            if (UnsafeDesign.Refuse(t.Result, allowUnsafe, error) is int refused)
            {
                error.WriteLine($"  (table {t.Label})");
                return refused;
            }
        }

        var artefacts = InstrumentArtefacts.Render(design, error, out var origins);
        if (artefacts is null)
        {
            return ExitCodes.BadInput;
        }

        var dir = outDir ?? ArtefactPlan.DefaultOutDir(path);
        using var batch = new OutputBatch();
        for (var i = 0; i < artefacts.Count; i++)
        {
            batch.Add(dir, "--out", artefacts[i].RelativePath, artefacts[i].ToBytes(), origins[i]);
        }

        return Committed(batch, output, error);
    }

    public static int Check(string path, string? outDir, TextWriter output, TextWriter error)
    {
        var design = InstrumentRunner.TryRun(path, error);
        var artefacts = design is null ? null : InstrumentArtefacts.Render(design, error);
        if (artefacts is null)
        {
            return ExitCodes.BadInput;
        }

        var dir = outDir ?? ArtefactPlan.DefaultOutDir(path);
        var entries = StalenessReport.Print(artefacts, dir, "the instrument file", output);
        var stale = entries.Count(e => e.Status != StalenessStatus.UpToDate);
        output.WriteLine(stale == 0 ? $"all {entries.Count} files up to date" : $"{stale} of {entries.Count} files stale or missing");
        return stale == 0 ? ExitCodes.Ok : ExitCodes.Difference;
    }

    /// <summary>Golden vectors of every table, each in its own folder DIR/MODE_CHANNEL (the RTL of an instrument is its combined templates).</summary>
    public static int Vectors(string path, string outDir, VectorOptions options, TextWriter output, TextWriter error)
    {
        var design = InstrumentRunner.TryRun(path, error);
        if (design is null)
        {
            return ExitCodes.BadInput;
        }

        using var batch = new OutputBatch();
        var count = 0;
        foreach (var t in design.Tables)
        {
            if (!t.Result.Datapath.Proof.Safe)
            {
                DiagnosticPrinter.Print(error, [UnsafeDesign.Describe(t.Result, asError: false)]);
            }

            var set = GoldenVectorGenerator.Generate(t.Result, options);
            foreach (var f in VectorFiles.Render(set, ToolInfo.Name, ToolInfo.Version))
            {
                batch.Add(outDir, "--out", Path.Combine($"{t.Mode}_{t.Channel}", f.Name), Utf8Text.Encode(f.Text), "--out");
                count++;
            }
        }

        if (batch.Commit(error) is null)
        {
            return ExitCodes.BadInput;
        }

        output.WriteLine($"wrote {count} files for {design.Tables.Count} tables to {Path.GetRelativePath(Directory.GetCurrentDirectory(), outDir)}, {options.Pixels} pixels each");
        return ExitCodes.Ok;
    }

    private static int Committed(OutputBatch batch, TextWriter output, TextWriter error)
    {
        if (batch.Commit(error) is not { } written)
        {
            return ExitCodes.BadInput;
        }

        foreach (var (file, unchanged) in written)
        {
            output.WriteLine(unchanged ? $"unchanged {file}" : $"wrote {file}");
        }

        return ExitCodes.Ok;
    }
}
