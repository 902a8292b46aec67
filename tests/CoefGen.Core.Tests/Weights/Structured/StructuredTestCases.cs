using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Tests.Weights.Structured;

/// <summary>Grids, covariances and constraints shared by the structured-solver tests.</summary>
public static class StructuredTestCases
{
    public const double RateHz = 1e6;

    /// <summary>Two windows of n samples with a gap of n/4 + 3 samples; the step is ideal (settled).</summary>
    public static SampleGrid Grid(int perWindow)
    {
        var gap = (perWindow / 4) + 3;
        var signalStart = 2 + perWindow + gap;
        return SampleGrid.Create(RateHz, new SampleWindow(2, perWindow), new SampleWindow(signalStart, perWindow), (signalStart - 0.5) / RateHz, null);
    }

    /// <summary>Lag function of a named noise kind, in V² (σ² = 1 scale), on the ADC grid.</summary>
    public static Func<int, double> Lag(string kind) => kind switch
    {
        "white" => k => k == 0 ? 1.0 : 0.0,
        // White noise through one pole, f_p = f_s/20: ρ = exp(-2π/20) ≈ 0.73.
        "ar1" => k => Math.Exp(-2 * Math.PI * k / 20.0),
        // Strongly correlated: f_p = f_s/2000, ρ ≈ 0.99686.
        "strong" => k => Math.Exp(-2 * Math.PI * k / 2000.0),
        "oneoverf" => OneOverFLike,
        "oneoverf+const" => k => OneOverFLike(k) + (1000 * OneOverFLike(0)),
        _ => throw new ArgumentException(kind),
    };

    /// <summary>Digital variance per kind: none for white (pure boxcar case), a small ADC floor otherwise.</summary>
    public static double Digital(string kind) => kind == "white" ? 0.0 : 1e-3;

    public static SampledCovariance Covariance(SampleGrid grid, string kind) => Covariance(grid, Lag(kind), Digital(kind));

    public static SampledCovariance Covariance(SampleGrid grid, Func<int, double> lag, double digital)
    {
        var span = grid.SampleIndex[^1] - grid.SampleIndex[0] + 1;
        var values = new double[span];
        for (var k = 0; k < span; k++)
        {
            values[k] = lag(k);
        }

        return new SampledCovariance(grid.SampleIndex, [new CovarianceComponent("test", values)], digital);
    }

    /// <summary>Columns [1, s (, t − t̄)] and b = [0, 1 (, 0)] of PHYSICS.md §4; times in microseconds so the columns are O(1..N).</summary>
    public static (double[][] Columns, double[] Rhs) Constraints(SampleGrid grid, bool drift)
    {
        var n = grid.Count;
        var ones = Enumerable.Repeat(1.0, n).ToArray();
        var step = grid.Step.ToArray();
        if (!drift)
        {
            return ([ones, step], [0.0, 1.0]);
        }

        var mean = grid.TimeS.Average();
        var t = grid.TimeS.Select(x => (x - mean) * 1e6).ToArray();
        return ([ones, step, t], [0.0, 1.0, 0.0]);
    }

    /// <summary>
    /// 1/f-like: white noise plus eight AR(1) terms of equal variance with poles log-spaced over three
    /// decades (f_s/4 down to f_s/4000). Equal variance per log-spaced Lorentzian sums to a 1/f spectrum
    /// between the poles (common practice, no source).
    /// </summary>
    private static double OneOverFLike(int k)
    {
        var c = 0.0;
        for (var j = 0; j < 8; j++)
        {
            var fp = 0.25 * Math.Pow(10, -3.0 * j / 7);
            c += 0.5 * Math.Exp(-2 * Math.PI * fp * k);
        }

        return c + (k == 0 ? 1.0 : 0.0);
    }
}
