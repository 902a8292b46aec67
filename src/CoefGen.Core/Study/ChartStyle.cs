namespace CoefGen.Core.Study;

/// <summary>How one series is drawn: stroke colour and SVG dash pattern ("" is a solid line).</summary>
public sealed record ChartStyle(string Colour, string Dash, double Width = 1.8);
