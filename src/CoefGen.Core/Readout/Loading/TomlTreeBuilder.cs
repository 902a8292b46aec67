using CoefGen.Core.Diagnostics;
using Tomlyn.Syntax;

namespace CoefGen.Core.Readout.Loading;

/// <summary>Turns Tomlyn's syntax tree into <see cref="TomlTable"/>s that remember positions.</summary>
internal static class TomlTreeBuilder
{
    public static TomlTable Build(DocumentSyntax document, string file)
    {
        var root = new TomlTable("", SourceLocation.FileOnly(file)); // missing top-level keys are blamed on the file
        foreach (var kv in document.KeyValues)
        {
            AddKeyValue(root, kv, file);
        }

        foreach (var header in document.Tables)
        {
            if (header.Name is null)
            {
                continue;
            }

            var segments = Segments(header.Name, file);
            var parent = Walk(root, segments.Take(segments.Count - 1));
            var (name, location) = segments[^1];
            var table = header is TableArraySyntax
                ? AppendArrayElement(parent, name, location)
                : OpenTable(parent, name, location, isHeader: true);
            foreach (var kv in header.Items)
            {
                AddKeyValue(table, kv, file);
            }
        }

        return root;
    }

    private static void AddKeyValue(TomlTable table, KeyValueSyntax kv, string file)
    {
        if (kv.Key is null || kv.Value is null)
        {
            return;
        }

        var segments = Segments(kv.Key, file);
        var parent = Walk(table, segments.Take(segments.Count - 1));
        var (name, keyLocation) = segments[^1];
        AddValue(parent, name, keyLocation, kv.Value, file);
    }

    private static void AddValue(TomlTable parent, string name, SourceLocation keyLocation, ValueSyntax value, string file)
    {
        switch (value)
        {
            case InlineTableSyntax inline:
                var table = OpenTable(parent, name, keyLocation, isHeader: false);
                foreach (var item in inline.Items)
                {
                    if (item.KeyValue is not null)
                    {
                        AddKeyValue(table, item.KeyValue, file);
                    }
                }

                break;
            case ArraySyntax array when array.Items.ChildrenCount > 0 && array.Items.All(i => i.Value is InlineTableSyntax):
                foreach (var item in array.Items)
                {
                    var element = AppendArrayElement(parent, name, Locate(item.Value!, file));
                    foreach (var inner in ((InlineTableSyntax)item.Value!).Items)
                    {
                        if (inner.KeyValue is not null)
                        {
                            AddKeyValue(element, inner.KeyValue, file);
                        }
                    }
                }

                break;
            default:
                parent.Add(TomlEntry.ForValue(name, parent.ChildPath(name), keyLocation, value, Locate(value, file)));
                break;
        }
    }

    /// <summary>Follows (or creates) the tables named by dotted-key prefixes; the last element of an array of tables is meant.</summary>
    private static TomlTable Walk(TomlTable from, IEnumerable<(string Name, SourceLocation Location)> segments)
    {
        var current = from;
        foreach (var (name, location) in segments)
        {
            var entry = current.Find(name);
            current = entry switch
            {
                { Kind: TomlEntryKind.Table } => entry.Table!,
                { Kind: TomlEntryKind.TableArray } when entry.Tables!.Count > 0 => entry.Tables[^1],
                null => OpenTable(current, name, location, isHeader: false),
                _ => new TomlTable(current.ChildPath(name), location), // conflict already reported by Tomlyn
            };
        }

        return current;
    }

    private static TomlTable OpenTable(TomlTable parent, string name, SourceLocation location, bool isHeader)
    {
        var entry = parent.Find(name);
        if (entry is { Kind: TomlEntryKind.Table })
        {
            if (isHeader)
            {
                entry.Table!.MoveTo(location);
            }

            return entry.Table!;
        }

        var table = new TomlTable(parent.ChildPath(name), location);
        if (entry is null)
        {
            parent.Add(TomlEntry.ForTable(name, table));
        }

        return table;
    }

    private static TomlTable AppendArrayElement(TomlTable parent, string name, SourceLocation location)
    {
        var entry = parent.Find(name);
        if (entry is null)
        {
            entry = TomlEntry.ForTableArray(name, parent.ChildPath(name), location);
            parent.Add(entry);
        }

        if (entry.Kind != TomlEntryKind.TableArray)
        {
            return new TomlTable(parent.ChildPath(name), location); // conflict already reported by Tomlyn
        }

        var element = new TomlTable($"{entry.Path}[{entry.Tables!.Count}]", location);
        entry.Tables.Add(element);
        return element;
    }

    private static List<(string Name, SourceLocation Location)> Segments(KeySyntax key, string file)
    {
        var list = new List<(string, SourceLocation)> { (KeyText(key.Key), Locate(key.Key ?? (SyntaxNode)key, file)) };
        foreach (var dotted in key.DotKeys)
        {
            list.Add((KeyText(dotted.Key), Locate(dotted.Key ?? (SyntaxNode)dotted, file)));
        }

        return list;
    }

    private static string KeyText(BareKeyOrStringValueSyntax? key) => key switch
    {
        BareKeySyntax bare => bare.Key?.Text ?? "",
        StringValueSyntax quoted => quoted.Value ?? "",
        _ => "",
    };

    /// <summary>Tomlyn positions are 0-based; ours are 1-based.</summary>
    public static SourceLocation Locate(SyntaxNode node, string file) =>
        new(file, node.Span.Start.Line + 1, node.Span.Start.Column + 1);
}
