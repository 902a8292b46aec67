using CoefGen.Core.FixedPoint;

namespace CoefGen.Core.Vectors;

/// <summary>What describes a whole set of golden vectors, apart from its pixels.</summary>
public abstract record GoldenVectorInfo
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

    /// <summary>Mode-separating branches (<see cref="DatapathBranch"/>, acc limits) no ADC input reaches, with the reason.</summary>
    public required IReadOnlyList<(string Target, string Reason)> UnreachedBranches { get; init; }

    /// <summary>What the noise sampler had to do that changes the drawn covariance (a clipped circulant embedding), or null.</summary>
    public string? SamplerNote { get; init; }
}
