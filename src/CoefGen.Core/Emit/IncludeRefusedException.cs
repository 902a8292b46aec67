using Scriban.Parsing;
using Scriban.Syntax;

namespace CoefGen.Core.Emit;

/// <summary>Raised inside a render when an include names a file the sandbox does not allow.</summary>
public sealed class IncludeRefusedException : ScriptRuntimeException
{
    public IncludeRefusedException(SourceSpan span, string message, string code = TemplateDiagnosticCodes.IncludeRefused)
        : base(span, message)
    {
        Code = code;
    }

    /// <summary>The diagnostic code to report (CG3005, or CG3001 when the file does not exist).</summary>
    public string Code { get; }
}
