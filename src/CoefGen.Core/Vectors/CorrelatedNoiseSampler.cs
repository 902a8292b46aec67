using CoefGen.Core.Noise;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Vectors;

/// <summary>
/// Draws analog noise at the weighted samples with exactly the model's covariance: the lower Cholesky factor L
/// of the TRUE covariance (the sampled lag tables with each component's removed constant C(0) added back, which
/// makes the matrix positive semi-definite), so n = L z with z standard normal has E[n n^T] = L L^T = C.
/// When roundoff leaves a pivot non-positive, a diagonal load times the largest variance is added (and
/// reported), starting at 1e-12 and growing tenfold up to 1e-5: the variance of a weighted sum then changes by that relative amount at most.
/// </summary>
public sealed class CorrelatedNoiseSampler : IAnalogNoiseSampler
{
    /// <summary>Above this many weighted samples the dense factor (n^2 doubles) is refused.</summary>
    public const int MaxSamples = 4096;

    private readonly double[] _factor;

    private CorrelatedNoiseSampler(double[] factor, int count, double constantV2, double loadingV2)
    {
        _factor = factor;
        Count = count;
        AddedConstantV2 = constantV2;
        DiagonalLoadingV2 = loadingV2;
    }

    public int Count { get; }

    /// <summary>The constant added back to the lag tables (sum of the finite removed constants), V^2.</summary>
    public double AddedConstantV2 { get; }

    /// <summary>Diagonal load needed for the factorisation (0 when none), V^2.</summary>
    public double DiagonalLoadingV2 { get; }

    /// <summary>Always null: the dense factor is exact (a diagonal load is reported in <see cref="DiagonalLoadingV2"/>).</summary>
    public string? Note => null;

    /// <summary>Builds the factor for the covariance's samples; <paramref name="noise"/> supplies the removed constants.</summary>
    public static CorrelatedNoiseSampler Create(SampledCovariance covariance, NoiseModel noise)
    {
        ArgumentNullException.ThrowIfNull(covariance);
        ArgumentNullException.ThrowIfNull(noise);
        var n = covariance.Count;
        if (n > MaxSamples)
        {
            throw new ArgumentException($"{n} weighted samples exceed the {MaxSamples} the vector generator factors densely");
        }

        // An infinite constant (1/f without a low cutoff) cannot be a variance; the jitter path then keeps the factor real.
        var constant = noise.Components.Select(c => c.RemovedConstantV2).Where(double.IsFinite).Sum();
        var index = covariance.SampleIndex;
        var lag = covariance.TotalLag;
        var maxDiag = Math.Max(lag[0] + constant, double.Epsilon);
        return Factor(n, (i, j) => lag[index[i] - index[j]] + constant, maxDiag, constant);
    }

    /// <summary>
    /// Builds the factor from a capture covariance C (row-major N x N, V², measured codes: it already holds the
    /// quantisation and ADC noise, which the vector generator adds again, so <paramref name="digitalVarianceV2"/>
    /// is taken off the diagonal). C was projected onto sum h = 0, which leaves the common mode undetermined;
    /// the largest variance is added to every entry (a common offset every weight set rejects) to make it definite.
    /// </summary>
    public static CorrelatedNoiseSampler FromCaptureCovariance(IReadOnlyList<double> matrix, int count, double digitalVarianceV2)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        if (count > MaxSamples || matrix.Count != count * count)
        {
            throw new ArgumentException($"need an N x N matrix with N <= {MaxSamples}");
        }

        var maxDiag = Math.Max(Enumerable.Range(0, count).Max(i => matrix[(i * count) + i]), double.Epsilon);
        return Factor(count, (i, j) => matrix[(i * count) + j] + maxDiag - (i == j ? digitalVarianceV2 : 0.0), maxDiag, maxDiag);
    }

    private static CorrelatedNoiseSampler Factor(int n, Func<int, int, double> entry, double maxDiag, double constant)
    {
        var loading = 0.0;
        for (var attempt = 0; ; attempt++)
        {
            var a = new double[n * n];
            for (var i = 0; i < n; i++)
            {
                for (var j = 0; j <= i; j++)
                {
                    a[(i * n) + j] = entry(i, j) + (i == j ? loading : 0.0);
                }
            }

            try
            {
                CholeskyInPlace.Factor(a, n, 0, n, maxDiag);
                return new CorrelatedNoiseSampler(a, n, constant, loading);
            }
            catch (CovarianceNotPositiveDefiniteException) when (attempt < 8)
            {
                loading = maxDiag * Math.Pow(10, attempt - 12);
            }
        }
    }

    /// <summary>Fills <paramref name="destination"/> (Count values, V) with one realisation.</summary>
    public void Sample(Xoshiro256StarStar rng, double[] destination)
    {
        ArgumentNullException.ThrowIfNull(rng);
        ArgumentNullException.ThrowIfNull(destination);
        var n = Count;
        var z = new double[n];
        for (var i = 0; i < n; i++)
        {
            z[i] = rng.NextGaussian();
        }

        for (var i = 0; i < n; i++)
        {
            var row = i * n;
            var s = 0.0;
            for (var j = 0; j <= i; j++)
            {
                s += _factor[row + j] * z[j];
            }

            destination[i] = s;
        }
    }
}
