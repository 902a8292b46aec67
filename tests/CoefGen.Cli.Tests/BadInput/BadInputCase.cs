namespace CoefGen.Cli.Tests.BadInput;

/// <summary>
/// One hostile input: <see cref="Arrange"/> plants files in a sandbox and returns the command line;
/// the run must exit <see cref="Exit"/> with a line starting at <see cref="Location"/> and naming <see cref="Code"/>.
/// </summary>
/// <param name="Name">Unique name (the theory's data).</param>
/// <param name="Arrange">Prepares the sandbox and returns the arguments.</param>
/// <param name="Code">The diagnostic code that must be printed.</param>
/// <param name="Location">The start of the diagnostic line: file:line:col, a file, or an option name.</param>
/// <param name="Exit">Expected exit code (2 unless said).</param>
/// <param name="Absent">Text that must not appear in the output (echoed file content, type names).</param>
internal sealed record BadInputCase(
    string Name,
    Func<Sandbox, string[]> Arrange,
    string Code,
    Func<Sandbox, string> Location,
    int Exit = 2,
    string? Absent = null);
