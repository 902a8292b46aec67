using System.Text;

namespace CoefGen.Cli.Output;

/// <summary>A plain aligned text table: first column left-aligned, the rest right-aligned.</summary>
internal sealed class TextTable
{
    private readonly List<string[]> _rows = [];

    public TextTable(params string[] header) => _rows.Add(header);

    /// <summary>Left-align the last column too (free text such as descriptions).</summary>
    public bool LeftAlignLast { get; init; }

    public void Add(params string[] cells) => _rows.Add(cells);

    public string Render(string indent = "  ")
    {
        var cols = _rows.Max(r => r.Length);
        var width = new int[cols];
        foreach (var r in _rows)
        {
            for (var c = 0; c < r.Length; c++)
            {
                width[c] = Math.Max(width[c], r[c].Length);
            }
        }

        var sb = new StringBuilder();
        foreach (var r in _rows)
        {
            var line = new StringBuilder(indent);
            for (var c = 0; c < r.Length; c++)
            {
                var cell = r[c];
                line.Append(c == 0 || (LeftAlignLast && c == r.Length - 1) ? cell.PadRight(width[c]) : cell.PadLeft(width[c]));
                if (c < r.Length - 1)
                {
                    line.Append("  ");
                }
            }

            sb.Append(line.ToString().TrimEnd()).Append('\n');
        }

        return sb.ToString();
    }
}
