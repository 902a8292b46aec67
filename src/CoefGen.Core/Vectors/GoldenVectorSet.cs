using CoefGen.Core.FixedPoint;

namespace CoefGen.Core.Vectors;

/// <summary>The generated stimulus and expected results of one readout, with what is needed to describe them.</summary>
public sealed record GoldenVectorSet
{
    public required IntegerDesign Design { get; init; }

    public required ulong Seed { get; init; }

    /// <summary>Name of the readout file and the SHA-256 of its bytes (the vectors belong to exactly this file).</summary>
    public required string ReadoutFileName { get; init; }

    public required string ReadoutSha256 { get; init; }

    /// <summary>The DC level (baseline) in ADU, as a signed sample value before quantisation.</summary>
    public required double BaselineAdu { get; init; }

    /// <summary>The full-scale charge in ADU (settled level on the top rail).</summary>
    public required double FullScaleChargeAdu { get; init; }

    /// <summary>ADU per electron at the ADC (to state charges in electrons).</summary>
    public required double AduPerElectron { get; init; }

    /// <summary>Constant added back to the lag tables for the noise draw, and the diagonal load used (V^2).</summary>
    public required double AddedConstantV2 { get; init; }

    public required double DiagonalLoadingV2 { get; init; }

    /// <summary>What the noise sampler had to do that changes the drawn covariance (a clipped circulant embedding), or null.</summary>
    public string? SamplerNote { get; init; }

    public required IReadOnlyList<GoldenPixel> Pixels { get; init; }
}
