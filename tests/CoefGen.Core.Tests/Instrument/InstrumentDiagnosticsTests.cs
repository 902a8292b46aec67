using CoefGen.Core.Instrument;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Tests.Instrument;

/// <summary>Bad instrument files: every problem located in the instrument file or the base, with a stable code.</summary>
public class InstrumentDiagnosticsTests
{
    private const string Small = """
        name = "cam4"
        base = "cam4_base.toml"

        [[mode]]
        name = "normal"

        [[mode]]
        name = "fast"
        timing.pixel_ns = 1000
        timing.transfer_ns = 500
        timing.reset.start_ns = 100
        timing.reset.count_ns = 325
        timing.signal.start_ns = 600
        timing.signal.count_ns = 325

        [[channel]]
        name = "a"

        [[channel]]
        name = "b"
        sensor.gain = 2.2
        """;

    private static IReadOnlyList<CoefGen.Core.Diagnostics.Diagnostic> Errors(string instrument, string? baseText = null)
    {
        var (design, diagnostics) = ExampleInstrument.TryDesign(instrument, baseText ?? ExampleInstrument.BaseText);
        Assert.Null(design);
        return diagnostics;
    }

    [Fact]
    public void A_small_instrument_designs_and_a_tables_subset_is_honoured()
    {
        Assert.Equal(4, ExampleInstrument.Design(Small, ExampleInstrument.BaseText).Tables.Count);
        var subset = ExampleInstrument.Design("tables = [\"fast/b\", \"normal/a\"]\n" + Small, ExampleInstrument.BaseText);
        Assert.Equal(["normal/a", "fast/b"], subset.Tables.Select(t => t.Label));
    }

    [Fact]
    public void An_unknown_top_level_key_suggests_the_near_one()
    {
        var d = Assert.Single(Errors(Small.Replace("base = ", "bsae = ", StringComparison.Ordinal)), x => x.Code == InstrumentCodes.UnknownKey);
        Assert.Contains("did you mean 'base'", d.Message, StringComparison.Ordinal);
        Assert.Equal(("cam4.toml", 2), (d.Location.File, d.Location.Line));
    }

    [Fact]
    public void A_misspelt_override_key_is_located_at_the_override_with_did_you_mean()
    {
        var d = Assert.Single(Errors(Small.Replace("sensor.gain = 2.2", "sensor.gian = 2.2", StringComparison.Ordinal)));
        Assert.Equal(ReadoutCodes.UnknownKey, d.Code);
        Assert.Contains("'gain'", d.Message, StringComparison.Ordinal);
        Assert.Contains("tables normal/b, fast/b:", d.Message, StringComparison.Ordinal);
        Assert.Equal(("cam4.toml", 21, 1), (d.Location.File, d.Location.Line, d.Location.Column));
    }

    [Fact]
    public void A_bad_override_value_is_located_at_the_override_and_names_the_tables()
    {
        var errors = Errors(Small.Replace("sensor.gain = 2.2", "sensor.gain = \"high\"", StringComparison.Ordinal));
        Assert.NotEmpty(errors);
        Assert.All(errors, d => Assert.Equal(("cam4.toml", 21), (d.Location.File, d.Location.Line)));
        Assert.Contains(errors, d => d.Message.Contains("tables normal/b, fast/b", StringComparison.Ordinal));
    }

    [Fact]
    public void An_error_in_the_base_is_located_in_the_base()
    {
        var d = Assert.Single(Errors(Small, ExampleInstrument.BaseText.Replace("bits = 16", "bitz = 16", StringComparison.Ordinal)), x => x.Code == ReadoutCodes.UnknownKey);
        Assert.Equal("cam4_base.toml", d.Location.File);
        Assert.Equal(8, d.Location.Line);
    }

    [Fact]
    public void A_key_set_by_a_mode_and_a_channel_is_refused_at_the_channel()
    {
        var d = Assert.Single(Errors(Small.Replace("sensor.gain = 2.2", "timing.pixel_ns = 1200", StringComparison.Ordinal)), x => x.Code == InstrumentCodes.KeySetTwice);
        Assert.Equal(21, d.Location.Line);
    }

    [Fact]
    public void An_unknown_table_in_the_subset_suggests_the_near_one_and_names_duplicates()
    {
        var d = Assert.Single(Errors("tables = [\"fats/b\"]\n" + Small));
        Assert.Equal(InstrumentCodes.UnknownTable, d.Code);
        Assert.Contains("did you mean 'fast/b'", d.Message, StringComparison.Ordinal);
        Assert.Contains(Errors(Small.Replace("name = \"b\"", "name = \"a\"", StringComparison.Ordinal)), x => x.Code == InstrumentCodes.DuplicateName);
    }

    [Fact]
    public void A_per_table_emit_path_without_placeholders_is_refused()
    {
        var d = Assert.Single(Errors(Small + "\n[[emit]]\ntemplate = \"c-header\"\npath = \"x.h\"\n"));
        Assert.Equal(InstrumentCodes.EmitPathNeedsTable, d.Code);
    }

    [Fact]
    public void Detection_tells_an_instrument_from_a_readout_file()
    {
        Assert.True(InstrumentLoader.IsInstrument(System.Text.Encoding.UTF8.GetBytes(Small)));
        Assert.False(InstrumentLoader.IsInstrument(System.Text.Encoding.UTF8.GetBytes(ExampleInstrument.BaseText)));
    }
}
