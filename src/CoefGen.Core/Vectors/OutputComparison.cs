namespace CoefGen.Core.Vectors;

/// <summary>A DUT's outputs against the expected ones, pixel by pixel.</summary>
public sealed record OutputComparison(int Compared, IReadOnlyList<OutputMismatch> Mismatches)
{
    public bool Matches => Mismatches.Count == 0;

    /// <summary>Compares equal-length lists (the caller reports a count difference as bad input).</summary>
    public static OutputComparison Compare(IReadOnlyList<long> expected, IReadOnlyList<long> got)
    {
        ArgumentNullException.ThrowIfNull(expected);
        ArgumentNullException.ThrowIfNull(got);
        if (expected.Count != got.Count)
        {
            throw new ArgumentException($"{got.Count} values against {expected.Count} expected");
        }

        var mismatches = new List<OutputMismatch>();
        for (var i = 0; i < expected.Count; i++)
        {
            if (expected[i] != got[i])
            {
                mismatches.Add(new OutputMismatch(i, expected[i], got[i]));
            }
        }

        return new OutputComparison(expected.Count, mismatches);
    }
}
