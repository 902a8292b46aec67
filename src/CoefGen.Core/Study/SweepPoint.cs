namespace CoefGen.Core.Study;

/// <summary>One grid point: the value of each axis (same order as the axes) and its outcome.</summary>
public sealed record SweepPoint(int Index, IReadOnlyList<double> Values, PointOutcome Outcome);
