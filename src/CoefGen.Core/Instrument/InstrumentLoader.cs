using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using System.Text.RegularExpressions;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout;
using CoefGen.Core.Readout.Loading;
using CoefGen.Core.Study;
using Tomlyn.Parsing;
using Tomlyn.Syntax;

namespace CoefGen.Core.Instrument;

/// <summary>
/// Reads an instrument file (TOML). Top level: name, base, optional tables = ["mode/channel", ...]; [[mode]] and
/// [[channel]] entries hold a name and any keys of the base readout file by their dotted paths (adc.rate_hz = "20 MHz",
/// timing.reset.count = 40, "noise.source[0].white_nv_per_rthz" = 8); [[emit]] entries as in a readout file. Whether an
/// override names a real readout key is decided by the readout loader on the edited base (did-you-mean included).
/// </summary>
public static partial class InstrumentLoader
{
    private static readonly string[] TopKeys = ["name", "base", "tables", "mode", "channel", "emit"];

    /// <summary>True when the bytes parse as TOML with a top-level `base` key: an instrument file, not a readout file.</summary>
    public static bool IsInstrument(byte[] content)
    {
        ArgumentNullException.ThrowIfNull(content);
        string text;
        try
        {
            text = new UTF8Encoding(false, true).GetString(content);
        }
        catch (DecoderFallbackException)
        {
            return false;
        }

        var document = SyntaxParser.Parse(text.TrimStart('\uFEFF'), "probe", true);
        return !document.HasErrors && document.KeyValues.Any(kv => kv.Key is not null && KeyName(kv.Key) == "base");
    }

    public static InstrumentLoadResult Load(byte[] content, string sourcePath)
    {
        ArgumentNullException.ThrowIfNull(content);
        ArgumentNullException.ThrowIfNull(sourcePath);
        var bag = new DiagnosticBag();
        string text;
        try
        {
            text = new UTF8Encoding(false, true).GetString(content).TrimStart('\uFEFF');
        }
        catch (DecoderFallbackException)
        {
            bag.Error(ReadoutCodes.TomlSyntax, new SourceLocation(sourcePath, 1, 1), "the file is not UTF-8 text; an instrument file is TOML");
            return new InstrumentLoadResult(null, bag.Items);
        }

        var document = SyntaxParser.Parse(text, sourcePath, true);
        if (document.HasErrors)
        {
            foreach (var m in document.Diagnostics.Where(m => m.Kind == DiagnosticMessageKind.Error))
            {
                bag.Error(ReadoutCodes.TomlSyntax, new SourceLocation(sourcePath, m.Span.Start.Line + 1, m.Span.Start.Column + 1), $"TOML syntax: {m.Message}");
            }

            return new InstrumentLoadResult(null, bag.Items);
        }

        var index = TomlIndex.Build(document);
        var reader = new Reader(sourcePath, text, document, bag);
        var name = reader.Identifier(index, "name", "name");
        var basePath = reader.String(index, "base");
        var modes = reader.Variants(index, "mode");
        var channels = reader.Variants(index, "channel");
        var emit = reader.Emit(index);
        foreach (var (path, kv) in index.Values.OrderBy(v => v.Value.Span.Start.Offset))
        {
            reader.CheckKnown(path, kv);
        }

        var tables = reader.Tables(index, modes, channels);
        if (bag.HasErrors || name is null || basePath is null)
        {
            return new InstrumentLoadResult(null, bag.Items);
        }

        var spec = new InstrumentSpec
        {
            Name = name,
            SourcePath = sourcePath,
            BasePath = basePath,
            BaseLocation = reader.At(index.Values["base"]),
            Modes = modes,
            Channels = channels,
            Tables = tables,
            Emit = emit,
            ContentSha256 = Convert.ToHexStringLower(SHA256.HashData(content)),
        };
        return new InstrumentLoadResult(spec, bag.Items);
    }

    [GeneratedRegex("^[A-Za-z][A-Za-z0-9_]*$")]
    private static partial Regex IdentifierPattern();

    private static string KeyName(KeySyntax key) =>
        string.Join('.', new[] { key.Key }.Concat(key.DotKeys.Select(d => d.Key)).Select(k => k switch
        {
            BareKeySyntax bare => bare.Key?.Text ?? "",
            StringValueSyntax quoted => quoted.Value ?? "",
            _ => "",
        }));

    private sealed class Reader(string sourcePath, string text, DocumentSyntax document, DiagnosticBag bag)
    {
        public SourceLocation At(KeyValueSyntax kv) => new(sourcePath, kv.Span.Start.Line + 1, kv.Span.Start.Column + 1);

        private SourceLocation At(TableSyntaxBase table) => new(sourcePath, table.Span.Start.Line + 1, table.Span.Start.Column + 1);

        public string? String(TomlIndex index, string path, SourceLocation? missingAt = null)
        {
            if (!index.Values.TryGetValue(path, out var kv))
            {
                bag.Error(InstrumentCodes.MissingKey, missingAt ?? SourceLocation.FileOnly(sourcePath), $"missing key '{path}' (a string)", path);
                return null;
            }

            if (kv.Value is StringValueSyntax s && s.Value is not null)
            {
                return s.Value;
            }

            bag.Error(InstrumentCodes.WrongType, At(kv), $"'{path}' must be a string", path);
            return null;
        }

        public string? Identifier(TomlIndex index, string path, string what, SourceLocation? missingAt = null)
        {
            var value = String(index, path, missingAt);
            if (value is not null && !IdentifierPattern().IsMatch(value))
            {
                bag.Error(InstrumentCodes.BadName, At(index.Values[path]),
                    $"{what} '{value}' is not an identifier: a letter, then letters, digits or '_' (it names tables and emitted constants)", path);
                return null;
            }

            return value;
        }

        public List<InstrumentVariant> Variants(TomlIndex index, string array)
        {
            var list = new List<InstrumentVariant>();
            var headers = ArrayHeaders(array);
            for (var i = 0; i < headers.Count; i++)
            {
                var prefix = $"{array}[{i.ToString(CultureInfo.InvariantCulture)}]";
                var name = Identifier(index, prefix + ".name", $"{array} name", headers[i]);
                var overrides = new List<InstrumentOverride>();
                foreach (var (path, kv) in index.Values.Where(v => v.Key.StartsWith(prefix + ".", StringComparison.Ordinal)).OrderBy(v => v.Value.Span.Start.Offset))
                {
                    var key = path[(prefix.Length + 1)..];
                    if (key == "name")
                    {
                        continue;
                    }

                    if (kv.Value is ArraySyntax or null)
                    {
                        bag.Error(InstrumentCodes.WrongType, At(kv), $"'{key}' in [[{array}]] must be one value (a number, string or boolean); arrays cannot be overridden", path);
                        continue;
                    }

                    var literal = text.Substring(kv.Value.Span.Start.Offset, kv.Value.Span.End.Offset - kv.Value.Span.Start.Offset + 1);
                    overrides.Add(new InstrumentOverride(key, literal, At(kv)));
                }

                if (name is not null)
                {
                    if (list.Any(v => v.Name == name))
                    {
                        bag.Error(InstrumentCodes.DuplicateName, At(index.Values[prefix + ".name"]), $"two [[{array}]] entries are named '{name}'", prefix + ".name");
                    }

                    list.Add(new InstrumentVariant(name, headers[i], overrides));
                }
            }

            if (headers.Count == 0)
            {
                bag.Error(InstrumentCodes.MissingKey, SourceLocation.FileOnly(sourcePath), $"no [[{array}]] entry: an instrument needs at least one {array} (it may set no key)", array);
            }

            return list;
        }

        public List<InstrumentEmitEntry> Emit(TomlIndex index)
        {
            var list = new List<InstrumentEmitEntry>();
            var headers = ArrayHeaders("emit");
            for (var i = 0; i < headers.Count; i++)
            {
                var prefix = $"emit[{i.ToString(CultureInfo.InvariantCulture)}]";
                var template = String(index, prefix + ".template", headers[i]);
                var path = String(index, prefix + ".path", headers[i]);
                if (template is null || path is null)
                {
                    continue;
                }

                var entry = new InstrumentEmitEntry(template, path, headers[i]);
                if (!entry.Combined && !(path.Contains("{mode}", StringComparison.Ordinal) && path.Contains("{channel}", StringComparison.Ordinal)))
                {
                    bag.Error(InstrumentCodes.EmitPathNeedsTable, At(index.Values[prefix + ".path"]),
                        $"'{template}' is rendered once per table: its path must contain {{mode}} and {{channel}} (e.g. \"cam_{{mode}}_{{channel}}_coefs.h\"), or use a combined template ({string.Join(", ", InstrumentTemplates.All.Select(t => t.Name))})", prefix + ".path");
                    continue;
                }

                list.Add(entry);
            }

            return list;
        }

        public List<(int Mode, int Channel)> Tables(TomlIndex index, List<InstrumentVariant> modes, List<InstrumentVariant> channels)
        {
            var all = new List<(int, int)>();
            if (!index.Values.TryGetValue("tables", out var kv))
            {
                for (var m = 0; m < modes.Count; m++)
                {
                    for (var c = 0; c < channels.Count; c++)
                    {
                        all.Add((m, c));
                    }
                }

                return all;
            }

            if (kv.Value is not ArraySyntax array)
            {
                bag.Error(InstrumentCodes.WrongType, At(kv), "'tables' must be an array of \"mode/channel\" strings", "tables");
                return all;
            }

            var chosen = new HashSet<(int, int)>();
            foreach (var item in array.Items)
            {
                var s = (item.Value as StringValueSyntax)?.Value;
                var parts = s?.Split('/');
                var m = parts is { Length: 2 } ? modes.FindIndex(v => v.Name == parts[0]) : -1;
                var c = parts is { Length: 2 } ? channels.FindIndex(v => v.Name == parts[1]) : -1;
                if (m < 0 || c < 0)
                {
                    var names = string.Join(", ", modes.SelectMany(mo => channels.Select(ch => $"{mo.Name}/{ch.Name}")));
                    var near = s is null ? null : DidYouMean.Suggest(s, modes.SelectMany(mo => channels.Select(ch => $"{mo.Name}/{ch.Name}")));
                    var hint = near is null ? "" : $"did you mean '{near}'? ";
                    bag.Error(InstrumentCodes.UnknownTable, At(kv), $"'{s ?? item.ToString()}' is not a mode/channel of this instrument; {hint}allowed: {names}", "tables");
                    continue;
                }

                if (!chosen.Add((m, c)))
                {
                    bag.Error(InstrumentCodes.DuplicateName, At(kv), $"'{s}' is listed twice", "tables");
                }
            }

            return [.. chosen.OrderBy(t => t.Item1).ThenBy(t => t.Item2)];
        }

        public void CheckKnown(string path, KeyValueSyntax kv)
        {
            var top = path.Split('.', '[')[0];
            if (!TopKeys.Contains(top))
            {
                var near = DidYouMean.Suggest(top, TopKeys);
                var hint = near is null ? "" : $"did you mean '{near}'? ";
                bag.Error(InstrumentCodes.UnknownKey, At(kv), $"unknown key '{top}'; {hint}allowed: {string.Join(", ", TopKeys)}", path);
                return;
            }

            var isArray = path.Length > top.Length && path[top.Length] == '[';
            if (top is "mode" or "channel" or "emit" && !isArray)
            {
                bag.Error(InstrumentCodes.WrongType, At(kv), $"'{top}' must be an array of tables: write [[{top}]]", path);
            }
            else if (top is "name" or "base" or "tables" && path != top)
            {
                bag.Error(InstrumentCodes.WrongType, At(kv), $"'{top}' must be a plain value, not a table", path);
            }
            else if (top == "emit")
            {
                var key = path[(path.IndexOf(']', StringComparison.Ordinal) + 2)..];
                if (key is not ("template" or "path"))
                {
                    var near = DidYouMean.Suggest(key, ["template", "path"]);
                    var hint = near is null ? "" : $"did you mean '{near}'? ";
                    bag.Error(InstrumentCodes.UnknownKey, At(kv), $"unknown key '{key}' in [[emit]]; {hint}allowed: template, path", path);
                }
            }
        }

        /// <summary>Location of each [[array]] header, in file order.</summary>
        private List<SourceLocation> ArrayHeaders(string array) => [.. document.Tables.OfType<TableArraySyntax>().Where(t => t.Name is not null && KeyName(t.Name) == array).Select(At)];
    }
}
