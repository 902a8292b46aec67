namespace CoefGen.Core.Emit;

/// <summary>Stable diagnostic codes of the emit stage (CG3xxx). Tests assert on these, not on wording.</summary>
public static class TemplateDiagnosticCodes
{
    /// <summary>A template file or built-in template name could not be found or read.</summary>
    public const string TemplateNotFound = "CG3001";

    /// <summary>The template does not parse.</summary>
    public const string SyntaxError = "CG3002";

    /// <summary>Evaluation failed: unknown variable or member, bad index, write to the read-only model, ...</summary>
    public const string RuntimeError = "CG3003";

    /// <summary>A loop ran more iterations than the loop limit allows.</summary>
    public const string LoopLimit = "CG3004";

    /// <summary>An include named an absolute path or a file outside the template's folder.</summary>
    public const string IncludeRefused = "CG3005";

    /// <summary>The output or a string conversion reached its size limit (Scriban would otherwise truncate silently).</summary>
    public const string OutputLimit = "CG3006";

    /// <summary>Function calls nested deeper than the recursion limit.</summary>
    public const string RecursionLimit = "CG3007";

    /// <summary>An output path is absolute, uses backslashes or a drive letter, or escapes the output folder.</summary>
    public const string OutputPathRefused = "CG3010";

    /// <summary>Two emit entries write the same output path.</summary>
    public const string DuplicateOutputPath = "CG3011";
}
