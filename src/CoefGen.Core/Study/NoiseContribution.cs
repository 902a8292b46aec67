using CoefGen.Core.Weights.Structured;

namespace CoefGen.Core.Study;

/// <summary>
/// Where a scheme's noise comes from: the density |H(f)|^2 S(f) on an evenly spaced grid from 0 to Nyquist and its
/// running integral (the variance collected below f). H(f) = sum_k h_k exp(-j 2 pi f n_k / rate) over the sample
/// indices n_k, evaluated as a zero-padded FFT (|H|^2 does not depend on the time origin).
/// </summary>
public sealed record NoiseContribution(IReadOnlyList<double> FrequencyHz, IReadOnlyList<double> PowerResponse, IReadOnlyList<double> Density, IReadOnlyList<double> Cumulative)
{
    /// <summary>The running integral at Nyquist.</summary>
    public double BelowNyquist => Cumulative[^1];

    /// <param name="h">Weights.</param>
    /// <param name="sampleIndex">Sample index of each weight within the pixel cycle (any origin).</param>
    /// <param name="rateHz">ADC sample rate.</param>
    /// <param name="psd">One-sided PSD S(f), e.g. V^2/Hz.</param>
    /// <param name="minBins">At least this many grid steps from 0 to Nyquist (rounded up to a power of two).</param>
    public static NoiseContribution Compute(IReadOnlyList<double> h, IReadOnlyList<int> sampleIndex, double rateHz, Func<double, double> psd, int minBins = 2048)
    {
        ArgumentNullException.ThrowIfNull(h);
        ArgumentNullException.ThrowIfNull(sampleIndex);
        ArgumentNullException.ThrowIfNull(psd);
        if (h.Count == 0 || h.Count != sampleIndex.Count || rateHz <= 0)
        {
            throw new ArgumentException("weights and sample indices must be non-empty and of equal length, the rate positive");
        }

        var first = sampleIndex.Min();
        var span = sampleIndex.Max() - first + 1;
        var length = (int)System.Numerics.BitOperations.RoundUpToPowerOf2((uint)Math.Max(2 * minBins, 8 * span));
        var re = new double[length];
        var im = new double[length];
        for (var k = 0; k < h.Count; k++)
        {
            re[sampleIndex[k] - first] += h[k];
        }

        new Fft(length).Forward(re, im);
        var bins = (length / 2) + 1;
        var f = new double[bins];
        var power = new double[bins];
        var density = new double[bins];
        var cumulative = new double[bins];
        var df = rateHz / length;
        for (var j = 0; j < bins; j++)
        {
            f[j] = j * df;
            power[j] = (re[j] * re[j]) + (im[j] * im[j]);
            var s = psd(f[j]);
            density[j] = double.IsFinite(s) ? power[j] * s : 0;
            cumulative[j] = j == 0 ? 0 : cumulative[j - 1] + (0.5 * df * (density[j] + density[j - 1]));
        }

        return new NoiseContribution(f, power, density, cumulative);
    }
}
