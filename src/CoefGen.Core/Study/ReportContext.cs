namespace CoefGen.Core.Study;

/// <summary>What the report shows besides the design itself: the tool's version and the files `emit` would write.</summary>
public sealed record ReportContext(string ToolVersion, IReadOnlyList<EmittedFile> Emitted)
{
    /// <summary>For a cycle with a read count: the noise against read count (<see cref="ReadCountStudy"/>); null leaves the section out.</summary>
    public ReadCountCurve? ReadCounts { get; init; }
}
