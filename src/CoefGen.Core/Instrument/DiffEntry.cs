namespace CoefGen.Core.Instrument;

/// <summary>One changed quantity of one table between two versions; values are invariant-culture text as compared.</summary>
public sealed record DiffEntry(string Table, string Quantity, string Before, string After);
