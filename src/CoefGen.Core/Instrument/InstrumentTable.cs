using CoefGen.Core.Pipeline;

namespace CoefGen.Core.Instrument;

/// <summary>One designed mode x channel table: its place in the instrument, the readout text it is the design of, and the design on the shared widths.</summary>
public sealed record InstrumentTable(int Index, int ModeIndex, int ChannelIndex, string Mode, string Channel, string Text, DesignResult Result)
{
    /// <summary>"mode/channel", as written in the instrument file's `tables` list.</summary>
    public string Label => $"{Mode}/{Channel}";
}
