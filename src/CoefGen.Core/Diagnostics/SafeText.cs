using System.Globalization;
using System.Text;

namespace CoefGen.Core.Diagnostics;

/// <summary>
/// Makes text from a user file safe to quote in a message: control characters escaped (so a file cannot
/// move the cursor or recolour a CI log) and the length capped (so a message never carries a whole file).
/// </summary>
public static class SafeText
{
    /// <summary>Longest quote of file content in a message.</summary>
    public const int DefaultExcerptLength = 60;

    /// <summary>The text with control characters as \t, \r, \n or \xNN (\uNNNN above 0xFF), cut to <paramref name="maxLength"/> characters plus "...".</summary>
    public static string Excerpt(string text, int maxLength = DefaultExcerptLength)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentOutOfRangeException.ThrowIfLessThan(maxLength, 1);
        var sb = new StringBuilder(Math.Min(text.Length, maxLength) + 8);
        foreach (var c in text)
        {
            if (sb.Length >= maxLength)
            {
                return sb.Append("...").ToString();
            }

            switch (c)
            {
                case '\t': sb.Append("\\t"); break;
                case '\r': sb.Append("\\r"); break;
                case '\n': sb.Append("\\n"); break;
                default:
                    if (char.IsControl(c) || c is '\u2028' or '\u2029' or '\u202E')
                    {
                        sb.Append(c <= 0xFF ? "\\x" + ((int)c).ToString("X2", CultureInfo.InvariantCulture) : "\\u" + ((int)c).ToString("X4", CultureInfo.InvariantCulture));
                    }
                    else
                    {
                        sb.Append(c);
                    }

                    break;
            }
        }

        return sb.ToString();
    }
}
