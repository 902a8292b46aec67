namespace CoefGen.Core.Study;

/// <summary>One line of a chart; points with a non-finite value (or non-positive on a log axis) are left out; an X of NaN breaks the line.</summary>
public sealed record ChartSeries(string Name, IReadOnlyList<double> X, IReadOnlyList<double> Y, bool Steps = false);
