using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Readout.Loading;

/// <summary>
/// Reads the keys of one table: sub-tables, unknown-key checks and key locations. Typed values are
/// read through <see cref="ValueReader"/>. Every problem becomes a diagnostic; results are null then.
/// </summary>
internal sealed class TableReader
{
    private readonly TomlTable _table;

    public TableReader(LoadContext context, TomlTable table)
    {
        Context = context;
        _table = table;
        if (table.Path.Length > 0)
        {
            context.Locations.TryAdd(table.Path, table.Location);
        }
    }

    public LoadContext Context { get; }

    public string Path => _table.Path;

    public SourceLocation Location => _table.Location;

    /// <summary>How the table is named in messages.</summary>
    public string Title => _table.Path.Length == 0 ? "the top level" : $"[{_table.Path}]";

    public string KeyPath(string key) => _table.ChildPath(key);

    public bool Has(string key) => _table.Find(key) is not null;

    /// <summary>The keys written in this table, in file order.</summary>
    public IReadOnlyList<string> Keys => [.. _table.Entries.Select(e => e.Key)];

    /// <summary>The entry of a key, recording where it was written.</summary>
    public TomlEntry? Entry(string key)
    {
        var entry = _table.Find(key);
        if (entry is not null)
        {
            Context.Locations.TryAdd(entry.Path, entry.KeyLocation);
        }

        return entry;
    }

    /// <summary>Reports every key that is not allowed here, with the closest allowed one.</summary>
    public void RejectUnknown(params string[] allowed)
    {
        foreach (var entry in _table.Entries)
        {
            if (Array.IndexOf(allowed, entry.Key) >= 0)
            {
                continue;
            }

            var suggestion = DidYouMean.Suggest(entry.Key, allowed);
            var hint = suggestion is null ? "" : $" (did you mean '{suggestion}'?)";
            var what = entry.Kind == TomlEntryKind.Value ? "key" : "table";
            Context.Error(ReadoutCodes.UnknownKey, entry.KeyLocation, entry.Path,
                $"unknown {what} '{entry.Key}' in {Title}{hint}; allowed here: {string.Join(", ", allowed)}");
        }
    }

    /// <summary>A sub-table ([adc], [timing.reset], an inline table or dotted keys).</summary>
    public TableReader? Section(string key, bool required)
    {
        var entry = Entry(key);
        if (entry is null)
        {
            if (required)
            {
                MissingKey(key, $"the section [{KeyPath(key)}]");
            }

            return null;
        }

        if (entry.Kind != TomlEntryKind.Table)
        {
            WrongType(entry, "a table");
            return null;
        }

        return new TableReader(Context, entry.Table!);
    }

    /// <summary>The elements of an array of tables ([[noise.source]]); empty when absent.</summary>
    public IReadOnlyList<TableReader> SectionArray(string key)
    {
        var entry = Entry(key);
        if (entry is null)
        {
            return [];
        }

        if (entry.Kind != TomlEntryKind.TableArray)
        {
            WrongType(entry, $"an array of tables ([[{entry.Path}]])");
            return [];
        }

        return entry.Tables!.Select(t => new TableReader(Context, t)).ToList();
    }

    public void MissingKey(string key, string? what = null) =>
        Context.Error(ReadoutCodes.MissingKey, Location, KeyPath(key),
            $"{what ?? $"the key '{key}'"} is required in {Title} but missing");

    public void WrongType(TomlEntry entry, string wanted) =>
        Context.Error(ReadoutCodes.WrongType, entry.ValueLocation, entry.Path,
            $"'{entry.Key}' is {entry.Describe()}; expected {wanted}");

    /// <summary>Exactly one of two alternative keys (e.g. pixel_samples / pixel_ns); reports CG1006 otherwise.</summary>
    public string? OneOf(string first, string second)
    {
        var hasFirst = Has(first);
        var hasSecond = Has(second);
        if (hasFirst && hasSecond)
        {
            var entry = Entry(second)!;
            Context.Error(ReadoutCodes.ExactlyOneOf, entry.KeyLocation, entry.Path,
                $"give either '{first}' or '{second}' in {Title}, not both");
            return null;
        }

        if (!hasFirst && !hasSecond)
        {
            Context.Error(ReadoutCodes.ExactlyOneOf, Location, KeyPath(first),
                $"{Title} needs exactly one of '{first}' (samples) or '{second}' (nanoseconds); neither is given");
            return null;
        }

        return hasFirst ? first : second;
    }
}
