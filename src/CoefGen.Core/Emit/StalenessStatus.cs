namespace CoefGen.Core.Emit;

/// <summary>How a file on disk compares with what would be emitted now.</summary>
public enum StalenessStatus
{
    /// <summary>Byte-identical to the fresh rendering.</summary>
    UpToDate,

    /// <summary>Present but different.</summary>
    Stale,

    /// <summary>Not present.</summary>
    Missing,
}
