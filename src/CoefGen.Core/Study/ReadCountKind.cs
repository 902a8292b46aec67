namespace CoefGen.Core.Study;

/// <summary>What "the number of reads" of a general cycle is, for the studies that vary it.</summary>
public enum ReadCountKind
{
    /// <summary>[timing.repeat] times: N copies of the repeated reads (repeated floating-gate reads, correlated multiple sampling, up-the-ramp).</summary>
    Repeat,

    /// <summary>Fowler-N: every ramp window (group of reads) N samples long, no repetition.</summary>
    GroupSize,
}
