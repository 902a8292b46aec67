using CoefGen.Core.Weights;
using MathNet.Numerics.Integration;

namespace CoefGen.Core.Noise;

/// <summary>
/// hᵀRh computed in the frequency domain, independently of the lag tables (PHYSICS §3–5):
/// ∫_0^∞ S(f)|H(f)|² df + σ_d² Σh², H(f) = Σ h_k exp(-j2πf t_k). On the ADC grid |H|² is f_s-periodic,
/// so the integral is taken over [0, f_s/2] against the folded spectrum
/// S_fold(f) = S(f) + Σ_{m=1}^{300} [S(m f_s - f) + S(m f_s + f)] + analytic tail. Integration: log-f panels
/// below 0.05/span, then Gauss–Legendre panels no wider than 1/(4·span), cut at every folded breakpoint.
/// For 1/f components the weights must satisfy Σh = 0 (otherwise the true variance is infinite or
/// depends on the low cutoff, and the result is only the part above 1e-10·0.05/span).
/// </summary>
public static class FrequencyDomainVariance
{
    /// <summary>Aliases summed explicitly before the analytic tail.</summary>
    public const int AliasCount = 300;

    private const int Order = 8;
    private const double LogPanelWidth = 0.5;
    private static readonly GaussLegendreRule Rule = new(-1, 1, Order);

    /// <summary>Total hᵀRh in V², digital part included.</summary>
    public static double Compute(NoiseModel model, SampleGrid grid, IReadOnlyList<double> h)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(h);
        var total = 0.0;
        foreach (var part in ComputeByComponent(model, grid, h))
        {
            total += part;
        }

        var sumSquares = 0.0;
        foreach (var x in h)
        {
            sumSquares += x * x;
        }

        return total + model.DigitalVarianceV2 * sumSquares;
    }

    /// <summary>∫ S_c |H|² df for each analog component c (same order as model.Components), in V².</summary>
    public static double[] ComputeByComponent(NoiseModel model, SampleGrid grid, IReadOnlyList<double> h)
    {
        ArgumentNullException.ThrowIfNull(model);
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(h);
        if (h.Count != grid.Count || grid.Count == 0)
        {
            throw new ArgumentException("one weight per grid sample is required", nameof(h));
        }

        var fs = grid.RateHz;
        var index = grid.SampleIndex;
        var length = index[^1] - index[0];
        var coef = new double[length + 1];
        for (var k = 0; k < h.Count; k++)
        {
            coef[index[k] - index[0]] += h[k];
        }

        var nyquist = fs / 2;
        var span = Math.Max(length, 1) / fs;
        var quarter = Math.Min(nyquist, 1 / (4 * span));
        var logEnd = Math.Min(0.05 / span, nyquist);
        var logStart = 1e-10 * logEnd;
        var cuts = FoldedBreakpoints(model, fs, logStart, nyquist);

        var result = new double[model.Components.Count];
        void AddPanel(double a, double b, bool logScale)
        {
            var mid = 0.5 * (a + b);
            var half = 0.5 * (b - a);
            for (var i = 0; i < Order; i++)
            {
                var x = mid + half * Rule.Abscissas[i];
                var f = logScale ? Math.Exp(x) : x;
                var w = half * Rule.Weights[i] * (logScale ? f : 1) * TransferSquared(coef, f / fs);
                for (var c = 0; c < result.Length; c++)
                {
                    result[c] += w * Folded(model.Components[c], f, fs);
                }
            }
        }

        foreach (var (a, b) in Pieces(logStart, logEnd, cuts))
        {
            var u0 = Math.Log(a);
            var u1 = Math.Log(b);
            var panels = Math.Max(1, (int)Math.Ceiling((u1 - u0) / LogPanelWidth));
            for (var p = 0; p < panels; p++)
            {
                AddPanel(u0 + (u1 - u0) * p / panels, u0 + (u1 - u0) * (p + 1) / panels, logScale: true);
            }
        }

        foreach (var (a, b) in Pieces(logEnd, nyquist, cuts))
        {
            var f = a;
            while (f < b)
            {
                var width = Math.Min(quarter, 0.5 * f);
                var next = b - (f + width) < 1e-9 * width ? b : f + width;
                AddPanel(f, next, logScale: false);
                f = next;
            }
        }

        return result;
    }

    /// <summary>S_fold(f): the spectrum plus its aliases, then (1/f_s)∫ of the rest (midpoint rule over aliases).</summary>
    private static double Folded(NoiseComponent c, double f, double fs)
    {
        var s = c.Psd(f);
        var aliases = AliasCount;
        if (double.IsFinite(c.UpperLimitHz))
        {
            aliases = (int)Math.Min(AliasCount, Math.Ceiling(c.UpperLimitHz / fs) + 1);
        }

        for (var m = 1; m <= aliases; m++)
        {
            s += c.Psd(m * fs - f) + c.Psd(m * fs + f);
        }

        var edge = (aliases + 0.5) * fs;
        return s + (c.PsdIntegralAbove(edge - f) + c.PsdIntegralAbove(edge + f)) / fs;
    }

    /// <summary>|Σ_m c_m e^{-j2π m x}|² by Horner's rule (x = f / f_s).</summary>
    private static double TransferSquared(double[] coef, double x)
    {
        var (sin, cos) = Math.SinCos(2 * Math.PI * x);
        var zr = cos;
        var zi = -sin;
        double re = coef[^1], im = 0;
        for (var m = coef.Length - 2; m >= 0; m--)
        {
            var nr = re * zr - im * zi + coef[m];
            im = re * zi + im * zr;
            re = nr;
        }

        return re * re + im * im;
    }

    private static List<double> FoldedBreakpoints(NoiseModel model, double fs, double low, double high)
    {
        var cuts = new SortedSet<double>();
        foreach (var c in model.Components)
        {
            foreach (var b in c.Breakpoints)
            {
                if (b > (AliasCount + 1) * fs)
                {
                    continue;
                }

                var r = b - fs * Math.Floor(b / fs);
                r = Math.Min(r, fs - r);
                if (r > low && r < high)
                {
                    cuts.Add(r);
                }
            }
        }

        return [.. cuts];
    }

    private static IEnumerable<(double A, double B)> Pieces(double a, double b, List<double> cuts)
    {
        var start = a;
        foreach (var cut in cuts)
        {
            if (cut > start && cut < b && cut - start > 1e-12 * b)
            {
                yield return (start, cut);
                start = cut;
            }
        }

        if (b > start)
        {
            yield return (start, b);
        }
    }
}
