namespace CoefGen.Core.Instrument;

/// <summary>
/// One line of the instrument's width proof: the widest any table needs of one datapath quantity (a check of
/// <see cref="FixedPoint.WidthProof"/>), which table needs it, and the narrowest need, against the shared width.
/// </summary>
public sealed record SharedWidth(string Name, int RequiredBits, string WidestTable, int NarrowestRequiredBits, int AvailableBits, bool Required)
{
    public bool Fits => RequiredBits <= AvailableBits;

    public int MarginBits => AvailableBits - RequiredBits;

    /// <summary>True when one table needs more bits than another: that table sets the width.</summary>
    public bool ForcedByOneTable => RequiredBits > NarrowestRequiredBits;
}
