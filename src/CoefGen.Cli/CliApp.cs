using System.CommandLine;
using CoefGen.Cli.Commands;

namespace CoefGen.Cli;

/// <summary>Builds the command tree and runs it with the given writers (tests pass their own).</summary>
internal static class CliApp
{
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
        };

    public static int Run(string[] args, TextWriter output, TextWriter error)
    {
        var root = BuildRoot(output, error);
        var parse = root.Parse(args);
        var config = new InvocationConfiguration { Output = output, Error = error };
        return parse.Invoke(config);
    }
}
