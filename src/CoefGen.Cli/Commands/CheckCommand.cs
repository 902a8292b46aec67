using System.CommandLine;
using CoefGen.Cli.Io;
using CoefGen.Core.Emit;

namespace CoefGen.Cli.Commands;

/// <summary>`coefgen check FILE [--out DIR]`: exit 1 naming every emitted file that is stale or missing.</summary>
internal static class CheckCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var file = new Argument<FileInfo>("readout") { Description = "The readout file (TOML)." };
        var outDir = new Option<DirectoryInfo?>("--out", "-o") { Description = "Folder the files were emitted to. Default: the readout file's folder." };
        var formats = new Option<string[]>("--format", "-f") { Description = "Check these built-in formats instead of the [[emit]] list.", AllowMultipleArgumentsPerToken = true };
        var cmd = new Command(
            "check",
            "Re-render everything `emit` would write, in memory, and compare byte for byte with what is on disk. " +
            "Exit 0 when all match, 1 naming each stale or missing file (for firmware CI), 2 on bad input. Writes nothing.")
        {
            file, outDir, formats,
        };
        cmd.SetAction(parse =>
        {
            var path = parse.GetRequiredValue(file).ToString();
            if (InstrumentRunner.IsInstrument(path))
            {
                return InstrumentCommands.Check(path, parse.GetValue(outDir)?.FullName, output, error);
            }

            var result = DesignRunner.TryRun(path, error);
            if (result is null)
            {
                return ExitCodes.BadInput;
            }

            var artefacts = ArtefactPlan.Render(result, ArtefactPlan.Entries(result, parse.GetValue(formats) ?? [], null, null), error);
            if (artefacts is null)
            {
                return ExitCodes.BadInput;
            }

            var dir = parse.GetValue(outDir)?.FullName ?? ArtefactPlan.DefaultOutDir(path);
            var entries = StalenessReport.Print(artefacts, dir, "the readout file", output);

            return StalenessCheck.AllUpToDate(entries) ? ExitCodes.Ok : ExitCodes.Difference;
        });
        return cmd;
    }
}
