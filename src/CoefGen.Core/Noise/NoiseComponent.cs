namespace CoefGen.Core.Noise;

/// <summary>
/// One stationary analog noise component referred to the ADC input. Conventions (PHYSICS §1): the PSD is
/// one-sided, S(f) in V²/Hz, and the true autocovariance is C(τ) = ∫_0^∞ S(f) cos(2πfτ) df.
/// <see cref="Covariance"/> returns C(τ) - <see cref="RemovedConstantV2"/>: a τ-independent constant is
/// removed where the true C(0) is large or infinite (1/f), so weights with Σh = 0 see exactly the same variance.
/// </summary>
public abstract class NoiseComponent
{
    protected NoiseComponent(string name)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(name);
        Name = name;
    }

    /// <summary>Label in the noise budget.</summary>
    public string Name { get; }

    /// <summary>
    /// The constant subtracted from the true covariance, in V². Zero for white and measured components;
    /// for 1/f components it is the true per-sample variance C(0) (infinite when the low cutoff is 0).
    /// </summary>
    public virtual double RemovedConstantV2 => 0;

    /// <summary>Frequency above which S is exactly zero (a brick-wall limit), or +∞.</summary>
    public virtual double UpperLimitHz => double.PositiveInfinity;

    /// <summary>Frequencies where S or its slope jumps (low cutoff, brick-wall, table points); quadrature cuts there.</summary>
    public virtual IReadOnlyList<double> Breakpoints => [];

    /// <summary>C(τ) - RemovedConstantV2 in V²; even in τ.</summary>
    public abstract double Covariance(double tauS);

    /// <summary>One-sided PSD at the ADC input in V²/Hz, including the low cutoff and all shaping.</summary>
    public abstract double Psd(double fHz);

    /// <summary>∫_f^∞ S(f') df' in V² (analytic; used for the alias tail of the folded spectrum).</summary>
    public abstract double PsdIntegralAbove(double fHz);

    /// <summary>Lag table L[k] = Covariance(k / rate), k = 0..count-1.</summary>
    public virtual double[] LagTable(double rateHz, int count)
    {
        if (!(rateHz > 0) || count < 0)
        {
            throw new ArgumentException("rate must be positive and count non-negative");
        }

        var lag = new double[count];
        for (var k = 0; k < count; k++)
        {
            lag[k] = Covariance(k / rateHz);
        }

        return lag;
    }
}
