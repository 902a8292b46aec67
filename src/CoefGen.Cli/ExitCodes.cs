namespace CoefGen.Cli;

/// <summary>Process exit codes of every command.</summary>
internal static class ExitCodes
{
    /// <summary>Success.</summary>
    public const int Ok = 0;

    /// <summary>check/verify found a difference; design/report --require-safe on a design the proof rejects.</summary>
    public const int Difference = 1;

    /// <summary>Bad input: command-line usage, readout file, target, template, vector or dump problems.</summary>
    public const int BadInput = 2;
}
