using System.Globalization;
using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Vectors;

/// <summary>Reads the expected outputs back from expected.txt (first decimal value of each line; the second is the accumulator).</summary>
public static class ExpectedOutputs
{
    public static (IReadOnlyList<long>? Outputs, IReadOnlyList<Diagnostic> Diagnostics) Parse(string text, string path, int expectedCount)
    {
        var (outputs, _, diagnostics) = ParseWithAccumulators(text, path, expectedCount);
        return (outputs, diagnostics);
    }

    /// <summary>Outputs and accumulators (both null on a problem).</summary>
    public static (IReadOnlyList<long>? Outputs, IReadOnlyList<long>? Accumulators, IReadOnlyList<Diagnostic> Diagnostics) ParseWithAccumulators(string text, string path, int expectedCount)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(path);
        var outputs = new List<long>();
        var accs = new List<long>();
        var lines = text.Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            var line = lines[i].Trim();
            if (line.Length == 0)
            {
                continue;
            }

            var parts = line.Split(' ');
            if (!long.TryParse(parts[0], NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var v))
            {
                return (null, null, [Diagnostic.Error(VectorCodes.ExpectedMalformed, new SourceLocation(path, i + 1, 1), $"'{parts[0]}' is not a decimal output value")]);
            }

            if (parts.Length != 2 || !long.TryParse(parts[1], NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var a))
            {
                return (null, null, [Diagnostic.Error(VectorCodes.ExpectedMalformed, new SourceLocation(path, i + 1, 1), "not an output and an accumulator value")]);
            }

            outputs.Add(v);
            accs.Add(a);
        }

        if (outputs.Count != expectedCount)
        {
            return (null, null, [Diagnostic.Error(VectorCodes.ExpectedCount, SourceLocation.FileOnly(path),
                $"{outputs.Count} expected values but the manifest says {expectedCount} pixels; regenerate the vectors")]);
        }

        return (outputs, accs, []);
    }
}
