using System.Globalization;
using System.Text;
using Tomlyn.Syntax;

namespace CoefGen.Core.Study;

/// <summary>
/// Sets one numeric key of a readout file's TOML text by its dotted path (as in
/// <see cref="Readout.ReadoutDescription.KeyLocations"/>, e.g. "adc.rate_hz", "noise.source[0].flicker_corner_hz"),
/// leaving every other byte as written, so the edited text is validated by the loader exactly like a user file.
/// A key written in its alternative unit (count_ns for count, pixel_ns for pixel_samples, ...) is replaced by the
/// named key; a key that is not written is added to its table.
/// </summary>
public static class ReadoutTextEditor
{
    private static readonly Dictionary<string, string> Alternatives = new(StringComparer.Ordinal)
    {
        ["count"] = "count_ns", ["count_ns"] = "count",
        ["start"] = "start_ns", ["start_ns"] = "start",
        ["pixel_samples"] = "pixel_ns", ["pixel_ns"] = "pixel_samples",
        ["transfer_sample"] = "transfer_ns", ["transfer_ns"] = "transfer_sample",
    };

    /// <summary>Returns the edited text, or null with <paramref name="error"/> set when the path cannot be edited.</summary>
    public static string? SetNumber(string text, string dottedPath, double value, out string? error)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(dottedPath);
        if (!double.IsFinite(value))
        {
            error = $"{dottedPath}: the value is not a finite number";
            return null;
        }

        return SetLiteral(text, dottedPath, Literal(value), out error);
    }

    /// <summary>
    /// Like <see cref="SetNumber"/> with a TOML literal written as is (a number, a quoted string such as "20 MHz", a boolean);
    /// the caller vouches that <paramref name="literal"/> is one valid TOML value.
    /// </summary>
    public static string? SetLiteral(string text, string dottedPath, string literal, out string? error)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(dottedPath);
        ArgumentNullException.ThrowIfNull(literal);
        var document = Tomlyn.Parsing.SyntaxParser.Parse(text, "edit", true);
        if (document.HasErrors)
        {
            error = "the readout file is not valid TOML; run `coefgen design` on it for the details";
            return null;
        }

        var split = dottedPath.LastIndexOf('.');
        var parent = split < 0 ? "" : dottedPath[..split];
        var key = split < 0 ? dottedPath : dottedPath[(split + 1)..];
        if (key.Length == 0 || key.Contains('[', StringComparison.Ordinal))
        {
            error = $"'{dottedPath}' does not name a key (write e.g. adc.rate_hz or noise.source[0].flicker_corner_hz)";
            return null;
        }

        var index = TomlIndex.Build(document);
        if (index.Values.TryGetValue(dottedPath, out var found))
        {
            error = null;
            return Replace(text, found.Value!.Span.Start.Offset, found.Value.Span.End.Offset, literal);
        }

        if (Alternatives.TryGetValue(key, out var other) && index.Values.TryGetValue(Join(parent, other), out var alt))
        {
            error = null;
            return Replace(text, alt.Key!.Span.Start.Offset, alt.Value!.Span.End.Offset, $"{key} = {literal}");
        }

        if (index.Tables.TryGetValue(parent, out var insertAt))
        {
            error = null;
            var prefix = insertAt > 0 && text[insertAt - 1] != '\n' ? "\n" : "";
            return text.Insert(insertAt, $"{prefix}{key} = {literal}\n");
        }

        if (parent.Contains('[', StringComparison.Ordinal) || index.Prefixes.Contains(parent))
        {
            error = $"'{dottedPath}' cannot be set: its table [{parent}] is not written as a [table] header in the file";
            return null;
        }

        error = null;
        var separator = text.Length > 0 && !text.EndsWith('\n') ? "\n" : "";
        return parent.Length == 0
            ? $"{key} = {literal}\n{text}"
            : $"{text}{separator}\n[{parent}]\n{key} = {literal}\n";
    }

    /// <summary>TOML literal: an integer when the value is a whole number that fits, else the shortest round-trip float.</summary>
    public static string Literal(double value)
    {
        if (Math.Abs(value) < 1e15 && value == Math.Floor(value))
        {
            return ((long)value).ToString(CultureInfo.InvariantCulture);
        }

        var r = value.ToString("R", CultureInfo.InvariantCulture);
        return r.Contains('.', StringComparison.Ordinal) || r.Contains('E', StringComparison.Ordinal) ? r : r + ".0";
    }

    private static string Join(string parent, string key) => parent.Length == 0 ? key : parent + "." + key;

    /// <summary>Replaces the inclusive character range [start, end] (Tomlyn spans end on the last character).</summary>
    private static string Replace(string text, int start, int endInclusive, string with)
    {
        var sb = new StringBuilder(text.Length + with.Length);
        sb.Append(text, 0, start).Append(with).Append(text, endInclusive + 1, text.Length - endInclusive - 1);
        return sb.ToString();
    }
}
