namespace CoefGen.Core.Noise;

/// <summary>
/// A parametric source at the ADC input: white (S = e²) or 1/f (S = K/f for f ≥ f_low, 0 below, K = e²·f_c),
/// shaped by an optional single pole |H_p|² = 1/(1+(f/f_p)²) and an optional brick-wall at f_b.
/// Closed forms (PHYSICS §2): W1 white+pole, W2 white+brick-wall, F1 1/f+brick-wall, F3 1/f+pole;
/// pole and brick-wall together use <see cref="CosineTransformQuadrature"/>.
/// For 1/f the removed constant is the true C(0), so <see cref="Covariance"/> returns C(τ) - C(0).
/// </summary>
public sealed class ParametricNoiseComponent : NoiseComponent
{
    private ParametricNoiseComponent(string name, double level, bool flicker, double lowCutoffHz, double? poleHz, double? bandwidthHz)
        : base(name)
    {
        if (!(level >= 0) || double.IsInfinity(level))
        {
            throw new ArgumentException("noise level must be finite and non-negative", nameof(level));
        }

        if (poleHz is null && bandwidthHz is null)
        {
            throw new ArgumentException("a parametric source needs a front-end pole or a bandwidth limit");
        }

        if (poleHz is double p && !(p > 0 && !double.IsInfinity(p)))
        {
            throw new ArgumentException("pole frequency must be positive and finite", nameof(poleHz));
        }

        if (bandwidthHz is double b && !(b > 0 && !double.IsInfinity(b)))
        {
            throw new ArgumentException("bandwidth must be positive and finite", nameof(bandwidthHz));
        }

        if (flicker && !(lowCutoffHz >= 0 && lowCutoffHz < (bandwidthHz ?? double.PositiveInfinity)))
        {
            throw new ArgumentException("1/f low cutoff must be >= 0 and below the bandwidth", nameof(lowCutoffHz));
        }

        Level = level;
        IsFlicker = flicker;
        LowCutoffHz = flicker ? lowCutoffHz : 0;
        PoleHz = poleHz;
        BandwidthHz = bandwidthHz;
    }

    /// <summary>e² (white, V²/Hz) or K = e²·f_c (1/f, V²).</summary>
    public double Level { get; }

    public bool IsFlicker { get; }

    public double LowCutoffHz { get; }

    public double? PoleHz { get; }

    public double? BandwidthHz { get; }

    public override double UpperLimitHz => BandwidthHz ?? double.PositiveInfinity;

    public override IReadOnlyList<double> Breakpoints =>
        [.. new[] { IsFlicker && LowCutoffHz > 0 ? LowCutoffHz : double.NaN, BandwidthHz ?? double.NaN }.Where(double.IsFinite)];

    /// <summary>The true C(0) for 1/f: K ln(f_b/f_low), (K/2)ln(1+f_p²/f_low²), or their combination.</summary>
    public override double RemovedConstantV2 => IsFlicker ? Level * (FlickerPrimitive(LowCutoffHz) - FlickerPrimitive(UpperLimitHz)) : 0;

    /// <summary>White density e² (V²/Hz) with optional pole and brick-wall.</summary>
    public static ParametricNoiseComponent White(string name, double densityV2PerHz, double? poleHz, double? bandwidthHz) =>
        new(name, densityV2PerHz, flicker: false, 0, poleHz, bandwidthHz);

    /// <summary>1/f with S = K/f on [f_low, ∞), K = e²·f_c in V², with optional pole and brick-wall.</summary>
    public static ParametricNoiseComponent Flicker(string name, double coefficientV2, double lowCutoffHz, double? poleHz, double? bandwidthHz) =>
        new(name, coefficientV2, flicker: true, lowCutoffHz, poleHz, bandwidthHz);

    public override double Psd(double fHz)
    {
        if (fHz < 0 || fHz > UpperLimitHz || (IsFlicker && (fHz < LowCutoffHz || fHz == 0)))
        {
            return 0;
        }

        var s = IsFlicker ? Level / fHz : Level;
        return PoleHz is double p ? s / (1 + (fHz / p) * (fHz / p)) : s;
    }

    public override double PsdIntegralAbove(double fHz)
    {
        var lower = Math.Max(fHz, IsFlicker ? LowCutoffHz : 0);
        if (lower >= UpperLimitHz)
        {
            return 0;
        }

        if (IsFlicker)
        {
            return Level * (FlickerPrimitive(lower) - FlickerPrimitive(UpperLimitHz));
        }

        if (PoleHz is double p)
        {
            // e² f_p [atan(b/f_p) - atan(a/f_p)] written as one arctangent (no cancellation).
            var x1 = lower / p;
            var x2 = UpperLimitHz / p;
            return Level * p * (double.IsInfinity(x2) ? Math.Atan2(1, x1) : Math.Atan2(x2 - x1, 1 + x1 * x2));
        }

        return Level * (UpperLimitHz - lower);
    }

    public override double Covariance(double tauS)
    {
        var tau = Math.Abs(tauS);
        return PoleHz is double p && BandwidthHz is double b
            ? BuildQuadrature(p, b, tau).Evaluate(tau)
            : ClosedForm(tau);
    }

    public override double[] LagTable(double rateHz, int count)
    {
        if (PoleHz is double p && BandwidthHz is double b && count > 0)
        {
            if (!(rateHz > 0))
            {
                throw new ArgumentException("rate must be positive", nameof(rateHz));
            }

            return BuildQuadrature(p, b, (count - 1) / rateHz).LagTable(rateHz, count);
        }

        return base.LagTable(rateHz, count);
    }

    private double ClosedForm(double tau)
    {
        var w = 2 * Math.PI * tau;
        if (!IsFlicker)
        {
            return PoleHz is double p
                ? Level * (Math.PI * p / 2) * Math.Exp(-w * p) // W1
                : Level * BandwidthHz!.Value * Sinc(w * BandwidthHz.Value); // W2
        }

        if (tau == 0)
        {
            return 0;
        }

        var cinLow = SpecialFunctions.Cin(w * LowCutoffHz);
        if (BandwidthHz is double fb)
        {
            return Level * (cinLow - SpecialFunctions.Cin(w * fb)); // F1 minus K ln(f_b/f_low)
        }

        var fp = PoleHz!.Value;
        return Level * (cinLow + SpecialFunctions.PsiPole(w * fp) + RDrift(fp, tau)); // F3 minus C(0)
    }

    /// <summary>R(τ) - R(0) = ∫_0^{f_low} f (cos 2πfτ - 1)/(f² + f_p²) df, tiny but kept so F3 is exact.</summary>
    private double RDrift(double fp, double tau)
    {
        if (LowCutoffHz == 0)
        {
            return 0;
        }

        var panels = (int)Math.Min(100000, Math.Ceiling(LowCutoffHz * Math.Max(4 * tau, 4 / fp)) + 1);
        var h = LowCutoffHz / panels;
        var sum = 0.0;
        for (var i = 0; i < panels; i++)
        {
            sum += MathNet.Numerics.Integrate.GaussLegendre(
                f =>
                {
                    var s = Math.Sin(Math.PI * f * tau);
                    return -2 * s * s * f / (f * f + fp * fp);
                },
                i * h,
                (i + 1) * h,
                8);
        }

        return sum;
    }

    private CosineTransformQuadrature BuildQuadrature(double fp, double fb, double tauMax) =>
        CosineTransformQuadrature.Build(Psd, LowCutoffHz, fb, fp, tauMax, IsFlicker);

    /// <summary>G(f) = ∫_f^∞ df/(f·|pole|²) for the 1/f shape without brick-wall; G(∞) = 0.</summary>
    private double FlickerPrimitive(double f)
    {
        if (double.IsPositiveInfinity(f))
        {
            return 0;
        }

        if (f == 0)
        {
            return double.PositiveInfinity;
        }

        return PoleHz is double p ? 0.5 * Math.Log(1 + (p / f) * (p / f)) : -Math.Log(f);
    }

    private static double Sinc(double x) => Math.Abs(x) < 1e-4 ? 1 - x * x / 6 : Math.Sin(x) / x;
}
