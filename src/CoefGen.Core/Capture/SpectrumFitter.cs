using MathNet.Numerics;
using MathNet.Numerics.Distributions;

namespace CoefGen.Core.Capture;

/// <summary>
/// Fits <see cref="SampledSpectrumModel"/> to a Welch spectrum by nonlinear least squares on the log
/// spectrum (Levenberg-Marquardt, written here: 2-3 parameters, central-difference Jacobian).
/// The log of a chi-square_nu / nu variable has mean psi(nu/2) - ln(nu/2) and variance psi'(nu/2),
/// both constant, so unweighted least squares on ln S with that bias removed is the right estimator.
/// Uncertainties: s² (J^T J)^-1 with s² the residual variance, times 1.944 because Hann-windowed bins are
/// correlated (adjacent power estimates correlate by (2/3)² = 0.444, next by (1/6)² = 0.028; the sum
/// 1 + 2(0.444 + 0.028) is the variance inflation of a smooth average; derived here from the Hann window's
/// transform). Narrow lines (bins above the 1 - 1e-3/bins chi-square quantile of the model, plus 2 guard
/// bins each side for the Hann main lobe) are masked and the fit repeated, at most 4 times.
/// </summary>
public static class SpectrumFitter
{
    /// <summary>Variance inflation for correlated Hann bins (see the class remarks).</summary>
    public const double HannBinInflation = 1 + (2 * ((4.0 / 9) + (1.0 / 36)));

    /// <summary>
    /// Chance that a capture of pure noise shows at least one line. Every bin is tested, so the per-bin tail
    /// probability is this shared out over the bins (Bonferroni; common practice, no source): a fixed per-bin 1e-4
    /// flagged a chance "line" in 11 of 40 synthetic noise captures at 2048 bins (FalseLineTests).
    /// </summary>
    public const double FalseLineProbability = 1e-3;

    /// <summary>Per-bin tail probability above which a bin is taken as an interference line.</summary>
    public static double LineTailProbabilityFor(int bins) => FalseLineProbability / Math.Max(1, bins);

    private const int GuardBins = 2;

    /// <summary>
    /// Fits W, f_c and (unless <paramref name="fixedPoleHz"/> is given) f_p, and every smaller model: white +
    /// pole, white + 1/f with no pole (white band-limited at Nyquist), white alone. A term is kept only when
    /// leaving it out raises the residual sum (on the bins every model used) by more than
    /// <see cref="TermSignificance"/> times the per-bin variance of the log spectrum: the smallest model within
    /// that of the best is taken, and <see cref="SpectrumFit.Unresolved"/> names what it leaves out.
    /// Returns null only when not even the white level fits (e.g. a record with a bin of zero power).
    /// </summary>
    public static SpectrumFit? Fit(WelchSpectrum spectrum, double digitalVarianceV2, double? fixedPoleHz)
    {
        ArgumentNullException.ThrowIfNull(spectrum);
        var fits = FitTerms.Candidates(fixedPoleHz)
            .Select(t => (Terms: t, Fit: FitWith(spectrum, digitalVarianceV2, t)))
            .Where(c => c.Fit is not null && Resolved(c.Fit, c.Terms))
            .Select(c => (c.Terms, Fit: c.Fit!))
            .ToList();
        if (fits.Count == 0)
        {
            return null;
        }

        // Compare on the bins the richest model kept (a smaller model would mask its own misfit as "lines"), in
        // units of the log-periodogram variance of one bin (trigamma(nu/2), inflated for correlated Hann bins).
        var richest = fits.MaxBy(c => c.Terms.ParameterCount).Fit;
        var common = Enumerable.Range(0, spectrum.FrequencyHz.Count).Where(i => richest.UsedBins[i]).ToArray();
        var nu = spectrum.DegreesOfFreedom;
        var bias = SpecialFunctions.DiGamma(nu / 2) - Math.Log(nu / 2);
        var unit = SmallLinearAlgebra.Trigamma(nu / 2) * HannBinInflation;
        double Chi(SampledSpectrumModel m) => common.Sum(i =>
        {
            var r = Math.Log(spectrum.PsdV2PerHz[i]) - bias - Math.Log(m.Psd(spectrum.FrequencyHz[i]));
            return r * r;
        }) / unit;

        var scored = fits.Select(c => (c.Terms, c.Fit, Chi: Chi(c.Fit.Model))).ToList();
        var best = scored.Min(c => c.Chi);
        return scored
            .Where(c => c.Chi <= best + TermSignificance)
            .OrderBy(c => c.Terms.ParameterCount)
            .ThenBy(c => c.Chi)
            .First().Fit;
    }

    /// <summary>
    /// A term must lower the residual sum by more than this many units of one bin's log-spectrum variance:
    /// 25 is a 5 sigma change for one parameter (chi-square with 1 degree of freedom; common practice, no source).
    /// </summary>
    public const double TermSignificance = 25;

    /// <summary>A fitted log parameter with a larger 1-sigma (a factor e either way) is not determined by the spectrum.</summary>
    public const double ResolvedLogSigma = 1.0;

    private static bool Resolved(SpectrumFit fit, FitTerms terms) =>
        fit.WhiteLogSigma < ResolvedLogSigma
        && (!terms.Flicker || fit.FlickerLogSigma < ResolvedLogSigma)
        && (!terms.FitPole || fit.PoleLogSigma < ResolvedLogSigma);

    private static SpectrumFit? FitWith(WelchSpectrum spectrum, double digitalVarianceV2, FitTerms terms)
    {
        var floor = 2 * digitalVarianceV2 / spectrum.RateHz;
        var nu = spectrum.DegreesOfFreedom;
        var bias = SpecialFunctions.DiGamma(nu / 2) - Math.Log(nu / 2);
        var n = spectrum.FrequencyHz.Count;
        var f = spectrum.FrequencyHz;
        var y = new double[n];
        for (var i = 0; i < n; i++)
        {
            y[i] = Math.Log(spectrum.PsdV2PerHz[i]) - bias;
        }

        if (!y.All(double.IsFinite))
        {
            return null; // a bin of zero power: no log-spectrum fit
        }

        var used = new bool[n];
        Array.Fill(used, true);
        var lineThreshold = ChiSquared.InvCDF(nu, 1 - LineTailProbabilityFor(n)) / nu;
        Result? best = null;
        for (var pass = 0; pass < 4; pass++)
        {
            best = BestOfStarts(spectrum, y, used, floor, terms, best?.Theta);
            if (best is null)
            {
                return null;
            }

            var model = ToModel(best.Theta, terms, floor, spectrum.RateHz);
            var next = new bool[n];
            Array.Fill(next, true);
            for (var i = 0; i < n; i++)
            {
                if (spectrum.PsdV2PerHz[i] / model.Psd(f[i]) > lineThreshold)
                {
                    for (var j = Math.Max(0, i - GuardBins); j <= Math.Min(n - 1, i + GuardBins); j++)
                    {
                        next[j] = false;
                    }
                }
            }

            if (next.SequenceEqual(used))
            {
                break;
            }

            used = next;
        }

        return Finish(spectrum, y, used, floor, terms, best!);
    }

    private sealed record Result(double[] Theta, double Rss, int Iterations);

    private static Result? BestOfStarts(WelchSpectrum s, double[] y, bool[] used, double floor, FitTerms terms, double[]? previous)
    {
        var fs = s.RateHz;
        var mid = s.FrequencyHz.Select((fk, i) => (fk, i)).Where(p => p.fk >= fs / 40 && p.fk <= fs / 10 && used[p.i]).Select(p => s.PsdV2PerHz[p.i]).Order().ToArray();
        var level = mid.Length > 0 ? mid[mid.Length / 2] : s.PsdV2PerHz.Order().ElementAt(s.PsdV2PerHz.Count / 2);
        var w0 = Math.Max(level - floor, 0.1 * level);
        var starts = new List<double[]>();
        if (previous is not null)
        {
            // Later passes only drop masked bins: the previous optimum is the right start.
            return Minimise(previous, s, y, used, floor, terms);
        }

        double[] corners = terms.Flicker ? [5 * s.ResolutionHz, 100 * s.ResolutionHz] : [double.NaN];
        double[] poles = terms.FitPole ? [fs / 20, fs / 4] : [double.NaN];
        foreach (var fc in corners)
        {
            foreach (var fp in poles)
            {
                starts.Add([Math.Log(w0), .. terms.Flicker ? [Math.Log(fc)] : Array.Empty<double>(), .. terms.FitPole ? [Math.Log(fp)] : Array.Empty<double>()]);
            }
        }

        Result? best = null;
        foreach (var start in starts)
        {
            var r = Minimise(start, s, y, used, floor, terms);
            if (r is not null && (best is null || r.Rss < best.Rss))
            {
                best = r;
            }
        }

        return best;
    }

    private static Result? Minimise(double[] start, WelchSpectrum s, double[] y, bool[] used, double floor, FitTerms terms)
    {
        var theta = (double[])start.Clone();
        var p = theta.Length;
        var rss = Rss(theta, s, y, used, floor, terms);
        if (!double.IsFinite(rss))
        {
            return null;
        }

        var lambda = 1e-3;
        var iterations = 0;
        for (; iterations < 100; iterations++)
        {
            var (jtj, jtr) = Normal(theta, s, y, used, floor, terms);
            var improved = false;
            while (lambda < 1e12)
            {
                var damped = (double[,])jtj.Clone();
                for (var i = 0; i < p; i++)
                {
                    damped[i, i] += lambda * Math.Max(jtj[i, i], 1e-12);
                }

                var inv = SmallLinearAlgebra.Inverse(damped);
                if (inv is null)
                {
                    lambda *= 10;
                    continue;
                }

                var trial = new double[p];
                for (var i = 0; i < p; i++)
                {
                    trial[i] = theta[i];
                    for (var j = 0; j < p; j++)
                    {
                        trial[i] += inv[i, j] * jtr[j];
                    }
                }

                var trialRss = Rss(trial, s, y, used, floor, terms);
                if (double.IsFinite(trialRss) && trialRss < rss)
                {
                    var converged = rss - trialRss < 1e-9 * rss;
                    theta = trial;
                    rss = trialRss;
                    lambda = Math.Max(lambda / 10, 1e-9);
                    improved = !converged;
                    break;
                }

                lambda *= 10;
            }

            if (!improved)
            {
                break;
            }
        }

        return theta.All(double.IsFinite) ? new Result(theta, rss, iterations) : null;
    }

    private static SpectrumFit? Finish(WelchSpectrum s, double[] y, bool[] used, double floor, FitTerms terms, Result best)
    {
        var p = best.Theta.Length;
        var count = used.Count(u => u);
        if (count <= p)
        {
            return null;
        }

        var (jtj, _) = Normal(best.Theta, s, y, used, floor, terms);
        var inv = SmallLinearAlgebra.Inverse(jtj);
        if (inv is null)
        {
            return null;
        }

        var s2 = best.Rss / (count - p) * HannBinInflation;
        var sigma = new double[p];
        for (var i = 0; i < p; i++)
        {
            sigma[i] = Math.Sqrt(inv[i, i] * s2);
        }

        var correlation = new double[p, p];
        for (var i = 0; i < p; i++)
        {
            for (var j = 0; j < p; j++)
            {
                correlation[i, j] = inv[i, j] / Math.Sqrt(inv[i, i] * inv[j, j]);
            }
        }

        if (!sigma.All(double.IsFinite))
        {
            return null;
        }

        var model = ToModel(best.Theta, terms, floor, s.RateHz);
        var modelPsd = s.FrequencyHz.Select(model.Psd).ToArray();
        return new SpectrumFit(
            model,
            sigma[0],
            terms.Flicker ? sigma[1] : null,
            terms.FitPole ? sigma[^1] : null,
            correlation,
            modelPsd,
            used,
            FindLines(s, modelPsd, used),
            Math.Sqrt(best.Rss / count),
            Math.Sqrt(SmallLinearAlgebra.Trigamma(s.DegreesOfFreedom / 2)),
            best.Iterations)
        {
            Unresolved = terms.Unresolved,
        };
    }

    private static List<InterferenceLine> FindLines(WelchSpectrum s, double[] model, bool[] used)
    {
        var lines = new List<InterferenceLine>();
        var i = 0;
        while (i < used.Length)
        {
            if (used[i])
            {
                i++;
                continue;
            }

            var start = i;
            while (i < used.Length && !used[i])
            {
                i++;
            }

            var excess = 0.0;
            var peak = start;
            for (var k = start; k < i; k++)
            {
                excess += Math.Max(0, s.PsdV2PerHz[k] - model[k]);
                if (s.PsdV2PerHz[k] / model[k] > s.PsdV2PerHz[peak] / model[peak])
                {
                    peak = k;
                }
            }

            // Parseval: the density summed over the bins times the bin width is the line's power (the
            // Hann main lobe spans +-2 bins, inside the guard).
            lines.Add(new InterferenceLine(s.FrequencyHz[peak], Math.Sqrt(excess * s.ResolutionHz), i - start));
        }

        return lines;
    }

    private static SampledSpectrumModel ToModel(double[] theta, FitTerms terms, double floor, double rate) =>
        new(Math.Exp(theta[0]), terms.Flicker ? Math.Exp(theta[1]) : 0, terms.FitPole ? Math.Exp(theta[^1]) : terms.HeldPoleHz, floor, rate);

    private static double Rss(double[] theta, WelchSpectrum s, double[] y, bool[] used, double floor, FitTerms terms)
    {
        if (!theta.All(t => double.IsFinite(t) && Math.Abs(t) < 200))
        {
            return double.NaN;
        }

        var model = ToModel(theta, terms, floor, s.RateHz);
        var sum = 0.0;
        for (var i = 0; i < y.Length; i++)
        {
            if (used[i])
            {
                var r = y[i] - Math.Log(model.Psd(s.FrequencyHz[i]));
                sum += r * r;
            }
        }

        return sum;
    }

    /// <summary>J^T J and J^T r of the log model at theta (central differences, step 1e-6 in each log parameter).</summary>
    private static (double[,] JtJ, double[] JtR) Normal(double[] theta, WelchSpectrum s, double[] y, bool[] used, double floor, FitTerms terms)
    {
        const double h = 1e-6;
        var p = theta.Length;
        var center = ToModel(theta, terms, floor, s.RateHz);
        var plus = new SampledSpectrumModel[p];
        var minus = new SampledSpectrumModel[p];
        for (var k = 0; k < p; k++)
        {
            var tp = (double[])theta.Clone();
            var tm = (double[])theta.Clone();
            tp[k] += h;
            tm[k] -= h;
            plus[k] = ToModel(tp, terms, floor, s.RateHz);
            minus[k] = ToModel(tm, terms, floor, s.RateHz);
        }

        var jtj = new double[p, p];
        var jtr = new double[p];
        var row = new double[p];
        for (var i = 0; i < y.Length; i++)
        {
            if (!used[i])
            {
                continue;
            }

            var fi = s.FrequencyHz[i];
            var r = y[i] - Math.Log(center.Psd(fi));
            for (var k = 0; k < p; k++)
            {
                row[k] = (Math.Log(plus[k].Psd(fi)) - Math.Log(minus[k].Psd(fi))) / (2 * h);
            }

            for (var a = 0; a < p; a++)
            {
                jtr[a] += row[a] * r;
                for (var b = 0; b < p; b++)
                {
                    jtj[a, b] += row[a] * row[b];
                }
            }
        }

        return (jtj, jtr);
    }
}
