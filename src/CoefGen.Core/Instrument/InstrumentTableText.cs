using CoefGen.Core.Diagnostics;
using CoefGen.Core.Study;

namespace CoefGen.Core.Instrument;

/// <summary>The readout text of one table: the base with its name, the mode's and then the channel's overrides written in.</summary>
public static class InstrumentTableText
{
    /// <summary>The table's design name, which is also its identifier prefix in emitted files.</summary>
    public static string TableName(InstrumentSpec spec, InstrumentVariant mode, InstrumentVariant channel) => $"{spec.Name}_{mode.Name}_{channel.Name}";

    /// <summary>Returns the edited text, or null with the located problems (an override that cannot be written, a key set by both).</summary>
    public static string? Compose(string baseText, InstrumentSpec spec, InstrumentVariant mode, InstrumentVariant channel, DiagnosticBag bag)
    {
        ArgumentNullException.ThrowIfNull(baseText);
        ArgumentNullException.ThrowIfNull(spec);
        ArgumentNullException.ThrowIfNull(mode);
        ArgumentNullException.ThrowIfNull(channel);
        ArgumentNullException.ThrowIfNull(bag);
        var text = ReadoutTextEditor.SetLiteral(baseText, "name", $"\"{TableName(spec, mode, channel)}\"", out var error);
        var ok = text is not null;
        foreach (var o in channel.Overrides.Where(c => mode.Overrides.Any(m => m.Key == c.Key)))
        {
            bag.Error(InstrumentCodes.KeySetTwice, o.Location,
                $"'{o.Key}' is set by mode '{mode.Name}' and by channel '{channel.Name}'; set each key in one of them", o.Key);
            ok = false;
        }

        foreach (var o in mode.Overrides.Concat(channel.Overrides))
        {
            if (text is null)
            {
                break;
            }

            var edited = ReadoutTextEditor.SetLiteral(text, o.Key, o.Literal, out error);
            if (edited is null)
            {
                bag.Error(InstrumentCodes.OverrideNotApplicable, o.Location, error ?? "the key cannot be set in the base readout file", o.Key);
                ok = false;
                continue;
            }

            text = edited;
        }

        return ok ? text : null;
    }
}
