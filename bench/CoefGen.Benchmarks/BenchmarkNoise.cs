using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Benchmarks;

/// <summary>
/// The benchmark's readout: white + 1/f noise through one front-end pole, plus a digital diagonal, on
/// a uniform ADC grid; built here from closed forms so the benchmark does not depend on the Noise stage.
/// </summary>
public static class BenchmarkNoise
{
    public const double RateHz = 20e6;
    public const double PoleHz = 500e3;

    /// <summary>White density e = 10 nV/√Hz, as e² in V²/Hz.</summary>
    public const double WhiteV2PerHz = 1e-16;

    /// <summary>1/f corner: S(f) = e²·f_c/f.</summary>
    public const double CornerHz = 20e3;

    /// <summary>Digital variance: q²/12 of a 16-bit, 2 V ADC plus (5 µV)² of ADC noise.</summary>
    public const double DigitalV2 = (2.0 / 65536 * (2.0 / 65536) / 12) + 25e-12;

    /// <summary>Samples between the reset and the signal window (settling of about 12 pole time constants).</summary>
    public const int Gap = 100;

    public static SampleGrid Grid(int perWindow) =>
        SampleGrid.Create(RateHz, new SampleWindow(0, perWindow), new SampleWindow(perWindow + Gap, perWindow), (perWindow + 4) / RateHz, PoleHz);

    public static SampledCovariance Covariance(SampleGrid grid, string noise = "white+1/f+pole")
    {
        ArgumentNullException.ThrowIfNull(grid);
        var span = grid.SampleIndex[^1] - grid.SampleIndex[0] + 1;
        var white = new double[span];
        var flicker = new double[span];
        // 1/f between 10 Hz and the pole as equal-variance Lorentzians, two per decade:
        // Σ_j K e^{-2π f_j |τ|} has S(f) ≈ K/(Δ f) for f_j log-spaced by Δ (common practice, no source).
        const int perDecade = 2;
        var delta = Math.Log(10) / perDecade;
        var poles = (int)Math.Round(Math.Log10(PoleHz / 10.0) * perDecade) + 1;
        var k = WhiteV2PerHz * CornerHz * delta * (noise == "1/f-dominated" ? 100 : 1);
        var pole = noise == "strong-ar1" ? RateHz / 2000 : PoleHz;
        for (var lag = 0; lag < span; lag++)
        {
            var tau = lag / RateHz;
            // White through a pole: C(τ) = e²(π f_p / 2) exp(−2π f_p |τ|) (closed form, PHYSICS.md §2).
            white[lag] = WhiteV2PerHz * (Math.PI * pole / 2) * Math.Exp(-2 * Math.PI * pole * tau);
            var c = 0.0;
            for (var j = 0; j < poles; j++)
            {
                var fj = 10.0 * Math.Pow(10, (double)j / perDecade);
                c += k * Math.Exp(-2 * Math.PI * fj * tau);
            }

            flicker[lag] = noise == "strong-ar1" ? 0.0 : c;
        }

        return new SampledCovariance(grid.SampleIndex, [new CovarianceComponent("white", white), new CovarianceComponent("flicker", flicker)],
            noise == "strong-ar1" ? 1e-3 * white[0] : DigitalV2);
    }

    /// <summary>A = [1, s], b = [0, 1]: offset rejection and unit gain.</summary>
    public static (double[][] Columns, double[] Rhs) Constraints(SampleGrid grid)
    {
        ArgumentNullException.ThrowIfNull(grid);
        var ones = Enumerable.Repeat(1.0, grid.Count).ToArray();
        return ([ones, grid.Step.ToArray()], [0.0, 1.0]);
    }
}
