namespace CoefGen.Core.Study;

/// <summary>One block of a report section: a paragraph, a table (first row is the header), a code list, or an inline SVG chart.</summary>
public sealed record ReportBlock
{
    public string? Paragraph { get; init; }

    public IReadOnlyList<IReadOnlyList<ReportCell>>? Table { get; init; }

    public IReadOnlyList<string>? Lines { get; init; }

    public string? Svg { get; init; }

    /// <summary>Caption of the chart, also used as its alt text in the Markdown version.</summary>
    public string? Caption { get; init; }
}
