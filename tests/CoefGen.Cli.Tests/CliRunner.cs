namespace CoefGen.Cli.Tests;

/// <summary>Runs the real command parser in-process with captured output.</summary>
internal static class CliRunner
{
    public sealed record Result(int ExitCode, string Output, string Error);

    public static Result Run(params string[] args)
    {
        using var output = new StringWriter();
        using var error = new StringWriter();
        var code = CliApp.Run(args, output, error);
        return new Result(code, output.ToString(), error.ToString());
    }
}
