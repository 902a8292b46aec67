namespace CoefGen.Cli;

/// <summary>Process exit codes of every command (the table in the README's "Exit codes and diagnostics").</summary>
internal static class ExitCodes
{
    /// <summary>Success.</summary>
    public const int Ok = 0;

    /// <summary>Only a result the user asked for: check found a stale or missing file, verify a mismatch (and an unsafe design where a command is asked to report one).</summary>
    public const int Difference = 1;

    /// <summary>Bad input or environment: command line, readout file, target, template, vector, dump, file-system problems.</summary>
    public const int BadInput = 2;

    /// <summary>Internal error: something the tool did not expect (a bug); one line, a stack trace only with --debug.</summary>
    public const int Internal = 3;
}
