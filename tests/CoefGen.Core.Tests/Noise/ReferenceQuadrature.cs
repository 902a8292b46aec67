using MathNet.Numerics;

namespace CoefGen.Core.Tests.Noise;

/// <summary>
/// Test-side numerical cosine transforms, written independently of the production quadrature, after the
/// PHYSICS §2 recipe: split at f* = 1/(4τ), log f below, Gauss–Legendre panels (MathNet) of a quarter
/// period above, frequencies normalised by a scale so the numbers are O(1).
/// </summary>
internal static class ReferenceQuadrature
{
    private const int Order = 12;

    /// <summary>Composite Gauss–Legendre on [a, b] with the given number of equal panels.</summary>
    public static double Composite(Func<double, double> g, double a, double b, int panels)
    {
        var sum = 0.0;
        var h = (b - a) / panels;
        for (var i = 0; i < panels; i++)
        {
            sum += Integrate.GaussLegendre(g, a + i * h, a + (i + 1) * h, Order);
        }

        return sum;
    }

    /// <summary>
    /// ∫_lo^hi s(f) k(f) df with k = cos(2πfτ) (or cos - 1 when <paramref name="minusOne"/>): log panels
    /// (factor 1.5 each) from lo up to min(f*, scale), then quarter-period panels, grown geometrically when
    /// the quarter period is wide. hi must be finite.
    /// </summary>
    public static double CosineTransform(Func<double, double> s, double tau, double lo, double hi, double scale, bool minusOne)
    {
        double Kernel(double f)
        {
            var x = Math.Sin(Math.PI * f * tau);
            return minusOne ? -2 * x * x : 1 - 2 * x * x;
        }

        var quarter = tau > 0 ? 1 / (4 * tau) : double.PositiveInfinity;
        var sum = 0.0;
        var f = lo;
        if (lo > 0)
        {
            var logEnd = Math.Min(hi, Math.Min(quarter, scale));
            while (f < logEnd)
            {
                var next = Math.Min(logEnd, f * 1.5);
                var u0 = Math.Log(f);
                sum += Integrate.GaussLegendre(u => { var ff = Math.Exp(u); return ff * s(ff) * Kernel(ff); }, u0, Math.Log(next), Order);
                f = next;
            }
        }

        while (f < hi)
        {
            var width = Math.Min(quarter, Math.Max(0.25 * scale, 0.5 * f));
            var next = Math.Min(hi, f + width);
            sum += Integrate.GaussLegendre(ff => s(ff) * Kernel(ff), f, next, Order);
            f = next;
        }

        return sum;
    }

    /// <summary>
    /// Same, on [lo, ∞) for an S that decays as a power above the cut: panels up to F, then the
    /// integration-by-parts tail -g(F) sin(ωF)/ω - g'(F) cos(ωF)/ω², minus ∫_F^∞ g when minusOne.
    /// </summary>
    public static double CosineTransformToInfinity(
        Func<double, double> s, Func<double, double> integralAbove, double tau, double lo, double scale, bool minusOne)
    {
        var w = 2 * Math.PI * tau;
        var cut = Math.Max(200 * scale, tau > 0 ? 1e3 / w : 0);
        var body = CosineTransform(s, tau, lo, cut, scale, minusOne);
        double tail;
        if (tau == 0)
        {
            tail = minusOne ? 0 : integralAbove(cut);
        }
        else
        {
            var h = 1e-4 * cut;
            var derivative = (s(cut + h) - s(cut - h)) / (2 * h);
            tail = -s(cut) * Math.Sin(w * cut) / w - derivative * Math.Cos(w * cut) / (w * w);
            if (minusOne)
            {
                tail -= integralAbove(cut);
            }
        }

        return body + tail;
    }
}
