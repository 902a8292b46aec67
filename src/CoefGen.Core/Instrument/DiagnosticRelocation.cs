using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Instrument;

/// <summary>
/// Moves a diagnostic about a table's edited readout text to where the user wrote the cause: the override in the
/// instrument file when its key is the one set (or lies in a table the override created), else the key in the base file.
/// </summary>
internal sealed class DiagnosticRelocation(ReadoutDescription baseDescription, string baseText, string tableText, IReadOnlyList<InstrumentOverride> overrides)
{
    // Edits in place keep every line; an inserted key shifts the lines below it, so only keyed locations can be trusted then.
    private readonly bool sameLines = baseText.Count(ch => ch == '\n') == tableText.Count(ch => ch == '\n');

    public Diagnostic Apply(Diagnostic d)
    {
        if (d.Key is string key && key.Length > 0)
        {
            var exact = overrides.FirstOrDefault(o => o.Key == key);
            var inside = overrides.FirstOrDefault(o => o.Key.StartsWith(key + ".", StringComparison.Ordinal) || o.Key.StartsWith(key + "[", StringComparison.Ordinal));
            if ((exact ?? inside) is InstrumentOverride o && (exact is not null || !baseDescription.KeyLocations.ContainsKey(key)))
            {
                return d with { Location = o.Location, Key = o.Key };
            }

            if (!sameLines)
            {
                return d with { Location = baseDescription.LocationOf(key) };
            }
        }

        return sameLines ? d : d with { Location = SourceLocation.FileOnly(baseDescription.SourcePath) };
    }
}
