namespace CoefGen.Core.Diagnostics;

/// <summary>Where in a user file a problem sits. Line and column are 1-based; 0 means unknown.</summary>
public sealed record SourceLocation(string File, int Line, int Column)
{
    public static SourceLocation FileOnly(string file) => new(file, 0, 0);

    public override string ToString() =>
        Line <= 0 ? File : Column <= 0 ? $"{File}:{Line}" : $"{File}:{Line}:{Column}";
}
