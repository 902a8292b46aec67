using MathNet.Numerics.Integration;

namespace CoefGen.Core.Noise;

/// <summary>
/// Numerical cosine transform ∫ S(f) cos(2πfτ) df over a finite band, for the shapes without an
/// elementary closed form (pole and brick-wall together). Follows the PHYSICS §2 quadrature recipe:
/// log-f panels at low frequency, then Gauss–Legendre panels no wider than a quarter period of the
/// largest lag and no wider than the local scale of S. For 1/f it integrates S·(cos - 1), i.e. it
/// returns C(τ) - C(0), which stays well conditioned for any low cutoff.
/// </summary>
internal sealed class CosineTransformQuadrature
{
    private const int Order = 8;
    private const double LogPanelWidth = 0.5;
    private const int ReseedEvery = 32;
    private static readonly GaussLegendreRule Rule = new(-1, 1, Order);

    private readonly double[] _node;
    private readonly double[] _weightedS;
    private readonly bool _flicker;

    private CosineTransformQuadrature(double[] node, double[] weightedS, bool flicker)
    {
        _node = node;
        _weightedS = weightedS;
        _flicker = flicker;
    }

    /// <summary>Nodes for ∫_{fLow}^{fHigh} S cos, resolving lags up to tauMaxS.</summary>
    /// <param name="psd">S(f) inside the band.</param>
    /// <param name="fLow">Lower band edge (0 allowed).</param>
    /// <param name="fHigh">Upper band edge (finite).</param>
    /// <param name="scaleHz">Width over which S changes at low f (the pole), for white shapes.</param>
    /// <param name="tauMaxS">Largest lag that will be evaluated.</param>
    /// <param name="flicker">True for 1/f shapes: integrate S·(cos - 1) with log-f panels from fLow.</param>
    public static CosineTransformQuadrature Build(Func<double, double> psd, double fLow, double fHigh, double scaleHz, double tauMaxS, bool flicker)
    {
        var quarter = tauMaxS > 0 ? 1 / (4 * tauMaxS) : double.PositiveInfinity;
        var nodes = new List<double>();
        var weights = new List<double>();
        double linearStart;
        if (flicker)
        {
            linearStart = Math.Min(fHigh, quarter);
            var logStart = fLow > 0 ? fLow : 1e-9 * linearStart;
            if (logStart < linearStart)
            {
                var u0 = Math.Log(logStart);
                var u1 = Math.Log(linearStart);
                var panels = Math.Max(1, (int)Math.Ceiling((u1 - u0) / LogPanelWidth));
                for (var p = 0; p < panels; p++)
                {
                    AddPanel(u0 + (u1 - u0) * p / panels, u0 + (u1 - u0) * (p + 1) / panels, logScale: true, psd, nodes, weights);
                }
            }
        }
        else
        {
            linearStart = fLow;
        }

        var f = linearStart;
        while (f < fHigh)
        {
            var width = Math.Min(quarter, Math.Max(0.5 * f, flicker ? 0 : 0.25 * scaleHz));
            if (!(width > 0))
            {
                throw new ArgumentException("quadrature needs a positive frequency scale");
            }

            var next = Math.Min(fHigh, f + width);
            if (fHigh - next < 1e-9 * width)
            {
                next = fHigh;
            }

            AddPanel(f, next, logScale: false, psd, nodes, weights);
            f = next;
        }

        return new CosineTransformQuadrature([.. nodes], [.. weights], flicker);
    }

    /// <summary>The transform at one lag (C(τ) for white shapes, C(τ) - C(0) for 1/f).</summary>
    public double Evaluate(double tauS)
    {
        var sum = 0.0;
        for (var j = 0; j < _node.Length; j++)
        {
            if (_flicker)
            {
                var s = Math.Sin(Math.PI * _node[j] * tauS);
                sum -= 2 * _weightedS[j] * s * s;
            }
            else
            {
                sum += _weightedS[j] * Math.Cos(2 * Math.PI * _node[j] * tauS);
            }
        }

        return sum;
    }

    /// <summary>Evaluate at τ = k / rate for k = 0..count-1, by phasor rotation (re-seeded exactly every 32 lags).</summary>
    public double[] LagTable(double rateHz, int count)
    {
        var lag = new double[count];
        for (var j = 0; j < _node.Length; j++)
        {
            // For 1/f rotate the half angle: cos(kθ) - 1 = -2 sin²(kθ/2) without cancellation.
            var angle = (_flicker ? Math.PI : 2 * Math.PI) * _node[j] / rateHz;
            var (stepIm, stepRe) = Math.SinCos(angle);
            double re = 1, im = 0;
            var w = _weightedS[j];
            for (var k = 0; k < count; k++)
            {
                if (k % ReseedEvery == 0)
                {
                    (im, re) = Math.SinCos(k * angle);
                }

                lag[k] += _flicker ? -2 * w * im * im : w * re;
                var nextRe = re * stepRe - im * stepIm;
                im = re * stepIm + im * stepRe;
                re = nextRe;
            }
        }

        return lag;
    }

    private static void AddPanel(double a, double b, bool logScale, Func<double, double> psd, List<double> nodes, List<double> weights)
    {
        var mid = 0.5 * (a + b);
        var half = 0.5 * (b - a);
        for (var i = 0; i < Order; i++)
        {
            var x = mid + half * Rule.Abscissas[i];
            var w = half * Rule.Weights[i];
            var f = logScale ? Math.Exp(x) : x;
            nodes.Add(f);
            weights.Add(w * psd(f) * (logScale ? f : 1));
        }
    }
}
