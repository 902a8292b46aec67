using System.Text;

namespace CoefGen.Core.Emit;

/// <summary>
/// Turns a design name into an identifier prefix valid in C, C++, VHDL, SystemVerilog and Verilog.
/// Rule, in order: every character outside [A-Za-z0-9_] becomes '_'; the name is lower-cased (VHDL is
/// case-insensitive, so case must not distinguish names); runs of '_' collapse to one (VHDL forbids "__")
/// and leading/trailing '_' are dropped (C reserves leading '_', VHDL forbids both); an empty result becomes
/// "design"; a result starting with a digit, or equal to a keyword of any of the five languages, gets
/// "cg_" in front. The rule never fails, so every name gives a usable prefix.
/// </summary>
public static class IdentifierPrefix
{
    /// <summary>The prefix put in front of names that would otherwise be invalid or reserved.</summary>
    public const string Guard = "cg_";

    /// <summary>Sanitises <paramref name="name"/> by the rule above.</summary>
    public static string FromName(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        var sb = new StringBuilder(name.Length);
        foreach (var ch in name)
        {
            var ok = ch is (>= 'a' and <= 'z') or (>= 'A' and <= 'Z') or (>= '0' and <= '9');
            var c = ok ? char.ToLowerInvariant(ch) : '_';
            if (c == '_' && (sb.Length == 0 || sb[^1] == '_'))
            {
                continue;
            }

            sb.Append(c);
        }

        var s = sb.ToString().TrimEnd('_');
        if (s.Length == 0)
        {
            return "design";
        }

        return char.IsAsciiDigit(s[0]) || ReservedWords.Contains(s) ? Guard + s : s;
    }
}
