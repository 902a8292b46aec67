namespace CoefGen.Core.Study;

/// <summary>What the report shows besides the design itself: the tool's version and the files `emit` would write.</summary>
public sealed record ReportContext(string ToolVersion, IReadOnlyList<EmittedFile> Emitted);
