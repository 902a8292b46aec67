using System.Globalization;
using CoefGen.Core.Noise;
using CoefGen.Core.Weights.Structured;

namespace CoefGen.Core.Vectors;

/// <summary>
/// Stationary noise on the uniform grid of the design's span, drawn exactly in O(L log L) by circulant embedding
/// (Dietrich and Newsam 1997, SIAM J. Sci. Comput. 18, 1088; PHYSICS.md §4b): the span's covariance c_0 .. c_(M-1)
/// (true lags: each component's removed constant added back) is the top-left block of a circulant of size
/// L >= 2(M-1) whose first row is c extended symmetrically with the model's own lags; its eigenvalues are the FFT of
/// that row. When none is negative, w = FFT(sqrt(lambda / L) (z1 + i z2)) gives two independent exact
/// realisations (real and imaginary parts). Padding further usually removes small negative eigenvalues; L is
/// doubled up to <see cref="MaxDoublings"/> times, and if negatives remain they are set to zero and
/// <see cref="Note"/> says by how much the drawn covariance differs from the model's.
/// </summary>
public sealed class CirculantNoiseSampler : IAnalogNoiseSampler
{
    public const int MaxDoublings = 3;

    /// <summary>Eigenvalues below -this x the largest count as negative (roundoff of the FFT otherwise).</summary>
    public const double NegativeTolerance = 1e-12;

    private readonly double[] _scale;
    private readonly int[] _offset;
    private readonly Fft _fft;
    private double[]? _spare;

    private CirculantNoiseSampler(double[] scale, int[] offset, double constant, string? note, double[] drawnLags)
    {
        _scale = scale;
        _offset = offset;
        _fft = new Fft(scale.Length);
        AddedConstantV2 = constant;
        Note = note;
        DrawnLags = drawnLags;
    }

    public int Count => _offset.Length;

    public double AddedConstantV2 { get; }

    public double DiagonalLoadingV2 => 0.0;

    public string? Note { get; }

    /// <summary>Embedding size L (a power of two).</summary>
    public int EmbeddingLength => _scale.Length;

    /// <summary>The covariance the draws actually have at lags 0 .. M-1 (the model's when nothing was clipped).</summary>
    public IReadOnlyList<double> DrawnLags { get; }

    public static CirculantNoiseSampler Create(SampledCovariance covariance, NoiseModel noise, double rateHz)
    {
        ArgumentNullException.ThrowIfNull(covariance);
        ArgumentNullException.ThrowIfNull(noise);
        if (covariance.Count == 0)
        {
            throw new ArgumentException("no samples", nameof(covariance));
        }

        var index = covariance.SampleIndex;
        var span = index[^1] - index[0] + 1;
        var constant = noise.Components.Select(c => c.RemovedConstantV2).Where(double.IsFinite).Sum();
        var length = 2;
        while (length < 2 * Math.Max(1, span - 1))
        {
            length *= 2;
        }

        double[] lambda = [];
        var negative = 0.0;
        for (var doubling = 0; doubling <= MaxDoublings; doubling++, length *= 2)
        {
            lambda = Eigenvalues(noise, rateHz, length, constant);
            var max = lambda.Max();
            negative = lambda.Where(l => l < -NegativeTolerance * max).Sum(l => -l);
            if (negative == 0)
            {
                break;
            }
        }

        var total = lambda.Sum(Math.Abs);
        var scale = new double[lambda.Length];
        for (var k = 0; k < scale.Length; k++)
        {
            scale[k] = Math.Sqrt(Math.Max(0, lambda[k]) / lambda.Length);
        }

        var drawn = DrawnCovariance(lambda, span);
        var note = negative > 0
            ? string.Create(CultureInfo.InvariantCulture,
                $"circulant embedding of {lambda.Length} points is not non-negative (negative eigenvalues sum to {negative / total:E2} of the total); they were set to zero, so the drawn covariance differs from the model's by up to {MaxRelative(drawn, noise, rateHz, span, constant):E2} of its variance")
            : null;
        var offsets = index.Select(i => i - index[0]).ToArray();
        return new CirculantNoiseSampler(scale, offsets, constant, note, drawn);
    }

    public void Sample(Xoshiro256StarStar rng, double[] destination)
    {
        ArgumentNullException.ThrowIfNull(rng);
        ArgumentNullException.ThrowIfNull(destination);
        var realisation = _spare;
        _spare = null;
        if (realisation is null)
        {
            var re = new double[_scale.Length];
            var im = new double[_scale.Length];
            for (var k = 0; k < re.Length; k++)
            {
                re[k] = _scale[k] * rng.NextGaussian();
                im[k] = _scale[k] * rng.NextGaussian();
            }

            _fft.Forward(re, im);
            realisation = re;
            _spare = im;
        }

        for (var i = 0; i < _offset.Length; i++)
        {
            destination[i] = realisation[_offset[i]];
        }
    }

    /// <summary>FFT of the circulant's first row: c_k for k up to L/2 and c_(L-k) above, from the model's lag tables.</summary>
    private static double[] Eigenvalues(NoiseModel noise, double rateHz, int length, double constant)
    {
        var half = (length / 2) + 1;
        var lags = new double[half];
        foreach (var c in noise.Components)
        {
            var table = c.LagTable(rateHz, half);
            for (var k = 0; k < half; k++)
            {
                lags[k] += table[k];
            }
        }

        var re = new double[length];
        var im = new double[length];
        for (var k = 0; k < length; k++)
        {
            re[k] = lags[Math.Min(k, length - k)] + constant;
        }

        new Fft(length).Forward(re, im);
        return re;
    }

    /// <summary>First row of the circulant with the (clipped) eigenvalues, lags 0 .. span-1.</summary>
    private static double[] DrawnCovariance(double[] lambda, int span)
    {
        var re = lambda.Select(l => Math.Max(0, l)).ToArray();
        var im = new double[re.Length];
        new Fft(re.Length).Inverse(re, im);
        return [.. re.Take(span)];
    }

    private static double MaxRelative(double[] drawn, NoiseModel noise, double rateHz, int span, double constant)
    {
        var model = new double[span];
        foreach (var c in noise.Components)
        {
            var table = c.LagTable(rateHz, span);
            for (var k = 0; k < span; k++)
            {
                model[k] += table[k];
            }
        }

        var variance = model[0] + constant;
        return Enumerable.Range(0, span).Max(k => Math.Abs(drawn[k] - (model[k] + constant))) / variance;
    }
}
