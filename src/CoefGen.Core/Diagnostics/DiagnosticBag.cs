namespace CoefGen.Core.Diagnostics;

/// <summary>Collects every problem of one input so they can all be reported at once.</summary>
public sealed class DiagnosticBag
{
    private readonly List<Diagnostic> _items = [];

    public IReadOnlyList<Diagnostic> Items => _items;

    public bool HasErrors => _items.Exists(d => d.Severity == Severity.Error);

    public void Add(Diagnostic diagnostic) => _items.Add(diagnostic);

    public void AddRange(IEnumerable<Diagnostic> diagnostics) => _items.AddRange(diagnostics);

    public void Error(string code, SourceLocation location, string message, string? key = null) =>
        _items.Add(Diagnostic.Error(code, location, message, key));

    public void Warning(string code, SourceLocation location, string message, string? key = null) =>
        _items.Add(Diagnostic.Warning(code, location, message, key));

    /// <summary>Throws <see cref="InputException"/> when any error was collected.</summary>
    public void ThrowIfErrors()
    {
        if (HasErrors)
        {
            throw new InputException(_items);
        }
    }
}
