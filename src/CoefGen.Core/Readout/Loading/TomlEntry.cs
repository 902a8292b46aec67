using CoefGen.Core.Diagnostics;
using Tomlyn.Syntax;

namespace CoefGen.Core.Readout.Loading;

/// <summary>One key of a table with where it was written, and what it holds.</summary>
internal sealed class TomlEntry
{
    private TomlEntry(string key, string path, SourceLocation keyLocation, TomlEntryKind kind)
    {
        Key = key;
        Path = path;
        KeyLocation = keyLocation;
        Kind = kind;
    }

    public string Key { get; }

    /// <summary>Dotted path from the document root, e.g. "timing.reset.start" or "noise.source[1].name".</summary>
    public string Path { get; }

    public SourceLocation KeyLocation { get; }

    public TomlEntryKind Kind { get; }

    /// <summary>The value node, for <see cref="TomlEntryKind.Value"/>.</summary>
    public ValueSyntax? Value { get; private init; }

    /// <summary>Where the value starts (the key location for tables).</summary>
    public SourceLocation ValueLocation { get; private init; } = SourceLocation.FileOnly("");

    public TomlTable? Table { get; private init; }

    public List<TomlTable>? Tables { get; private init; }

    public static TomlEntry ForValue(string key, string path, SourceLocation keyLocation, ValueSyntax value, SourceLocation valueLocation) =>
        new(key, path, keyLocation, TomlEntryKind.Value) { Value = value, ValueLocation = valueLocation };

    public static TomlEntry ForTable(string key, TomlTable table) =>
        new(key, table.Path, table.Location, TomlEntryKind.Table) { Table = table, ValueLocation = table.Location };

    public static TomlEntry ForTableArray(string key, string path, SourceLocation keyLocation) =>
        new(key, path, keyLocation, TomlEntryKind.TableArray) { Tables = [], ValueLocation = keyLocation };

    /// <summary>Short description of what the entry holds, for "wrong type" messages.</summary>
    public string Describe() => Kind switch
    {
        TomlEntryKind.Table => "a table",
        TomlEntryKind.TableArray => "an array of tables",
        _ => Value switch
        {
            StringValueSyntax => "a string",
            IntegerValueSyntax => "an integer",
            FloatValueSyntax => "a float",
            BooleanValueSyntax => "a boolean",
            ArraySyntax => "an array",
            DateTimeValueSyntax => "a date/time",
            _ => "a value",
        },
    };
}
