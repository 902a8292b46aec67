namespace CoefGen.Core.Diagnostics;

/// <summary>
/// One problem found in user input (readout file, PSD table, target profile, template).
/// Codes are stable: CG0xxx syntax, CG1xxx readout rules, CG2xxx arithmetic, CG3xxx templates,
/// CG4xxx vectors and dumps. Tests assert on codes, not on wording.
/// </summary>
public sealed record Diagnostic(Severity Severity, string Code, string Message, SourceLocation Location, string? Key = null)
{
    public static Diagnostic Error(string code, SourceLocation location, string message, string? key = null) =>
        new(Severity.Error, code, message, location, key);

    public static Diagnostic Warning(string code, SourceLocation location, string message, string? key = null) =>
        new(Severity.Warning, code, message, location, key);

    /// <summary>Renders as <c>file:line:col: error CG1203: [key] message</c>.</summary>
    public override string ToString()
    {
        var sev = Severity == Severity.Error ? "error" : "warning";
        var key = string.IsNullOrEmpty(Key) ? "" : $"{Key}: ";
        return $"{Location}: {sev} {Code}: {key}{Message}";
    }
}
