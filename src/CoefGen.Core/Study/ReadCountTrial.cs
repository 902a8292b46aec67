namespace CoefGen.Core.Study;

/// <summary>One read count that <see cref="ReadCountSearch"/> designed: N, the pixel cycle it gives, and the outcome.</summary>
public sealed record ReadCountTrial(int Reads, int PixelSamples, PointOutcome Outcome);
