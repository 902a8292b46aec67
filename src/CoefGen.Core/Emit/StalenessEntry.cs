namespace CoefGen.Core.Emit;

/// <summary>The staleness of one output path.</summary>
public sealed record StalenessEntry(string RelativePath, StalenessStatus Status);
