using System.Globalization;

namespace CoefGen.Core.Readout.Loading;

/// <summary>
/// Physically meaningful bounds of every readout number, checked before any computation so that no value can
/// reach a library check, an overflow or an Infinity. The bounds are generous (orders of magnitude beyond any
/// real readout chain, common practice, no source) and keep every derived quantity (variances, lag tables,
/// LSB sizes) far from the double range: the largest noise power is (1e6 nV/rtHz x 1e6 gain)^2 x 1e12 Hz = 1e36 V^2.
/// </summary>
internal static class PhysicalRange
{
    public static readonly NumberRule RateHz = Between(1e-6, 1e12, "Hz");

    public static readonly NumberRule FullScaleV = Between(1e-9, 1e3, "V");

    public static readonly NumberRule NoiseLsb = Between(0, 1e6, "LSB");

    public static readonly NumberRule ConversionGainUvPerE = Between(1e-9, 1e6, "uV/e");

    /// <summary>Positive: a negative gain is refused with its own message (see <see cref="SensorSectionReader"/>).</summary>
    public static readonly NumberRule Gain = Between(1e-9, 1e6, "V/V");

    public static readonly NumberRule FrequencyHz = Between(1e-3, 1e12, "Hz");

    public static readonly NumberRule CornerHz = Between(0, 1e12, "Hz");

    public static readonly NumberRule LowCutoffHz = Between(1e-12, 1e12, "Hz");

    public static readonly NumberRule WhiteNvPerRtHz = Between(0, 1e6, "nV/rtHz");

    /// <summary>The transfer instant lies inside the cycle, so within the sample counts the timing allows.</summary>
    public static readonly NumberRule TransferSample = Between(0, TimingSectionReader.MaxSamples, "samples");

    /// <summary>1e18 ns is 30 years: any cycle is shorter.</summary>
    public static readonly NumberRule TransferNs = Between(0, 1e18, "ns");

    /// <summary>Explicit window shapes are relative weights; the bound keeps their sums finite.</summary>
    public static readonly NumberRule ShapeWeight = Between(0, 1e12, "");

    /// <summary>Densities of a PSD table in nV/rtHz.</summary>
    public const double MaxTableDensityNv = 1e9;

    /// <summary>Frequencies of a PSD table in Hz.</summary>
    public const double MaxTableFrequencyHz = 1e12;

    private static NumberRule Between(double min, double max, string unit)
    {
        var u = unit.Length == 0 ? "" : " " + unit;
        return new NumberRule(v => v >= min && v <= max, $"a number from {G(min)}{u} to {G(max)}{u}");
    }

    private static string G(double v) => v.ToString("G6", CultureInfo.InvariantCulture);
}
