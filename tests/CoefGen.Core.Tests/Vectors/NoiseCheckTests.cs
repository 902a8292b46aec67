using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;
using CoefGen.Core.Vectors;
using MathNet.Numerics.Distributions;

namespace CoefGen.Core.Tests.Vectors;

/// <summary>
/// The stimulus carries exactly the described noise: over many zero-charge pixels the sample standard
/// deviation of the integer outputs matches the integer design's predicted read noise,
/// sigma^2 = c^T R c / (sum c s)^2 (R with the digital diagonal LSB^2/12 + ADC noise^2) + (2^-F)^2 / 12.
/// Quantisation is done by the stimulus itself, so the LSB^2/12 term is Widrow's model (Widrow 1956): it holds
/// when the noise entering the quantiser is not much below 1 LSB. Here every sample carries ~0.8-1 LSB of
/// analog noise plus the ADC's own independent 0.4-0.6 LSB, so the neglected terms are of order
/// exp(-2 pi^2 sigma^2), below 1e-5. The acceptance band is the two-sided 99 % chi-square interval for the count.
/// </summary>
public class NoiseCheckTests
{
    private const int Pixels = 3000;

    [Theory]
    [InlineData("slowscan_spectro.toml", WeightScheme.Boxcar)]
    [InlineData("slowscan_spectro.toml", WeightScheme.Optimal)]
    [InlineData("fast_imaging.toml", WeightScheme.Weighted)]
    public void Output_noise_of_zero_charge_pixels_matches_the_prediction(string example, WeightScheme scheme)
    {
        var r = ExampleDesigns.Load(example);
        var design = ExampleDesigns.DesignFor(r, scheme);
        var set = GoldenVectorGenerator.Generate(r, design, new VectorOptions(Pixels, Seed: 2024));
        var scale = Math.ScaleB(1.0, -design.OutputFracBits);
        var y = set.Pixels.Where(p => p.Kind == PixelKind.Noise).Select(p => p.Expected.Output * scale).ToArray();
        var n = y.Length;
        var mean = y.Average();
        var s = Math.Sqrt(y.Sum(v => (v - mean) * (v - mean)) / (n - 1));

        var c = design.Coefficients.Select(v => (double)v).ToArray();
        var gain = c.Select((v, k) => v * r.Grid.Step[k]).Sum();
        var lsb = r.Description.Adc.LsbV;
        var predicted = Math.Sqrt((r.Covariance.QuadraticForm(c) / (gain * gain * lsb * lsb)) + (scale * scale / 12));

        // (n-1) s^2 / sigma^2 ~ chi-square(n-1) for Gaussian outputs (textbook result, no source).
        var lo = predicted * Math.Sqrt(ChiSquared.InvCDF(n - 1, 0.005) / (n - 1));
        var hi = predicted * Math.Sqrt(ChiSquared.InvCDF(n - 1, 0.995) / (n - 1));
        var line = $"{example} {scheme}: n = {n}, s = {s:F5} ADU, predicted {predicted:F5} ADU, 99 % band {lo:F5}..{hi:F5}, mean {mean:F4}";
        TestContext.Current.TestOutputHelper?.WriteLine(line);
        var log = Environment.GetEnvironmentVariable("COEFGEN_TOOL_TIMINGS"); // the measurement log ToolRunner also uses
        if (!string.IsNullOrEmpty(log))
        {
            File.AppendAllText(log, line + "\n");
        }

        Assert.InRange(s, lo, hi);
    }
}
