using MathNet.Numerics.Distributions;

namespace CoefGen.Core.Capture;

/// <summary>
/// Welch's method (Welch 1967): Hann-windowed segments with 50 % overlap, each with its mean removed,
/// periodograms averaged. One-sided density S(f_k) = 2 |X_k|² / (rate * sum w²), so a white sequence
/// of variance σ² has S = 2σ²/rate. Confidence band: S ν / χ²_ν quantiles, with the equivalent
/// degrees of freedom of overlapped Hann segments ν = 2K / (1 + 2 c² - 2 c² / K), c = 0.1667 the
/// correlation of adjacent half-overlapped Hann segments (Welch 1967; Harris 1978, table 1).
/// </summary>
public static class WelchEstimator
{
    /// <summary>Correlation of adjacent 50 %-overlapped Hann segments (Harris 1978, value from the table).</summary>
    public const double HannOverlapCorrelation = 0.1667;

    /// <summary>The default segment length: the largest power of two L &lt;= N / 8 (about 15 segments), at least 64.</summary>
    public static int DefaultSegmentLength(int samples)
    {
        var l = 64;
        while (l * 2 <= samples / 8)
        {
            l *= 2;
        }

        return l;
    }

    public static WelchSpectrum Estimate(IReadOnlyList<double> samplesV, double rateHz, int segmentLength, double confidence = 0.95)
    {
        ArgumentNullException.ThrowIfNull(samplesV);
        if (!int.IsPow2(segmentLength) || segmentLength < 8 || samplesV.Count < segmentLength)
        {
            throw new ArgumentException($"segment length must be a power of two >= 8 and at most the {samplesV.Count} samples");
        }

        if (!(rateHz > 0) || !(confidence > 0 && confidence < 1))
        {
            throw new ArgumentException("rate must be > 0 and confidence in (0, 1)");
        }

        var l = segmentLength;
        var hop = l / 2;
        var segments = ((samplesV.Count - l) / hop) + 1;
        var window = new double[l];
        var sumW2 = 0.0;
        for (var n = 0; n < l; n++)
        {
            // Periodic Hann: the form whose 50 % overlaps sum to a constant.
            window[n] = 0.5 - (0.5 * Math.Cos(2 * Math.PI * n / l));
            sumW2 += window[n] * window[n];
        }

        var bins = (l / 2) - 1;
        var acc = new double[bins];
        var fft = new CoefGen.Core.Weights.Structured.Fft(l);
        var re = new double[l];
        var im = new double[l];
        for (var s = 0; s < segments; s++)
        {
            var start = s * hop;
            var mean = 0.0;
            for (var n = 0; n < l; n++)
            {
                mean += samplesV[start + n];
            }

            mean /= l;
            for (var n = 0; n < l; n++)
            {
                re[n] = (samplesV[start + n] - mean) * window[n];
                im[n] = 0;
            }

            fft.Forward(re, im); // only |X_k|^2 is used, so the transform's sign convention does not matter
            for (var k = 1; k <= bins; k++)
            {
                acc[k - 1] += (re[k] * re[k]) + (im[k] * im[k]);
            }
        }

        var scale = 2.0 / (rateHz * sumW2 * segments);
        var c2 = HannOverlapCorrelation * HannOverlapCorrelation;
        var nu = segments == 1 ? 2.0 : 2.0 * segments / (1 + (2 * c2) - (2 * c2 / segments));
        var tail = (1 - confidence) / 2;
        var lowFactor = nu / ChiSquared.InvCDF(nu, 1 - tail);
        var highFactor = nu / ChiSquared.InvCDF(nu, tail);
        var f = new double[bins];
        var psd = new double[bins];
        var lo = new double[bins];
        var hi = new double[bins];
        for (var k = 0; k < bins; k++)
        {
            f[k] = (k + 1) * rateHz / l;
            psd[k] = acc[k] * scale;
            lo[k] = psd[k] * lowFactor;
            hi[k] = psd[k] * highFactor;
        }

        return new WelchSpectrum(f, psd, lo, hi, l, segments, nu, confidence, rateHz);
    }
}
