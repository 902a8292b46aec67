namespace CoefGen.Core.Study;

/// <summary>
/// One line of a chart; points with a non-finite value (or non-positive on a log axis) are left out; an X of NaN
/// breaks the line. Without a <paramref name="Style"/> the chart takes <see cref="ChartPalette.Cycle"/> by position.
/// </summary>
public sealed record ChartSeries(string Name, IReadOnlyList<double> X, IReadOnlyList<double> Y, bool Steps = false, ChartStyle? Style = null);
