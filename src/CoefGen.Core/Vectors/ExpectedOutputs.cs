using System.Globalization;
using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Vectors;

/// <summary>Reads the expected outputs back from expected.txt (first decimal value of each line).</summary>
public static class ExpectedOutputs
{
    public static (IReadOnlyList<long>? Outputs, IReadOnlyList<Diagnostic> Diagnostics) Parse(string text, string path, int expectedCount)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentNullException.ThrowIfNull(path);
        var outputs = new List<long>();
        var lines = text.Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            var line = lines[i].Trim();
            if (line.Length == 0)
            {
                continue;
            }

            var first = line.Split(' ', 2)[0];
            if (!long.TryParse(first, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out var v))
            {
                return (null, [Diagnostic.Error(VectorCodes.ExpectedMalformed, new SourceLocation(path, i + 1, 1), $"'{first}' is not a decimal output value")]);
            }

            outputs.Add(v);
        }

        if (outputs.Count != expectedCount)
        {
            return (null, [Diagnostic.Error(VectorCodes.ExpectedCount, SourceLocation.FileOnly(path),
                $"{outputs.Count} expected values but the manifest says {expectedCount} pixels; regenerate the vectors")]);
        }

        return (outputs, []);
    }
}
