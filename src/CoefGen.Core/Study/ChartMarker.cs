namespace CoefGen.Core.Study;

/// <summary>A labelled vertical line at one x (the charge transfer instant).</summary>
public sealed record ChartMarker(double X, string Label);
