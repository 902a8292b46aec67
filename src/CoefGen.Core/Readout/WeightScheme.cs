namespace CoefGen.Core.Readout;

/// <summary>How the real-valued weights are derived.</summary>
public enum WeightScheme
{
    /// <summary>Equal weights in each window (the digital differential averager).</summary>
    Boxcar,

    /// <summary>A chosen window shape in each window.</summary>
    Weighted,

    /// <summary>Minimum-variance weights for the described noise.</summary>
    Optimal,

    /// <summary>Weights that stay good over the file's noise scenarios (minimax or mean, see <see cref="RobustObjective"/>).</summary>
    Robust,
}
