namespace CoefGen.Core.Study;

/// <summary>Every point of a sweep in grid order (the last axis varies fastest).</summary>
public sealed record SweepResult(IReadOnlyList<SweepAxis> Axes, IReadOnlyList<SweepPoint> Points);
