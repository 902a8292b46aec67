namespace CoefGen.Core.Readout;

/// <summary>Stable diagnostic codes of [weights] form = "two-stage".</summary>
public static class TwoStageCodes
{
    /// <summary>The cycle is not N >= 2 identical reads (a classic file, a cycle without a repetition covering every window, reads that differ).</summary>
    public const string NotIdenticalReads = "CG1270";

    /// <summary>Two-stage weights with drift rejection (the two-stage design has no slope constraint).</summary>
    public const string WithDriftRejection = "CG1271";

    /// <summary>Two-stage weights with shot noise of an integrating charge (not stationary across reads).</summary>
    public const string WithShotNoise = "CG1272";

    /// <summary>Two-stage weights for a scheme other than optimal (the two-stage design is the joint optimum).</summary>
    public const string SchemeNotOptimal = "CG1273";

    /// <summary>Two-stage weights with noise.capture (the two-stage design works on the model's per-read blocks, not on a measured matrix).</summary>
    public const string WithCapture = "CG1275";

    /// <summary>A stage that takes the full table only (instrument files, diff) was given a two-stage design.</summary>
    public const string FullTableOnly = "CG1274";
}
