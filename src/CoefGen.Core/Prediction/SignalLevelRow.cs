namespace CoefGen.Core.Prediction;

/// <summary>One signal level of <see cref="SignalLevelTable"/>.</summary>
/// <param name="PhotonFluxEPerS">Photon flux (dark current added to it for the shot noise).</param>
/// <param name="DesignedSigmaE">Read noise of the weights designed at the stated level, e- rms.</param>
/// <param name="OptimalSigmaE">Read noise of the optimal weights designed at this level, e- rms.</param>
/// <param name="IsDesignLevel">True for the level the weights were designed at.</param>
public sealed record SignalLevelRow(double PhotonFluxEPerS, double DesignedSigmaE, double OptimalSigmaE, bool IsDesignLevel);
