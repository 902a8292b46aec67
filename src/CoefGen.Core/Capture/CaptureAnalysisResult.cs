using CoefGen.Core.Diagnostics;
using CoefGen.Core.Noise;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Capture;

/// <summary>Everything a capture analysis computes.</summary>
public sealed record CaptureAnalysisResult
{
    public required SampleCapture Capture { get; init; }

    public required WelchSpectrum Spectrum { get; init; }

    public required SpectrumFit Fit { get; init; }

    /// <summary>Low edge given to the fitted 1/f part (the readout's first source, else the loader default).</summary>
    public required double LowCutoffHz { get; init; }

    /// <summary>The fitted model as a noise model at the ADC input (digital variance from the readout).</summary>
    public required NoiseModel FittedNoise { get; init; }

    /// <summary>Design cycles (the first ones); empty for a stream.</summary>
    public required IReadOnlyList<int> DesignRows { get; init; }

    /// <summary>Held-out cycles; empty for a stream.</summary>
    public required IReadOnlyList<int> HeldOutRows { get; init; }

    /// <summary>The shrunk capture covariance of the design cycles, or null for a stream.</summary>
    public CaptureCovariance? Covariance { get; init; }

    /// <summary>Boxcar, weighted, optimal from the fitted model, optimal from the capture; empty for a stream.</summary>
    public IReadOnlyList<SchemeValidation> Validation { get; init; } = [];

    /// <summary>Warnings about the capture (a stuck ADC) and the fit (terms the spectrum does not resolve).</summary>
    public IReadOnlyList<Diagnostic> Warnings { get; init; } = [];

    /// <summary>Grid of the readout file.</summary>
    public required SampleGrid Grid { get; init; }
}
