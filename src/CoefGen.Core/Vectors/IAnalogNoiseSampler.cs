namespace CoefGen.Core.Vectors;

/// <summary>Draws the analog noise at the weighted samples of a design (V), one realisation per call.</summary>
public interface IAnalogNoiseSampler
{
    /// <summary>Weighted samples per realisation.</summary>
    int Count { get; }

    /// <summary>The constant added back to the lag tables (sum of the finite removed constants), V^2.</summary>
    double AddedConstantV2 { get; }

    /// <summary>Diagonal load the dense factor needed (0 for none, and for the circulant sampler), V^2.</summary>
    double DiagonalLoadingV2 { get; }

    /// <summary>What the sampler did that the user should know (a clipped embedding), or null.</summary>
    string? Note { get; }

    void Sample(Xoshiro256StarStar rng, double[] destination);
}
