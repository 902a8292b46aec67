namespace CoefGen.Core.Capture;

/// <summary>
/// The spectrum a sampled white + 1/f source behind one real pole shows after the ADC, one-sided in V²/Hz:
/// S(f) = W [A(f) + f_c B(f)] + D on 0 &lt; f &lt; rate/2, every analog term aliased (the samples see the
/// analog spectrum folded at the rate). A is the exact folded white-times-pole term: the sampled
/// exponential covariance W (pi f_p / 2) rho^|n|, rho = exp(-2 pi f_p / rate), has the discrete spectrum
/// (2 / rate) W (pi f_p / 2) (1 - rho²) / (1 - 2 rho cos w + rho²) (derived here; PHYSICS.md §2 gives
/// the covariance). B sums the 1/f-times-pole term over the first <see cref="AliasTerms"/> images on each
/// side (the images fall off as f_p²/u³, so beyond the fourth they add less than 1e-3 of the baseband term at Nyquist). D = 2 σ_d² / rate is the known digital floor.
/// </summary>
/// <para>PoleHz null: no pole, the analog part is band-limited at Nyquist (no images): S = W (1 + f_c / f) + D.</para>
public sealed record SampledSpectrumModel(double WhiteV2PerHz, double FlickerCornerHz, double? PoleHz, double DigitalFloorV2PerHz, double RateHz)
{
    /// <summary>Images of the 1/f term summed on each side of the baseband.</summary>
    public const int AliasTerms = 4;

    public double Psd(double fHz) => (WhiteV2PerHz * (White(fHz) + (FlickerCornerHz * Flicker(fHz)))) + DigitalFloorV2PerHz;

    /// <summary>The analog part at f without folding (for comparison with the readout-file model).</summary>
    public double AnalogUnfolded(double fHz) =>
        PoleHz is double p ? WhiteV2PerHz * (1 + (FlickerCornerHz / fHz)) / (1 + ((fHz / p) * (fHz / p))) : WhiteV2PerHz * (1 + (FlickerCornerHz / fHz));

    private double White(double f)
    {
        if (PoleHz is not double poleHz)
        {
            return 1;
        }

        var rho = Math.Exp(-2 * Math.PI * poleHz / RateHz);
        var w = 2 * Math.PI * f / RateHz;
        var oneMinusRho2 = -double.ExpM1(-4 * Math.PI * poleHz / RateHz);
        var denominator = ((1 - rho) * (1 - rho)) + (2 * rho * (1 - Math.Cos(w)));
        return (2 / RateHz) * (Math.PI * poleHz / 2) * oneMinusRho2 / denominator;
    }

    private double Flicker(double f)
    {
        if (PoleHz is null)
        {
            return 1 / f;
        }

        var s = Image(f);
        for (var k = 1; k <= AliasTerms; k++)
        {
            s += Image((k * RateHz) - f) + Image((k * RateHz) + f);
        }

        return s;
    }

    private double Image(double u)
    {
        var x = u / PoleHz!.Value;
        return 1 / (u * (1 + (x * x)));
    }
}
