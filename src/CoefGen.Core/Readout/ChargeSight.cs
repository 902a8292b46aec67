namespace CoefGen.Core.Readout;

/// <summary>What a window of the cycle sees of the charge being measured.</summary>
public enum ChargeSight
{
    /// <summary>No charge: the level right after a reset (pedestal, reference).</summary>
    None,

    /// <summary>The charge moved onto the sense node by a transfer at a stated instant, settling with the cycle's step model.</summary>
    Transfer,

    /// <summary>Charge integrating from a stated instant: s grows linearly with time (read up the ramp, Fowler-N).</summary>
    Ramp,
}

/// <summary>The readout file's words for <see cref="ChargeSight"/> (sees = "reset" | "charge" | "ramp").</summary>
public static class ChargeSightWords
{
    public static string Word(ChargeSight sees) => sees switch
    {
        ChargeSight.None => "reset",
        ChargeSight.Transfer => "charge",
        _ => "ramp",
    };
}
