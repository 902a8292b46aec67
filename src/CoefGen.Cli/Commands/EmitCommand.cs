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
            "Render the chosen scheme's integer design through the templates and write each file atomically " +
            "(temporary file, then rename). Nothing is written when any template or path fails, or when the width proof says the " +
            "datapath can overflow (unless --allow-unsafe). Exit 2 on bad input.")
        {
            file, outDir, formats, template, templateOut, allowUnsafe,
        };
        cmd.SetAction(parse =>
        {
            var path = parse.GetRequiredValue(file).ToString();
            var result = DesignRunner.TryRun(path, error);
            if (result is null)
            {
                return ExitCodes.BadInput;
            }

            if (UnsafeDesign.Refuse(result, parse.GetValue(allowUnsafe), error) is int refused)
            {
                return refused;
            }

            var entries = ArtefactPlan.Entries(result, parse.GetValue(formats) ?? [], parse.GetValue(template)?.ToString(), parse.GetValue(templateOut));
            var artefacts = ArtefactPlan.Render(result, entries, error);
            if (artefacts is null)
            {
                return ExitCodes.BadInput;
            }

            var dir = parse.GetValue(outDir)?.FullName ?? ArtefactPlan.DefaultOutDir(path);
            foreach (var a in artefacts)
            {
                var target = Path.Combine(dir, a.RelativePath);
                AtomicFile.WriteAllBytes(target, a.ToBytes());
                output.WriteLine($"wrote {Path.GetRelativePath(Directory.GetCurrentDirectory(), target)}");
            }

            return ExitCodes.Ok;
        });
        return cmd;
    }
}
