using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Readout.Loading;

/// <summary>
/// A TOML table rebuilt from Tomlyn's syntax tree, keeping the source location of every key and value
/// (Tomlyn's model conversion drops them). Keys keep the order in which they were written.
/// </summary>
internal sealed class TomlTable
{
    private readonly List<TomlEntry> _entries = [];
    private readonly Dictionary<string, TomlEntry> _byKey = new(StringComparer.Ordinal);

    public TomlTable(string path, SourceLocation location)
    {
        Path = path;
        Location = location;
    }

    /// <summary>Dotted path from the root ("" for the root itself).</summary>
    public string Path { get; }

    /// <summary>Where the table was opened (its header, or the first key that implied it).</summary>
    public SourceLocation Location { get; private set; }

    public IReadOnlyList<TomlEntry> Entries => _entries;

    public TomlEntry? Find(string key) => _byKey.GetValueOrDefault(key);

    public string ChildPath(string key) => Path.Length == 0 ? key : Path + "." + key;

    /// <summary>Moves the table's location to its explicit [header] when one follows an implicit definition.</summary>
    public void MoveTo(SourceLocation headerLocation) => Location = headerLocation;

    public void Add(TomlEntry entry)
    {
        // Tomlyn's semantic validation already rejects redefinitions; keep the first definition if one slips through.
        if (_byKey.TryAdd(entry.Key, entry))
        {
            _entries.Add(entry);
        }
    }
}
