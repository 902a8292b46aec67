namespace CoefGen.Core.Readout.Loading;

/// <summary>Suggests the closest allowed word for a misspelt key or value (optimal string alignment distance).</summary>
public static class DidYouMean
{
    /// <summary>The closest candidate within a third of the word's length (at least 1 edit), or null.</summary>
    public static string? Suggest(string given, IEnumerable<string> candidates)
    {
        ArgumentNullException.ThrowIfNull(given);
        ArgumentNullException.ThrowIfNull(candidates);
        var limit = Math.Max(1, given.Length / 3);
        string? best = null;
        var bestDistance = int.MaxValue;
        foreach (var candidate in candidates)
        {
            var d = Distance(given, candidate);
            if (d <= limit && d < bestDistance)
            {
                best = candidate;
                bestDistance = d;
            }
        }

        return best;
    }

    /// <summary>Edits (insert, delete, substitute, swap of neighbours) that turn <paramref name="a"/> into <paramref name="b"/>.</summary>
    public static int Distance(string a, string b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        var d = new int[a.Length + 1, b.Length + 1];
        for (var i = 0; i <= a.Length; i++)
        {
            d[i, 0] = i;
        }

        for (var j = 0; j <= b.Length; j++)
        {
            d[0, j] = j;
        }

        for (var i = 1; i <= a.Length; i++)
        {
            for (var j = 1; j <= b.Length; j++)
            {
                var cost = char.ToLowerInvariant(a[i - 1]) == char.ToLowerInvariant(b[j - 1]) ? 0 : 1;
                var value = Math.Min(Math.Min(d[i - 1, j] + 1, d[i, j - 1] + 1), d[i - 1, j - 1] + cost);
                if (i > 1 && j > 1 && a[i - 1] == b[j - 2] && a[i - 2] == b[j - 1])
                {
                    value = Math.Min(value, d[i - 2, j - 2] + 1);
                }

                d[i, j] = value;
            }
        }

        return d[a.Length, b.Length];
    }
}
