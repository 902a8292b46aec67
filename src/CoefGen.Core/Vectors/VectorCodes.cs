namespace CoefGen.Core.Vectors;

/// <summary>Stable diagnostic codes of the vector stage (CG4xxx).</summary>
public static class VectorCodes
{
    /// <summary>A vector file or the dump cannot be read.</summary>
    public const string FileUnreadable = "CG4001";

    /// <summary>The manifest is not the JSON the generator writes.</summary>
    public const string ManifestMalformed = "CG4002";

    /// <summary>The vectors were generated from a different readout file (SHA-256 differs).</summary>
    public const string OtherReadout = "CG4003";

    /// <summary>A line of the expected-values file cannot be read.</summary>
    public const string ExpectedMalformed = "CG4004";

    /// <summary>The expected-values file and the manifest disagree on the pixel count.</summary>
    public const string ExpectedCount = "CG4005";

    /// <summary>A vector file's SHA-256 differs from the manifest's (edited or damaged after generation).</summary>
    public const string FileTampered = "CG4006";

    /// <summary>`verify --acc` was asked, but the dump has no accumulator column.</summary>
    public const string DumpNoAccumulator = "CG4015";

    /// <summary>A dump line is neither a decimal nor a hex number.</summary>
    public const string DumpUnparsable = "CG4012";

    /// <summary>A dump value does not fit the output width.</summary>
    public const string DumpOutOfRange = "CG4013";

    /// <summary>The dump holds a different number of values than there are pixels.</summary>
    public const string DumpCount = "CG4014";

    /// <summary>The requested pixel count is outside 1..MaxPixels.</summary>
    public const string PixelCount = "CG4020";

    /// <summary>The design has more weighted samples than the generator factors.</summary>
    public const string TooManySamples = "CG4021";

    /// <summary>Warning: the circulant embedding of the noise was not non-negative and was clipped.</summary>
    public const string EmbeddingClipped = "CG4022";
}
