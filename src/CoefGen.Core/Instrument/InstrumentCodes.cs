namespace CoefGen.Core.Instrument;

/// <summary>Stable diagnostic codes of instrument files (CG7xxx).</summary>
public static class InstrumentCodes
{
    public const string UnknownKey = "CG7001";
    public const string MissingKey = "CG7002";
    public const string WrongType = "CG7003";
    public const string BadName = "CG7004";
    public const string DuplicateName = "CG7005";
    public const string UnknownTable = "CG7006";
    public const string BaseUnreadable = "CG7007";
    public const string OverrideNotApplicable = "CG7008";
    public const string KeySetTwice = "CG7009";
    public const string NotOneDatapath = "CG7010";
    public const string EmitPathNeedsTable = "CG7011";
}
