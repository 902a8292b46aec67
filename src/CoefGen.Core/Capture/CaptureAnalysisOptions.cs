namespace CoefGen.Core.Capture;

/// <summary>Choices for <see cref="CaptureAnalysis.Run"/>.</summary>
/// <param name="SegmentLength">Welch segment length (power of two), or null for <see cref="WelchEstimator.DefaultSegmentLength"/>.</param>
/// <param name="FixPole">Hold the pole at the readout's noise.front_end_pole_hz instead of fitting it.</param>
/// <param name="DesignFraction">Share of the cycles (the first ones) used to design; the rest are held out.</param>
public sealed record CaptureAnalysisOptions(int? SegmentLength = null, bool FixPole = false, double DesignFraction = 0.5);
