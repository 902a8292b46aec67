namespace CoefGen.Core.Diagnostics;

/// <summary>
/// Raised by a Core stage when user input cannot be processed. Carries every diagnostic found,
/// so the CLI can print them all and exit with code 2. Never used for API misuse.
/// </summary>
public sealed class InputException : Exception
{
    public InputException(IReadOnlyList<Diagnostic> diagnostics)
        : base(diagnostics.Count == 0 ? "invalid input" : diagnostics[0].ToString())
    {
        Diagnostics = diagnostics;
    }

    public InputException(Diagnostic diagnostic)
        : this([diagnostic])
    {
    }

    public InputException()
        : this([])
    {
    }

    public InputException(string message)
        : base(message)
    {
        Diagnostics = [];
    }

    public InputException(string message, Exception innerException)
        : base(message, innerException)
    {
        Diagnostics = [];
    }

    public IReadOnlyList<Diagnostic> Diagnostics { get; }
}
