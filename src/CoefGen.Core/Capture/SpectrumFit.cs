namespace CoefGen.Core.Capture;

/// <summary>
/// The fitted white + 1/f + pole model with 1-sigma uncertainties. Parameters were fitted as logarithms,
/// so each uncertainty is relative: sigma(ln p), i.e. p is known to a factor exp(±sigma).
/// </summary>
/// <param name="Model">The fitted spectrum (digital floor fixed from the readout file).</param>
/// <param name="WhiteLogSigma">sigma of ln W (W = e², the white density squared).</param>
/// <param name="FlickerLogSigma">sigma of ln f_c, or null when the 1/f term is not resolved (f_c = 0).</param>
/// <param name="PoleLogSigma">sigma of ln f_p, or null when the pole was held at the readout value or is not resolved (no pole).</param>
/// <param name="Correlation">Correlation matrix of the fitted log parameters (W, f_c[, f_p]).</param>
/// <param name="ModelPsd">Model at each spectrum bin.</param>
/// <param name="UsedBins">Bins that took part in the final fit (true) or were masked as lines (false).</param>
/// <param name="Lines">Interference lines found above the model.</param>
/// <param name="ResidualRms">rms of the log residuals of the used bins.</param>
/// <param name="ExpectedResidualRms">rms a perfect model would leave: sqrt(trigamma(nu/2)).</param>
/// <param name="Iterations">Levenberg-Marquardt iterations of the winning start.</param>
public sealed record SpectrumFit(
    SampledSpectrumModel Model,
    double WhiteLogSigma,
    double? FlickerLogSigma,
    double? PoleLogSigma,
    double[,] Correlation,
    IReadOnlyList<double> ModelPsd,
    IReadOnlyList<bool> UsedBins,
    IReadOnlyList<InterferenceLine> Lines,
    double ResidualRms,
    double ExpectedResidualRms,
    int Iterations)
{
    /// <summary>White amplitude density e in nV/sqrt(Hz) at the ADC input.</summary>
    public double WhiteNvPerRtHz => Math.Sqrt(Model.WhiteV2PerHz) * 1e9;

    /// <summary>1-sigma of e in nV/sqrt(Hz) (half the relative sigma of W).</summary>
    public double WhiteNvPerRtHzSigma => WhiteNvPerRtHz * WhiteLogSigma / 2;

    public double? FlickerCornerSigmaHz => FlickerLogSigma is double s ? Model.FlickerCornerHz * s : null;

    public double? PoleSigmaHz => PoleLogSigma is double s && Model.PoleHz is double p ? p * s : null;

    /// <summary>Terms of white + 1/f + pole the spectrum did not resolve and the fit left out (<see cref="FitTerms.FlickerTerm"/>, <see cref="FitTerms.PoleTerm"/>).</summary>
    public IReadOnlyList<string> Unresolved { get; init; } = [];
}
