using System.Diagnostics.CodeAnalysis;
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

    private readonly IntegerDesign? _datapath;

    /// <summary>
    /// The integer datapath of the chosen scheme's full table (one coefficient per weighted sample). With
    /// form = "two-stage" there is none (<see cref="TwoStage"/> is the datapath) and reading it is API misuse
    /// (<see cref="HasFullDatapath"/> tells).
    /// </summary>
    [AllowNull]
    public required IntegerDesign Datapath
    {
        get => _datapath ?? throw new InvalidOperationException("form = \"two-stage\": the datapath is DesignResult.TwoStage");
        init => _datapath = value;
    }

    /// <summary>False with form = "two-stage": the full table was not quantised (it need not fit a target).</summary>
    public bool HasFullDatapath => _datapath is not null;

    /// <summary>
    /// The two-stage form of repeated identical reads (real and integer); null when the cycle has none. With
    /// form = "full" it is shown beside the full table; with form = "two-stage" it is the datapath.
    /// </summary>
    public TwoStageDatapath? TwoStage { get; init; }

    /// <summary>True when the two-stage form is the datapath (form = "two-stage").</summary>
    public bool IsTwoStage => Description.Weights.Form == WeightsForm.TwoStage;

    /// <summary>The width proof of the datapath in use: the full table's, or both stages' with form = "two-stage".</summary>
    public WidthProof Proof => IsTwoStage ? TwoStage!.Quantised.Proof : Datapath.Proof;

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
