namespace CoefGen.Core.Study;

/// <summary>Several numeric keys set in one go through <see cref="ReadoutTextEditor.SetNumber"/>.</summary>
internal static class TextEdits
{
    /// <summary>The text with every edit applied in order, or null with the first problem.</summary>
    public static string? Apply(string text, IEnumerable<(string Key, double Value)> edits, out string? error)
    {
        string? edited = text;
        error = null;
        foreach (var (key, value) in edits)
        {
            edited = ReadoutTextEditor.SetNumber(edited, key, value, out error);
            if (edited is null)
            {
                return null;
            }
        }

        return edited;
    }
}
