namespace CoefGen.Core.Study;

/// <summary>
/// One block of a report section: a banner, a paragraph, a table (first row is the header), a code list (collapsed
/// behind <see cref="Summary"/> when given), or an inline SVG chart.
/// </summary>
public sealed record ReportBlock
{
    /// <summary>A status line shown above everything else in the section, in a coloured box.</summary>
    public string? Banner { get; init; }

    /// <summary>Whether the banner warns (red) rather than confirms (green).</summary>
    public bool Alarm { get; init; }

    public string? Paragraph { get; init; }

    public IReadOnlyList<IReadOnlyList<ReportCell>>? Table { get; init; }

    public IReadOnlyList<string>? Lines { get; init; }

    /// <summary>When set, <see cref="Lines"/> are collapsed behind this one-line summary.</summary>
    public string? Summary { get; init; }

    /// <summary>Lines or table of machine values (codes, hashes, integers) printed as they are, not for reading as quantities.</summary>
    public bool Raw { get; init; }

    public string? Svg { get; init; }

    /// <summary>Caption of the chart, also used as its alt text in the Markdown version.</summary>
    public string? Caption { get; init; }
}
