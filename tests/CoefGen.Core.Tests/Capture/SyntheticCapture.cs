using CoefGen.Core.Capture;

namespace CoefGen.Core.Tests.Capture;

/// <summary>
/// Deterministic synthetic noise at the ADC input, in volts, from a known model:
/// - white behind the pole: the exact discretisation of the continuous process (an AR(1) recursion,
///   x[n+1] = rho x[n] + sqrt(sigma² (1 - rho²)) g, rho = exp(-2 pi f_p / rate), sigma² = W pi f_p / 2),
///   independent of the closed form the fitter uses;
/// - 1/f behind the pole: spectral synthesis over a power-of-two record (Gaussian Fourier coefficients
///   with E|X_k|² = N rate S(f_k) / 2, Hermitian, inverse FFT), S the folded 1/f term of
///   <see cref="SampledSpectrumModel"/>; no power below rate / N;
/// - the ADC's own noise (Gaussian, noise_lsb) and an optional tone of random phase;
/// quantised by rounding to codes. System.Random with a seed is deterministic across runs and platforms.
/// PoleHz = +infinity means no pole: the white part is band-limited at Nyquist, i.e. independent samples of
/// variance W rate / 2 (W one-sided), and the 1/f part is W f_c / f with no images.
/// </summary>
internal sealed class SyntheticCapture(int seed)
{
    private readonly Random _random = new(seed);

    public sealed record Model(double WhiteV2PerHz, double FlickerCornerHz, double PoleHz, double RateHz, double AdcNoiseLsb, double LsbV, double ToneV = 0, double ToneHz = 0);

    /// <summary>The bench example: 10 MS/s, 16 bits over 2 V, 40 nV/rtHz, 50 kHz corner, 1.5 MHz pole.</summary>
    public static Model Bench(double toneV) => new(Math.Pow(40e-9, 2), 50e3, 1.5e6, 10e6, 0.5, 2.0 / 65536, toneV, 263e3);

    public double[] NoiseV(Model m, int count)
    {
        var x = new double[count];
        var noPole = double.IsPositiveInfinity(m.PoleHz);
        var rho = noPole ? 0 : Math.Exp(-2 * Math.PI * m.PoleHz / m.RateHz);
        var sigma2 = noPole ? m.WhiteV2PerHz * m.RateHz / 2 : m.WhiteV2PerHz * Math.PI * m.PoleHz / 2;
        var drive = Math.Sqrt(sigma2 * (1 - (rho * rho)));
        var state = Math.Sqrt(sigma2) * Gauss();
        for (var n = 0; n < count; n++)
        {
            x[n] = state;
            state = (rho * state) + (drive * Gauss());
        }

        var flicker = Flicker(m, count);
        var phase = 2 * Math.PI * _random.NextDouble();
        for (var n = 0; n < count; n++)
        {
            x[n] += flicker[n] + (m.AdcNoiseLsb * m.LsbV * Gauss());
            x[n] += m.ToneV * Math.Sin((2 * Math.PI * m.ToneHz * n / m.RateHz) + phase);
        }

        return x;
    }

    /// <summary>Pixel cycles: noise plus a fixed waveform (a reset pedestal), rounded to codes.</summary>
    public long[] PixelCodes(Model m, int cycles, int cycleLength)
    {
        var x = NoiseV(m, cycles * cycleLength);
        var codes = new long[x.Length];
        for (var n = 0; n < x.Length; n++)
        {
            var position = n % cycleLength;
            var waveform = position < 3 ? 900 : position < 20 ? 120 : 100;
            codes[n] = (long)Math.Round((x[n] / m.LsbV) + waveform, MidpointRounding.ToEven);
        }

        return codes;
    }

    /// <summary>Consecutive cycles of a general readout: noise plus the same waveform (codes, one per cycle sample) in every cycle, rounded.</summary>
    public long[] CycleCodes(Model m, int cycles, IReadOnlyList<double> waveform)
    {
        var x = NoiseV(m, cycles * waveform.Count);
        var codes = new long[x.Length];
        for (var n = 0; n < x.Length; n++)
        {
            codes[n] = (long)Math.Round((x[n] / m.LsbV) + waveform[n % waveform.Count], MidpointRounding.ToEven);
        }

        return codes;
    }

    /// <summary>A stream of codes.</summary>
    public long[] StreamCodes(Model m, int count) =>
        [.. NoiseV(m, count).Select(v => (long)Math.Round(v / m.LsbV, MidpointRounding.ToEven))];

    /// <summary>Codes as raw little-endian int16.</summary>
    public static byte[] ToRaw16(long[] codes)
    {
        var bytes = new byte[codes.Length * 2];
        for (var i = 0; i < codes.Length; i++)
        {
            System.Buffers.Binary.BinaryPrimitives.WriteInt16LittleEndian(bytes.AsSpan(2 * i), checked((short)codes[i]));
        }

        return bytes;
    }

    private double[] Flicker(Model m, int count)
    {
        var n = 1;
        while (n < count)
        {
            n *= 2;
        }

        double? pole = double.IsPositiveInfinity(m.PoleHz) ? null : m.PoleHz;
        var withFlicker = new SampledSpectrumModel(m.WhiteV2PerHz, m.FlickerCornerHz, pole, 0, m.RateHz);
        var whiteOnly = new SampledSpectrumModel(m.WhiteV2PerHz, 0, pole, 0, m.RateHz);
        var re = new double[n];
        var im = new double[n];
        for (var k = 1; k < n / 2; k++)
        {
            var f = k * m.RateHz / n;
            var s = withFlicker.Psd(f) - whiteOnly.Psd(f);
            var amplitude = Math.Sqrt(n * m.RateHz * s / 2 / 2);
            re[k] = amplitude * Gauss();
            im[k] = amplitude * Gauss();
            re[n - k] = re[k];
            im[n - k] = -im[k];
        }

        RadixTwoFft.InverseUnscaled(re, im);
        return [.. re.Take(count).Select(v => v / n)];
    }

    private double Gauss()
    {
        // Box-Muller; 1 - NextDouble() is in (0, 1], so the log is finite.
        var u = 1 - _random.NextDouble();
        var v = _random.NextDouble();
        return Math.Sqrt(-2 * Math.Log(u)) * Math.Cos(2 * Math.PI * v);
    }
}
