using CoefGen.Core.Noise;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Tests.Weights;

/// <summary>Covariances built directly from closed-form lag tables, independent of the Noise stage.</summary>
internal static class TestCovariances
{
    public static int LagCount(SampleGrid grid) => grid.SampleIndex[^1] - grid.SampleIndex[0] + 1;

    /// <summary>Independent samples of variance sigma2 as an analog lag table [sigma2, 0, 0, ...].</summary>
    public static SampledCovariance White(SampleGrid grid, double sigma2, double digital = 0)
    {
        var lag = new double[LagCount(grid)];
        lag[0] = sigma2;
        return new SampledCovariance(grid.SampleIndex, [new CovarianceComponent("white", lag)], digital);
    }

    /// <summary>AR(1): white noise through one pole on the sample grid, C(k) = sigma2 rho^k (+ constant).</summary>
    public static CovarianceComponent Ar1(string name, int lags, double sigma2, double rho, double constant = 0)
    {
        var lag = new double[lags];
        for (var k = 0; k < lags; k++)
        {
            lag[k] = (sigma2 * Math.Pow(rho, k)) + constant;
        }

        return new CovarianceComponent(name, lag);
    }

    public static SampledCovariance Ar1(SampleGrid grid, double sigma2, double rho, double digital = 0) =>
        new(grid.SampleIndex, [Ar1("pole", LagCount(grid), sigma2, rho)], digital);

    /// <summary>A positive-definite stationary mixture: sum_j a_j rho_j^k, plus a white digital diagonal.</summary>
    public static SampledCovariance Mixture(SampleGrid grid, Random rng, double digital, double constant = 0)
    {
        var lags = LagCount(grid);
        var terms = 1 + rng.Next(3);
        var components = new List<CovarianceComponent>();
        for (var j = 0; j < terms; j++)
        {
            var amplitude = 0.1 + (0.9 * rng.NextDouble());
            var rho = 0.99 * rng.NextDouble();
            components.Add(Ar1("ar1-" + j, lags, amplitude, rho, j == 0 ? constant : 0));
        }

        return new SampledCovariance(grid.SampleIndex, components, digital);
    }

    public static double MaxRelativeDifference(IReadOnlyList<double> a, IReadOnlyList<double> b)
    {
        var scale = 0.0;
        var diff = 0.0;
        for (var i = 0; i < a.Count; i++)
        {
            scale = Math.Max(scale, Math.Abs(b[i]));
            diff = Math.Max(diff, Math.Abs(a[i] - b[i]));
        }

        return diff / scale;
    }
}
