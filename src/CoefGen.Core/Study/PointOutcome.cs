using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// What one design run at one point gave: the noise of every scheme and the integer design's status, or
/// (when the point is not a valid readout) the diagnostics that say why. Values are copied exactly from the
/// <see cref="Pipeline.DesignResult"/>, so they equal a `design` run on the same text bit for bit.
/// </summary>
public sealed record PointOutcome
{
    public required IReadOnlyList<SchemeNoise> Schemes { get; init; }

    /// <summary>Scheme carried into fixed point.</summary>
    public required WeightScheme Chosen { get; init; }

    public required bool Safe { get; init; }

    public required double GainErrorPpm { get; init; }

    public required double NoisePenaltyPercent { get; init; }

    /// <summary>Pixel cycle in samples and in seconds, as realised.</summary>
    public required int PixelSamples { get; init; }

    public required double PixelTimeS { get; init; }

    /// <summary>Errors when the point is invalid (then <see cref="Schemes"/> is empty); warnings otherwise.</summary>
    public required IReadOnlyList<Diagnostic> Diagnostics { get; init; }

    public bool Valid => Schemes.Count > 0;

    /// <summary>Read noise in e- of a scheme.</summary>
    public double NoiseOf(WeightScheme scheme) => Schemes.First(s => s.Scheme == scheme).NoiseElectrons;

    public static PointOutcome Invalid(IReadOnlyList<Diagnostic> diagnostics) => new()
    {
        Schemes = [],
        Chosen = WeightScheme.Boxcar,
        Safe = false,
        GainErrorPpm = double.NaN,
        NoisePenaltyPercent = double.NaN,
        PixelSamples = 0,
        PixelTimeS = double.NaN,
        Diagnostics = diagnostics,
    };
}
