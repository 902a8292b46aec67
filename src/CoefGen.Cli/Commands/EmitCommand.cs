using System.CommandLine;
using CoefGen.Cli.Io;

namespace CoefGen.Cli.Commands;

/// <summary>`coefgen emit FILE [--out DIR] [--format NAME]... [--template PATH [--template-out NAME]]`.</summary>
internal static class EmitCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var file = new Argument<FileInfo>("readout") { Description = "The readout file (TOML)." };
        var outDir = new Option<DirectoryInfo?>("--out", "-o") { Description = "Output folder; [[emit]] paths are relative to it. Default: the readout file's folder." };
        var formats = new Option<string[]>("--format", "-f")
        {
            Description = "Emit a built-in template instead of the file's [[emit]] list: c-header, vhdl-package, sv-package, verilog-include (repeatable).",
            AllowMultipleArgumentsPerToken = true,
        };
        var template = new Option<FileInfo?>("--template") { Description = "Render your own Scriban template (see templates/README.md for the model)." };
        var allowUnsafe = new Option<bool>("--allow-unsafe") { Description = "Write the tables even when the width proof says the datapath can overflow (a warning is printed)." };
        var templateOut = new Option<string?>("--template-out") { Description = "Output name for --template (default: the template's name without its last extension)." };
        var cmd = new Command(
            "emit",
            "Render the chosen scheme's integer design through the templates and write the files all-or-nothing " +
            "(staged in a temporary folder, then moved into place; files whose bytes do not change are left alone). Nothing is written when any template or path fails, or when the width proof says the " +
            "datapath can overflow (unless --allow-unsafe). Exit 2 on bad input.")
        {
            file, outDir, formats, template, templateOut, allowUnsafe,
        };
        cmd.SetAction(parse =>
        {
            var path = parse.GetRequiredValue(file).ToString();
            if (InstrumentRunner.IsInstrument(path))
            {
                return InstrumentCommands.Emit(path, parse.GetValue(outDir)?.FullName, parse.GetValue(allowUnsafe), output, error);
            }

            var result = DesignRunner.TryRun(path, error);
            if (result is null)
            {
                return ExitCodes.BadInput;
            }

            if (UnsafeDesign.Refuse(result, parse.GetValue(allowUnsafe), error) is int refused)
            {
                return refused;
            }

            var chosenFormats = parse.GetValue(formats) ?? [];
            var chosenTemplate = parse.GetValue(template)?.ToString();
            var entries = ArtefactPlan.Entries(result, chosenFormats, chosenTemplate, parse.GetValue(templateOut));
            var artefacts = ArtefactPlan.Render(result, entries, error);
            if (artefacts is null)
            {
                return ExitCodes.BadInput;
            }

            var origins = ArtefactPlan.Origins(result, chosenFormats, chosenTemplate);
            var dir = parse.GetValue(outDir)?.FullName ?? ArtefactPlan.DefaultOutDir(path);
            using var batch = new OutputBatch();
            for (var i = 0; i < artefacts.Count; i++)
            {
                batch.Add(dir, "--out", artefacts[i].RelativePath, artefacts[i].ToBytes(), origins[i]);
            }

            if (batch.Commit(error) is not { } written)
            {
                return ExitCodes.BadInput;
            }

            foreach (var (file, unchanged) in written)
            {
                output.WriteLine(unchanged ? $"unchanged {file}" : $"wrote {file}");
            }

            return ExitCodes.Ok;
        });
        return cmd;
    }
}
