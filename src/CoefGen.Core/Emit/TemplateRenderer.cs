using System.Globalization;
using CoefGen.Core.Diagnostics;
using Scriban;
using Scriban.Functions;
using Scriban.Parsing;
using Scriban.Runtime;
using Scriban.Syntax;

namespace CoefGen.Core.Emit;

/// <summary>
/// Renders one template against a <see cref="TemplateModel"/> in a sandbox: a fresh context per render,
/// strict variables, no relaxed member or indexer access, only the model's plain values visible, bounded
/// loops and recursion, no clock (<c>date</c> removed), includes only from the template's own folder,
/// output limit reached = error. Problems come back as CG3xxx diagnostics with 1-based line and column.
/// </summary>
public static class TemplateRenderer
{
    /// <summary>Upper bound on rendered characters (and on any one string conversion).</summary>
    public const int OutputLimitChars = 32 * 1024 * 1024;

    /// <summary>Renders a template file; includes resolve inside the file's folder.</summary>
    public static RenderResult RenderFile(TemplateModel model, string templatePath, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(templatePath);
        string text;
        try
        {
            text = File.ReadAllText(templatePath);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return RenderResult.Failed(Diagnostic.Error(
                TemplateDiagnosticCodes.TemplateNotFound, SourceLocation.FileOnly(templatePath), $"cannot read template: {e.Message}"));
        }

        var folder = Path.GetDirectoryName(Path.GetFullPath(templatePath)) ?? ".";
        return Render(model, text, templatePath, folder, cancellationToken);
    }

    /// <summary>
    /// Renders <paramref name="templateText"/>; <paramref name="templateName"/> names it in diagnostics and
    /// <paramref name="includeFolder"/> is the only folder includes may read from.
    /// </summary>
    public static RenderResult Render(
        TemplateModel model, string templateText, string templateName, string includeFolder, CancellationToken cancellationToken = default)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(templateText);
        ArgumentNullException.ThrowIfNull(templateName);
        ArgumentNullException.ThrowIfNull(includeFolder);

        var template = Template.Parse(templateText, templateName);
        if (template.HasErrors)
        {
            var diags = template.Messages
                .Where(m => m.Type == ParserMessageType.Error)
                .Select(m => Located(TemplateDiagnosticCodes.SyntaxError, m.Span, templateName, m.Message))
                .ToList();
            return new RenderResult(null, diags);
        }

        var context = CreateContext(model, includeFolder, cancellationToken);
        try
        {
            var text = template.Render(context);
            cancellationToken.ThrowIfCancellationRequested();
            return new RenderResult(OutputText.Normalize(text), []);
        }
        catch (ScriptRuntimeException e)
        {
            cancellationToken.ThrowIfCancellationRequested();
            return RenderResult.Failed(Located(Classify(e), e.Span, templateName, e.OriginalMessage));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return RenderResult.Failed(Diagnostic.Error(
                TemplateDiagnosticCodes.TemplateNotFound, SourceLocation.FileOnly(templateName), $"cannot read included template: {e.Message}"));
        }
    }

    private static TemplateContext CreateContext(TemplateModel model, string includeFolder, CancellationToken token)
    {
        // A private builtin object per render: removing "date" must not touch any shared instance.
        var builtins = new BuiltinFunctions();
        builtins.Remove("date");
        var context = new TemplateContext(builtins)
        {
            StrictVariables = true,
            EnableRelaxedMemberAccess = false,
            EnableRelaxedIndexerAccess = false,
            EnableRelaxedTargetAccess = false,
            EnableRelaxedFunctionAccess = false,
            LoopLimit = Math.Max(10_000, 4 * model.LargestArrayLength),
            RecursiveLimit = 32,
            RegexTimeOut = TimeSpan.FromSeconds(1),
            NewLine = "\n",
            LimitToString = OutputLimitChars,
            OutputLimit = OutputLimitChars,
            OnStringLimit = ScriptLimitBehavior.Throw,
            OnOutputLimit = ScriptLimitBehavior.Throw,
            MemberFilter = _ => false,
            TemplateLoader = new RootedTemplateLoader(includeFolder),
            CancellationToken = token,
        };
        context.PushCulture(CultureInfo.InvariantCulture);
        context.PushGlobal(model.Globals);

        // Template assignments land in this scratch scope, never in the shared read-only model.
        context.PushGlobal(new ScriptObject());
        return context;
    }

    private static string Classify(ScriptRuntimeException e)
    {
        var message = e.OriginalMessage ?? "";
        return e switch
        {
            IncludeRefusedException r => r.Code,
            ScriptParserRuntimeException => TemplateDiagnosticCodes.SyntaxError,
            _ when message.Contains("iteration limit", StringComparison.OrdinalIgnoreCase)
                || message.Contains("LoopLimit", StringComparison.Ordinal) => TemplateDiagnosticCodes.LoopLimit,
            _ when message.Contains("recursive depth limit", StringComparison.OrdinalIgnoreCase) => TemplateDiagnosticCodes.RecursionLimit,
            _ when message.Contains("limit", StringComparison.OrdinalIgnoreCase)
                && (message.Contains("output", StringComparison.OrdinalIgnoreCase) || message.Contains("string", StringComparison.OrdinalIgnoreCase))
                => TemplateDiagnosticCodes.OutputLimit,
            _ => TemplateDiagnosticCodes.RuntimeError,
        };
    }

    private static Diagnostic Located(string code, SourceSpan span, string templateName, string message)
    {
        var file = string.IsNullOrEmpty(span.FileName) ? templateName : span.FileName;
        return Diagnostic.Error(code, new SourceLocation(file, span.Start.Line + 1, span.Start.Column + 1), message);
    }
}
