namespace CoefGen.Core.Readout;

/// <summary>Shape used by the <see cref="WeightScheme.Weighted"/> scheme inside each window.</summary>
public enum WindowShape
{
    Triangle,
    Hann,
    Trapezoid,
    Explicit,
}
