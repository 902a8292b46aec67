using System.Text;

namespace CoefGen.Core.Emit;

/// <summary>The normal form of every emitted file: "\n" line ends only, no trailing blanks, exactly one final "\n".</summary>
public static class OutputText
{
    public static string Normalize(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var lines = text.Replace("\r\n", "\n", StringComparison.Ordinal).Replace('\r', '\n').Split('\n');
        var sb = new StringBuilder(text.Length + 1);
        foreach (var line in lines)
        {
            sb.Append(line.TrimEnd(' ', '\t')).Append('\n');
        }

        var s = sb.ToString().TrimEnd('\n');
        return s + "\n";
    }
}
