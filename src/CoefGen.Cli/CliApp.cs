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
        };

    public static int Run(string[] args, TextWriter output, TextWriter error)
    {
        var root = BuildRoot(output, error);
        var parse = root.Parse(args);
        if (parse.Errors.Count > 0)
        {
            // A usage mistake is bad input: name it briefly (with the parser's did-you-mean) instead of printing the whole help.
            foreach (var e in parse.Errors)
            {
                error.WriteLine($"error: {e.Message}");
            }

            var command = parse.CommandResult.Command;
            var words = command.Subcommands.Select(c => c.Name).Concat(command.Options.SelectMany(o => o.Aliases.Prepend(o.Name))).ToList();
            foreach (var token in parse.UnmatchedTokens)
            {
                if (Core.Readout.Loading.DidYouMean.Suggest(token, words) is string near)
                {
                    error.WriteLine($"did you mean '{near}' for '{token}'?");
                }
            }

            error.WriteLine(command is RootCommand ? "usage: coefgen <command> ...; `coefgen --help` lists the commands" : $"usage: see `coefgen {command.Name} --help`");
            return ExitCodes.BadInput;
        }

        var config = new InvocationConfiguration { Output = output, Error = error };
        return parse.Invoke(config);
    }
}
