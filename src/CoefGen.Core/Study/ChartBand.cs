namespace CoefGen.Core.Study;

/// <summary>A shaded span of the x axis with a label (a sampling window).</summary>
public sealed record ChartBand(double From, double To, string Label, string Fill);
