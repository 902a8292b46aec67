using System.Security.Cryptography;
using System.Text;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout.Loading;
using Tomlyn;
using Tomlyn.Parsing;

namespace CoefGen.Core.Readout;

/// <summary>Loads and validates a readout file (TOML). Pure: the caller supplies the bytes and a way to read files the readout names.</summary>
public static class ReadoutLoader
{
    /// <summary>Parses and checks a readout file, collecting every problem.</summary>
    /// <param name="content">The readout file's bytes (UTF-8).</param>
    /// <param name="sourcePath">The file's path as given, used in messages and as <see cref="ReadoutDescription.SourcePath"/>.</param>
    /// <param name="readRelative">Reads a path written in the file (psd_table) relative to the readout file; null when it cannot be read.</param>
    public static LoadResult Load(byte[] content, string sourcePath, Func<string, byte[]?> readRelative)
    {
        ArgumentNullException.ThrowIfNull(readRelative);
        return Load(content, sourcePath, (string relative, out string? problem) =>
        {
            problem = null;
            return readRelative(relative);
        });
    }

    /// <summary>Parses and checks a readout file; <paramref name="readRelative"/> also says why a named file cannot be read.</summary>
    public static LoadResult Load(byte[] content, string sourcePath, RelativeFileReader readRelative)
    {
        ArgumentNullException.ThrowIfNull(content);
        ArgumentNullException.ThrowIfNull(sourcePath);
        ArgumentNullException.ThrowIfNull(readRelative);
        var context = new LoadContext(sourcePath, readRelative);
        var text = Decode(content);
        if (text is null)
        {
            context.Error(ReadoutCodes.TomlSyntax, new SourceLocation(sourcePath, 1, 1), "",
                "the file is not UTF-8 text; a readout file is TOML");
            return new LoadResult(null, context.Bag.Items);
        }

        var document = Parse(text, sourcePath, context);
        if (document is null)
        {
            return new LoadResult(null, context.Bag.Items);
        }

        var sha = Convert.ToHexStringLower(SHA256.HashData(content));
        var tree = TomlTreeBuilder.Build(document, sourcePath);
        var description = DescriptionReader.Read(tree, context, sha);
        return new LoadResult(description, context.Bag.Items);
    }

    private static string? Decode(byte[] content)
    {
        try
        {
            var text = new UTF8Encoding(encoderShouldEmitUTF8Identifier: false, throwOnInvalidBytes: true).GetString(content);
            return text.Length > 0 && text[0] == '\uFEFF' ? text[1..] : text;
        }
        catch (DecoderFallbackException)
        {
            return null;
        }
    }

    private static Tomlyn.Syntax.DocumentSyntax? Parse(string text, string sourcePath, LoadContext context)
    {
        Tomlyn.Syntax.DocumentSyntax document;
        try
        {
            document = SyntaxParser.Parse(text, sourcePath, true);
        }
        catch (TomlException e)
        {
            context.Error(ReadoutCodes.TomlSyntax, new SourceLocation(sourcePath, Math.Max(1, e.Line ?? 1), Math.Max(0, e.Column ?? 0)), "", $"TOML syntax: {e.Message}");
            return null;
        }

        if (!document.HasErrors)
        {
            return document;
        }

        foreach (var message in document.Diagnostics)
        {
            if (message.Kind == Tomlyn.Syntax.DiagnosticMessageKind.Error)
            {
                var location = new SourceLocation(sourcePath, message.Span.Start.Line + 1, message.Span.Start.Column + 1);
                context.Error(ReadoutCodes.TomlSyntax, location, "", $"TOML syntax: {message.Message}");
            }
        }

        return null;
    }
}
