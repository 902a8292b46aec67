using Scriban;
using Scriban.Parsing;
using Scriban.Runtime;

namespace CoefGen.Core.Emit;

/// <summary>
/// Resolves includes only inside one folder (the including template's folder): absolute names, drive
/// letters, backslashes and anything that resolves outside the folder (.., symbolic links) are refused.
/// </summary>
internal sealed class RootedTemplateLoader : ITemplateLoader
{
    /// <summary>Largest included file (the same limit the command line puts on a template it reads).</summary>
    public const long MaxIncludeBytes = 4L << 20;

    private readonly string _root;

    public RootedTemplateLoader(string rootFolder)
    {
        _root = Path.TrimEndingDirectorySeparator(Path.GetFullPath(rootFolder));
    }

    public string GetPath(TemplateContext context, SourceSpan callerSpan, string templateName)
    {
        if (string.IsNullOrWhiteSpace(templateName) || Path.IsPathRooted(templateName)
            || templateName.Contains('\\', StringComparison.Ordinal) || templateName.Contains(':', StringComparison.Ordinal))
        {
            throw new IncludeRefusedException(callerSpan, $"include '{templateName}' refused: only relative paths inside the template folder are allowed");
        }

        var full = Path.GetFullPath(Path.Combine(_root, templateName));
        if (!IsInside(full))
        {
            throw new IncludeRefusedException(callerSpan, $"include '{templateName}' refused: it resolves outside the template folder");
        }

        var info = new FileInfo(full);
        if (info.LinkTarget is not null)
        {
            var target = info.ResolveLinkTarget(returnFinalTarget: true);
            if (target is null || !IsInside(Path.GetFullPath(target.FullName)))
            {
                throw new IncludeRefusedException(callerSpan, $"include '{templateName}' refused: it links outside the template folder");
            }
        }

        if (!info.Exists)
        {
            throw new IncludeRefusedException(callerSpan, $"include '{templateName}' not found in the template folder", TemplateDiagnosticCodes.TemplateNotFound);
        }

        if (info.Length > MaxIncludeBytes)
        {
            throw new IncludeRefusedException(callerSpan, $"include '{templateName}' refused: it is larger than {MaxIncludeBytes >> 20} MiB, the limit for a template");
        }

        return full;
    }

    public string Load(TemplateContext context, SourceSpan callerSpan, string templatePath) => File.ReadAllText(templatePath);

    public ValueTask<string?> LoadAsync(TemplateContext context, SourceSpan callerSpan, string templatePath) =>
        new(Load(context, callerSpan, templatePath));

    private bool IsInside(string full) =>
        full.StartsWith(_root + Path.DirectorySeparatorChar, StringComparison.Ordinal);
}
