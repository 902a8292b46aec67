using CoefGen.Core.FixedPoint;
using CoefGen.Core.FixedPoint.TwoStage;
using CoefGen.Core.Weights.TwoStage;

namespace CoefGen.Core.Vectors.TwoStage;

/// <summary>Golden vectors of the two-stage datapath, pixels produced while enumerated (once).</summary>
public sealed record TwoStageVectorSource
{
    public required string Name { get; init; }

    public required TwoStageIntegerDesign Design { get; init; }

    public required ReadLayout Layout { get; init; }

    public required AccumulatorMode Accumulator { get; init; }

    public required int PixelSamples { get; init; }

    public required ulong Seed { get; init; }

    public required string ReadoutFileName { get; init; }

    public required string ReadoutSha256 { get; init; }

    public required double BaselineAdu { get; init; }

    public required double FullScaleChargeAdu { get; init; }

    public required double AduPerElectron { get; init; }

    /// <summary>What the noise sampler had to do that changes the drawn covariance, or null.</summary>
    public string? SamplerNote { get; init; }

    /// <summary>Each pixel with its expected output, final accumulator (acc2) and read sums.</summary>
    public required IEnumerable<GoldenPixel> Pixels { get; init; }
}
