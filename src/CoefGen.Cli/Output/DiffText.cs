using System.Text;
using CoefGen.Core.Instrument;

namespace CoefGen.Cli.Output;

/// <summary>The terminal listing of `coefgen diff`.</summary>
internal static class DiffText
{
    public static string Render(string before, string after, IReadOnlyList<DiffEntry> entries)
    {
        var sb = new StringBuilder();
        sb.Append($"diff {before} -> {after}\n");
        if (entries.Count == 0)
        {
            sb.Append("  no change\n");
            return sb.ToString();
        }

        var t = new TextTable("table", "quantity".PadRight(entries.Max(e => e.Quantity.Length)), "before", "after") { LeftAlignLast = true };
        var width = entries.Max(e => e.Quantity.Length);
        foreach (var e in entries)
        {
            t.Add(e.Table, e.Quantity.PadRight(width), e.Before, e.After);
        }

        sb.Append(t.Render());
        var tables = entries.Select(e => e.Table).Distinct().Count();
        sb.Append($"  {Eng.Int(entries.Count)} changed {(entries.Count == 1 ? "quantity" : "quantities")} in {Eng.Int(tables)} {(tables == 1 ? "table" : "tables")}\n");
        return sb.ToString();
    }
}
