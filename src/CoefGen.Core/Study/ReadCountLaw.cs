namespace CoefGen.Core.Study;

/// <summary>The closed form a read-count study draws beside its points, scaled through the first valid plain-average point.</summary>
public enum ReadCountLaw
{
    /// <summary>sigma_N = sigma_1 / sqrt(N): N independent reads averaged (Tiffenberg et al. 2017), or Fowler-N read-noise limited, 2 sigma^2 / N (Fowler &amp; Gatley 1990).</summary>
    InverseSqrt,

    /// <summary>Up-the-ramp, read-noise limited: the unweighted slope's variance 12 sigma^2 / (n (n^2 - 1) dt^2) (PHYSICS.md §4b).</summary>
    RampFit,
}
