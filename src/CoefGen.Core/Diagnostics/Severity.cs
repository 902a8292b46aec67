namespace CoefGen.Core.Diagnostics;

/// <summary>How serious a problem in user input is.</summary>
public enum Severity
{
    Warning,
    Error,
}
