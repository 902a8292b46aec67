using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Instrument;

/// <summary>
/// One [[emit]] entry of an instrument file. A combined template (<see cref="InstrumentTemplates"/>) writes one file for
/// all tables; any other template is rendered once per table and its path must contain {mode} and {channel}.
/// </summary>
public sealed record InstrumentEmitEntry(string Template, string Path, SourceLocation Location)
{
    public bool Combined => InstrumentTemplates.TryGet(Template, out _);

    /// <summary>The output path of one table (placeholders replaced).</summary>
    public string PathFor(string mode, string channel) => Path.Replace("{mode}", mode, StringComparison.Ordinal).Replace("{channel}", channel, StringComparison.Ordinal);
}
