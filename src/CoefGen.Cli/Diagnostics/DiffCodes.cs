namespace CoefGen.Cli.Diagnostics;

/// <summary>Codes of `coefgen diff` (command-line and file problems, CG0xxx).</summary>
internal static class DiffCodes
{
    /// <summary>Neither or both of a second file and --rev.</summary>
    public const string Arguments = "CG0050";

    /// <summary>The file cannot be read at the given git revision (not a repository, unknown revision, file absent).</summary>
    public const string Revision = "CG0051";
}
