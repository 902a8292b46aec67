namespace CoefGen.Core.Study;

/// <summary>A titled section of the design report.</summary>
public sealed record ReportSection(string Title, IReadOnlyList<ReportBlock> Blocks);
