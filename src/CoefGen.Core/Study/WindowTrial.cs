namespace CoefGen.Core.Study;

/// <summary>One layout that a window search designed, with its outcome.</summary>
public sealed record WindowTrial(WindowLayout Layout, PointOutcome Outcome);
