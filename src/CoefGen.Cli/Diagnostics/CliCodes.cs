namespace CoefGen.Cli.Diagnostics;

/// <summary>
/// Stable codes of the command-line shell: CG00xx command line and files, CG6xxx sweeps, CG9xxx internal.
/// Tests assert on these; the wording may change.
/// </summary>
internal static class CliCodes
{
    /// <summary>An option or argument value cannot be parsed, or one is missing.</summary>
    public const string BadOption = "CG0010";

    /// <summary>The first word is not a command.</summary>
    public const string UnknownCommand = "CG0011";

    /// <summary>An option or argument the command does not have.</summary>
    public const string UnknownOption = "CG0012";

    /// <summary>An input file does not exist or cannot be read.</summary>
    public const string InputUnreadable = "CG0020";

    /// <summary>An input path is a directory, device, FIFO or socket, not a regular file.</summary>
    public const string InputNotRegular = "CG0021";

    /// <summary>An input file is larger than its limit.</summary>
    public const string InputTooLarge = "CG0022";

    /// <summary>The output folder (or one of its parents) is a file.</summary>
    public const string OutputFolderIsFile = "CG0030";

    /// <summary>The output folder cannot be created or written (permissions, read-only file system, full disk).</summary>
    public const string OutputNotWritable = "CG0031";

    /// <summary>An output file's path is a directory.</summary>
    public const string OutputIsDirectory = "CG0032";

    /// <summary>An output file's path resolves, through a symbolic link, outside the output folder.</summary>
    public const string OutputEscapes = "CG0033";

    /// <summary>An output file name is longer than the file system allows.</summary>
    public const string OutputNameTooLong = "CG0034";

    /// <summary>Any other file-system failure while reading or writing (the operating system's reason is printed).</summary>
    public const string FileSystem = "CG0039";

    /// <summary>The same key is varied twice.</summary>
    public const string SweepDuplicateKey = "CG6010";

    /// <summary>A varied key is not a key of the readout file.</summary>
    public const string SweepUnknownKey = "CG6011";

    /// <summary>No point of the sweep is a valid design.</summary>
    public const string SweepAllInvalid = "CG6012";

    /// <summary>Something the tool did not expect: a bug, reported in one line.</summary>
    public const string Internal = "CG9000";
}
