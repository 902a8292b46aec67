namespace CoefGen.Core.Study;

/// <summary>One bar: label, length (any unit, >= 0), the caption printed after it, and the colour of its source.</summary>
public sealed record ChartBar(string Label, double Value, string Caption, ChartStyle Style);
