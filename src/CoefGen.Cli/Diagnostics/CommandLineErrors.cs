using System.CommandLine;
using System.CommandLine.Parsing;
using System.Text.RegularExpressions;
using CoefGen.Cli.Io;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout.Loading;

namespace CoefGen.Cli.Diagnostics;

/// <summary>
/// Turns the parser's errors into located diagnostics (the option or command is the location): plain words
/// instead of .NET type names, did-you-mean for a mistyped command or option, and a one-line pointer to --help
/// instead of the whole help text.
/// </summary>
internal static partial class CommandLineErrors
{
    public static int Report(ParseResult parse, RootCommand root, TextWriter error)
    {
        var diagnostics = From(parse, root);
        DiagnosticPrinter.PrintFailure(error, diagnostics);
        var command = parse.CommandResult.Command;
        error.WriteLine(ReferenceEquals(command, root)
            ? "Run `coefgen --help` for the commands."
            : $"Run `coefgen {command.Name} --help` for its options.");
        return ExitCodes.BadInput;
    }

    public static IReadOnlyList<Diagnostic> From(ParseResult parse, RootCommand root)
    {
        var list = new List<Diagnostic>();
        var commands = root.Subcommands.Select(c => c.Name).ToArray();
        var unknownCommand = parse.Errors.Any(e => ReferenceEquals(parse.CommandResult.Command, root)
            && UnrecognizedPattern().Match(e.Message) is { Success: true } m && !m.Groups[1].Value.StartsWith('-'));
        var reportedCommand = false;
        foreach (var e in parse.Errors)
        {
            var unrecognized = UnrecognizedPattern().Match(e.Message);
            var command = parse.CommandResult.Command;
            if (unrecognized.Success)
            {
                var word = unrecognized.Groups[1].Value;
                if (ReferenceEquals(command, root) && !word.StartsWith('-'))
                {
                    if (!reportedCommand)
                    {
                        list.Add(Error(CliCodes.UnknownCommand, "coefgen",
                            $"'{SafeText.Excerpt(word)}' is not a command{Suggestion(word, commands)} (commands: {string.Join(", ", commands)})"));
                    }

                    reportedCommand = true;
                    continue;
                }

                if (word.StartsWith('-'))
                {
                    var names = command.Options.SelectMany(o => o.Aliases.Prepend(o.Name)).Where(n => n.StartsWith("--", StringComparison.Ordinal)).Distinct().ToArray();
                    list.Add(Error(CliCodes.UnknownOption, SafeText.Excerpt(word),
                        $"`{Name(command, root)}` has no option '{SafeText.Excerpt(word)}'{Suggestion(word, names)}"));
                }
                else
                {
                    list.Add(Error(CliCodes.UnknownOption, Name(command, root), $"unexpected argument '{SafeText.Excerpt(word)}'"));
                }

                continue;
            }

            if (unknownCommand && e.Message.StartsWith("Required command", StringComparison.Ordinal))
            {
                continue;
            }

            if (ReferenceEquals(command, root) && e.Message.StartsWith("Required command", StringComparison.Ordinal))
            {
                list.Add(Error(CliCodes.BadOption, "coefgen", $"give a command: {string.Join(", ", commands)}"));
                continue;
            }

            var location = e.SymbolResult switch
            {
                OptionResult o => o.Option.Name,
                ArgumentResult a => $"<{a.Argument.Name}>",
                CommandResult c => Name(c.Command, root),
                _ => Name(command, root),
            };
            list.Add(Error(CliCodes.BadOption, location, Plain(e.Message)));
        }

        return list;
    }

    /// <summary>The parser's message with every .NET type name replaced by what the value must be.</summary>
    internal static string Plain(string message)
    {
        var parse = CannotParsePattern().Match(message);
        if (parse.Success)
        {
            return $"'{SafeText.Excerpt(parse.Groups[1].Value)}' is not {TypeWord(parse.Groups[3].Value)}";
        }

        var oneLine = WhitespacePattern().Replace(message, " ").Trim();
        return TypeNamePattern().Replace(SafeText.Excerpt(oneLine, 300), m => TypeWord(m.Groups[1].Value));
    }

    private static string TypeWord(string typeName) => typeName switch
    {
        _ when typeName.Contains("UInt64", StringComparison.Ordinal) || typeName.Contains("UInt32", StringComparison.Ordinal) => "an unsigned integer",
        _ when typeName.Contains("Int32", StringComparison.Ordinal) || typeName.Contains("Int64", StringComparison.Ordinal) => "an integer",
        _ when typeName.Contains("Double", StringComparison.Ordinal) || typeName.Contains("Single", StringComparison.Ordinal) || typeName.Contains("Decimal", StringComparison.Ordinal) => "a number",
        _ when typeName.Contains("Boolean", StringComparison.Ordinal) => "true or false",
        _ when typeName.Contains("DirectoryInfo", StringComparison.Ordinal) => "a folder path",
        _ when typeName.Contains("FileInfo", StringComparison.Ordinal) => "a file path",
        _ => "a valid value",
    };

    private static string Suggestion(string word, IReadOnlyList<string> candidates) =>
        DidYouMean.Suggest(word, candidates) is string best ? $"; did you mean '{best}'?" : "";

    private static string Name(Command command, RootCommand root) => ReferenceEquals(command, root) ? "coefgen" : command.Name;

    private static Diagnostic Error(string code, string location, string message) => Diagnostic.Error(code, SourceLocation.FileOnly(location), message);

    [GeneratedRegex("^Unrecognized command or argument '(.*)'\\.$", RegexOptions.Singleline)]
    private static partial Regex UnrecognizedPattern();

    [GeneratedRegex("^Cannot parse argument '(.*)' for (option|command|argument) '(?:.*)' as expected type '(.*)'\\.", RegexOptions.Singleline)]
    private static partial Regex CannotParsePattern();

    [GeneratedRegex("\\s+")]
    private static partial Regex WhitespacePattern();

    [GeneratedRegex("'?(System\\.[A-Za-z0-9_.`\\[\\]]+)'?")]
    private static partial Regex TypeNamePattern();
}
