using System.Globalization;
using Tomlyn.Syntax;

namespace CoefGen.Core.Study;

/// <summary>Where each value and each [table] of a TOML document is written, by the loader's dotted paths.</summary>
internal sealed class TomlIndex
{
    /// <summary>Key-value nodes by full dotted path ("noise.source[1].name").</summary>
    public Dictionary<string, KeyValueSyntax> Values { get; } = new(StringComparer.Ordinal);

    /// <summary>For each [table] header: the text offset where a new key line can be inserted (after its last line).</summary>
    public Dictionary<string, int> Tables { get; } = new(StringComparer.Ordinal);

    /// <summary>Table paths that exist only through dotted keys or inline tables.</summary>
    public HashSet<string> Prefixes { get; } = new(StringComparer.Ordinal);

    public static TomlIndex Build(DocumentSyntax document)
    {
        var index = new TomlIndex();
        var arrayCounts = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var kv in document.KeyValues)
        {
            index.Add("", kv);
        }

        foreach (var table in document.Tables)
        {
            if (table.Name is null)
            {
                continue;
            }

            var path = KeyPath(table.Name);
            if (table is TableArraySyntax)
            {
                arrayCounts.TryGetValue(path, out var n);
                arrayCounts[path] = n + 1;
                path = $"{path}[{n.ToString(CultureInfo.InvariantCulture)}]";
            }
            else
            {
                path = WithLastArrayElements(path, arrayCounts);
            }

            var end = table.Span.End.Offset + 1;
            foreach (var kv in table.Items)
            {
                index.Add(path, kv);
                end = kv.Span.End.Offset + 1;
            }

            index.Tables[path] = table.Items.ChildrenCount == 0 ? table.EndOfLineToken?.Span.End.Offset + 1 ?? end : end;
        }

        return index;
    }

    private void Add(string parent, KeyValueSyntax kv)
    {
        if (kv.Key is null || kv.Value is null)
        {
            return;
        }

        var path = Join(parent, KeyPath(kv.Key));
        if (kv.Value is InlineTableSyntax inline)
        {
            Prefixes.Add(path);
            foreach (var item in inline.Items)
            {
                if (item.KeyValue is not null)
                {
                    Add(path, item.KeyValue);
                }
            }

            return;
        }

        for (var dot = path.LastIndexOf('.'); dot > parent.Length; dot = path.LastIndexOf('.', dot - 1))
        {
            Prefixes.Add(path[..dot]);
        }

        Values[path] = kv;
    }

    /// <summary>A sub-table header such as [noise.source.extra] belongs to the last element of each array on its path.</summary>
    private static string WithLastArrayElements(string path, Dictionary<string, int> arrayCounts)
    {
        var parts = path.Split('.');
        var built = "";
        foreach (var part in parts)
        {
            var plain = built.Length == 0 ? part : built + "." + part;
            built = arrayCounts.TryGetValue(plain, out var n) ? $"{plain}[{(n - 1).ToString(CultureInfo.InvariantCulture)}]" : plain;
        }

        return built;
    }

    private static string Join(string parent, string key) => parent.Length == 0 ? key : parent + "." + key;

    private static string KeyPath(KeySyntax key)
    {
        var parts = new List<string> { KeyText(key.Key) };
        parts.AddRange(key.DotKeys.Select(d => KeyText(d.Key)));
        return string.Join('.', parts);
    }

    private static string KeyText(BareKeyOrStringValueSyntax? key) => key switch
    {
        BareKeySyntax bare => bare.Key?.Text ?? "",
        StringValueSyntax quoted => quoted.Value ?? "",
        _ => "",
    };
}
