using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Readout.Loading;

/// <summary>State shared by the section readers while one readout file is loaded.</summary>
internal sealed class LoadContext
{
    public LoadContext(string file, RelativeFileReader readRelative)
    {
        File = file;
        ReadRelative = readRelative;
    }

    public string File { get; }

    public DiagnosticBag Bag { get; } = new();

    /// <summary>Key (and table) locations by dotted path, for <see cref="ReadoutDescription.KeyLocations"/>.</summary>
    public Dictionary<string, SourceLocation> Locations { get; } = new(StringComparer.Ordinal);

    public RelativeFileReader ReadRelative { get; }

    /// <summary>Errors so far (warnings not counted), to tell whether a step added any.</summary>
    public int ErrorCount => Bag.Items.Count(d => d.Severity == Severity.Error);

    public SourceLocation FileOnly => SourceLocation.FileOnly(File);

    public void Error(string code, SourceLocation location, string key, string message) =>
        Bag.Error(code, location, message, key);

    public void Warning(string code, SourceLocation location, string key, string message) =>
        Bag.Warning(code, location, message, key);
}
