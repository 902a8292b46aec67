using System.CommandLine;
using CoefGen.Cli.Commands;
using CoefGen.Cli.Diagnostics;

namespace CoefGen.Cli;

/// <summary>
/// Builds the command tree and runs it with the given writers (tests pass their own). The one place where the
/// exit-code policy is enforced: parse errors become located diagnostics (exit 2), and anything a command did
/// not turn into a diagnostic goes through <see cref="LastResort"/> (exit 2 for the file system, 3 for a bug).
/// </summary>
internal static class CliApp
{
    public const string DebugOption = "--debug";

    public static RootCommand BuildRoot(TextWriter output, TextWriter error) =>
        new("coefgen: derive, predict, quantise, prove and emit correlated-sampling weights for image-sensor readout.\n" +
            "Start with `coefgen design <readout.toml>`; every command explains its options with --help.")
        {
            DesignCommand.Create(output, error),
            EmitCommand.Create(output, error),
            CheckCommand.Create(output, error),
            TargetsCommand.Create(output, error),
            SweepCommand.Create(output, error),
            ReportCommand.Create(output, error),
            VectorsCommand.Create(output, error),
            VerifyCommand.Create(output, error),
            FitCommand.Create(output, error),
            DiffCommand.Create(output, error),
            new Option<bool>(DebugOption) { Description = "On an internal error, print the stack trace.", Recursive = true },
        };

    public static int Run(string[] args, TextWriter output, TextWriter error)
    {
        var debug = args.Contains(DebugOption, StringComparer.Ordinal);
        try
        {
            var root = BuildRoot(output, error);
            var parse = root.Parse(args);
            if (parse.Errors.Count > 0)
            {
                return CommandLineErrors.Report(parse, root, error);
            }

            var config = new InvocationConfiguration { Output = output, Error = error, EnableDefaultExceptionHandler = false };
            return parse.Invoke(config);
        }
#pragma warning disable CA1031 // the last-resort handler: every exception becomes one line and an exit code
        catch (Exception ex)
#pragma warning restore CA1031
        {
            return LastResort.Report(ex, debug, error);
        }
    }
}
