using System.Globalization;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Pipeline;

/// <summary>
/// Warnings about a design that is computable but probably not what was meant. They never stop a design;
/// each has a stable code (README, "Plausibility warnings"). Thresholds are common practice, no source.
/// </summary>
public static class DesignPlausibility
{
    /// <summary>An analog bandwidth below rate / this factor is flagged (1000 samples per time constant).</summary>
    public const double BandwidthRatio = 1000;

    /// <summary>Six sigma of per-sample noise (99.7 % of excursions) wider than the full scale means the noise alone clips.</summary>
    public const double NoiseSpanSigmas = 6;

    /// <summary>
    /// Relative rms difference between the quantised and the real shape (after the best scale) above which the
    /// quantised weights no longer have the designed shape.
    /// </summary>
    public const double ShapeErrorLimit = 0.2;

    public static IReadOnlyList<Diagnostic> Check(ReadoutDescription d, SampledCovariance r, IReadOnlyList<double> chosen, IntegerDesign? datapath)
    {
        ArgumentNullException.ThrowIfNull(d);
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(chosen);
        var bag = new DiagnosticBag();
        Bandwidth(d, bag);
        NoiseSpan(d, r, bag);
        Ramp(d, bag);
        if (datapath is not null)
        {
            Shape(d, chosen, datapath, bag); // form = "two-stage" has no full integer table to compare
        }

        return bag.Items;
    }

    /// <summary>
    /// 1 - (c.h)^2 / (|c|^2 |h|^2), square-rooted: the rms difference between h and the best multiple of c,
    /// relative to |h| (0 for a perfect shape, 1 for an orthogonal one).
    /// </summary>
    public static double ShapeError(IReadOnlyList<double> h, IReadOnlyList<long> c)
    {
        ArgumentNullException.ThrowIfNull(h);
        ArgumentNullException.ThrowIfNull(c);
        double ch = 0, cc = 0, hh = 0;
        for (var k = 0; k < h.Count; k++)
        {
            ch += c[k] * h[k];
            cc += (double)c[k] * c[k];
            hh += h[k] * h[k];
        }

        return cc == 0 || hh == 0 ? 1 : Math.Sqrt(Math.Max(0, 1 - (ch * ch / (cc * hh))));
    }

    private static void Bandwidth(ReadoutDescription d, DiagnosticBag bag)
    {
        var n = d.Noise;
        foreach (var (key, value) in new[] { ("noise.bandwidth_hz", n.BandwidthHz), ("noise.front_end_pole_hz", n.FrontEndPoleHz) })
        {
            if (value is double hz && hz < d.Adc.RateHz / BandwidthRatio)
            {
                bag.Warning(ReadoutCodes.BandwidthFarBelowRate, d.LocationOf(key),
                    $"{G(hz)} Hz is {G(d.Adc.RateHz / hz)} times below the ADC rate {G(d.Adc.RateHz)} Hz; is a unit missing (\"{G(hz)} MHz\")? The key's unit is Hz", key);
            }
        }
    }

    private static void NoiseSpan(ReadoutDescription d, SampledCovariance r, DiagnosticBag bag)
    {
        var sigma = Math.Sqrt(Math.Max(0, r.TotalLag[0] + r.DigitalVarianceV2));
        if (NoiseSpanSigmas * sigma > d.Adc.FullScaleV)
        {
            bag.Warning(ReadoutCodes.NoiseAboveFullScale, d.LocationOf("noise"),
                $"the noise at one sample is {G(sigma)} V rms: {G(NoiseSpanSigmas)} sigma exceed the ADC's full scale of {G(d.Adc.FullScaleV)} V, so the noise alone clips the ADC; check the noise levels, gain and adc.full_scale_v", "noise");
        }
    }

    private static void Ramp(ReadoutDescription d, DiagnosticBag bag)
    {
        var w = d.Weights;
        var shortest = d.Timing.Cycle.Windows.Min(x => x.Samples.Count);
        if (w.Window == WindowShape.Trapezoid && w.RampSamples > 0 && 2L * w.RampSamples > shortest)
        {
            bag.Warning(ReadoutCodes.RampLongerThanWindow, d.LocationOf("weights.ramp_samples"),
                $"ramp_samples = {w.RampSamples.ToString(CultureInfo.InvariantCulture)}: two ramps do not fit in a {shortest.ToString(CultureInfo.InvariantCulture)}-sample window, so the trapezoid becomes a clipped triangle; use at most {(shortest / 2).ToString(CultureInfo.InvariantCulture)}", "weights.ramp_samples");
        }
    }

    private static void Shape(ReadoutDescription d, IReadOnlyList<double> h, IntegerDesign datapath, DiagnosticBag bag)
    {
        var error = ShapeError(h, datapath.Coefficients);
        if (error > ShapeErrorLimit)
        {
            var key = d.FixedPoint.CoefBits is null ? "fixed_point.target" : "fixed_point.coef_bits";
            bag.Warning(FixedPointCodes.ShapeLostInQuantisation, d.LocationOf(key),
                $"at {datapath.CoefBits.ToString(CultureInfo.InvariantCulture)}-bit coefficients the quantised weights differ from the real ones by {(100 * error).ToString("0.#", CultureInfo.InvariantCulture)} % rms (the designed shape is lost; noise penalty {datapath.NoisePenaltyPercent.ToString("0.##", CultureInfo.InvariantCulture)} %); widen coef_bits", key);
        }
    }

    private static string G(double v) => v.ToString("G4", CultureInfo.InvariantCulture);
}
