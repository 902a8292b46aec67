using System.Globalization;
using Tomlyn.Syntax;

namespace CoefGen.Core.Study;

/// <summary>
/// The [[timing.window]] entries as written in a readout text, by position: the loader names an unnamed entry
/// "w{position}" and the first copy of a repeated window keeps its name, so a loaded window maps back to the entry
/// whose keys the studies rewrite (timing.window[i].start, .count, .transfer_sample).
/// </summary>
internal static class WrittenWindows
{
    /// <summary>The entry names in file order, or null when the text is not valid TOML.</summary>
    public static IReadOnlyList<string>? Names(string text)
    {
        var document = Tomlyn.Parsing.SyntaxParser.Parse(text, "edit", true);
        if (document.HasErrors)
        {
            return null;
        }

        var index = TomlIndex.Build(document);
        var names = new List<string>();
        for (var k = 0; index.Tables.ContainsKey(Path(k)); k++)
        {
            names.Add(index.Values.TryGetValue(Path(k) + ".name", out var kv) && kv.Value is StringValueSyntax s ? s.Value ?? "" : string.Create(CultureInfo.InvariantCulture, $"w{k}"));
        }

        return names;
    }

    /// <summary>The dotted path of entry <paramref name="k"/>: timing.window[k].</summary>
    public static string Path(int k) => string.Create(CultureInfo.InvariantCulture, $"timing.window[{k}]");
}
