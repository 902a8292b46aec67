using CoefGen.Core.Capture;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Noise;
using CoefGen.Core.Prediction;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Pipeline;

/// <summary>Everything one `design` run computes, stage by stage, for the CLI to print, emit or verify.</summary>
public sealed record DesignResult
{
    public required ReadoutDescription Description { get; init; }

    public required SampleGrid Grid { get; init; }

    public required NoiseModel Noise { get; init; }

    public required SampledCovariance Covariance { get; init; }

    /// <summary>Boxcar, weighted and optimal, in that order, then robust when the file names noise scenarios.</summary>
    public required IReadOnlyList<WeightSet> Weights { get; init; }

    /// <summary>One prediction per entry of <see cref="Weights"/>.</summary>
    public required IReadOnlyList<NoisePrediction> Predictions { get; init; }

    /// <summary>Name of the optimal solver that ran ("dense null-space" or "structured").</summary>
    public required string OptimalSolver { get; init; }

    public required FixedPointSettings FixedPointSettings { get; init; }

    /// <summary>The integer datapath of the chosen scheme.</summary>
    public required IntegerDesign Datapath { get; init; }

    /// <summary>When the noise comes from a capture (noise.capture): the file and how its covariance was formed; null otherwise.</summary>
    public string? CaptureSource { get; init; }

    /// <summary>The Welch spectrum of the capture's residual stream when the design uses noise.capture (shown in the report).</summary>
    public Capture.WelchSpectrum? CaptureSpectrum { get; init; }

    /// <summary>Every scheme's read noise in every noise scenario ([scenarios]), or null when the file names none.</summary>
    public RegretTable? Regret { get; init; }

    /// <summary>The capture covariance every prediction, the output fraction bits and the vectors' noise use (noise.capture); null otherwise.</summary>
    public CaptureCovariance? CaptureCovariance { get; init; }

    /// <summary>Warnings from every stage.</summary>
    public required IReadOnlyList<Diagnostic> Warnings { get; init; }

    /// <summary>Index into <see cref="Weights"/> of the scheme chosen in the readout file.</summary>
    public int ChosenIndex => Weights.ToList().FindIndex(w => w.Scheme == Description.Weights.Scheme);

    public WeightSet Chosen => Weights[ChosenIndex];

    public NoisePrediction ChosenPrediction => Predictions[ChosenIndex];
}
