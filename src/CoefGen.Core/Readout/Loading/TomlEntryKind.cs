namespace CoefGen.Core.Readout.Loading;

/// <summary>What a key of a <see cref="TomlTable"/> holds.</summary>
internal enum TomlEntryKind
{
    /// <summary>A plain value (string, number, boolean, array of values, date).</summary>
    Value,

    /// <summary>A table: a [header], a dotted-key prefix or an inline table.</summary>
    Table,

    /// <summary>An array of tables: [[header]] or an array of inline tables.</summary>
    TableArray,
}
