using CoefGen.Core.Study;

namespace CoefGen.Core.Tests.Study;

public class ReadoutTextEditorTests
{
    private const string Text = "name = \"a\"\n\n[adc]\nrate_hz = \"20 MHz\" # clock\nbits = 16\n\n[timing.signal]\nstart_ns = 5800\ncount_ns = 3800\n\n[[noise.source]]\nname = \"x\"\nflicker_corner_hz = 10\n\n[[noise.source]]\nname = \"y\"\nflicker_corner_hz = 20\n";

    [Fact]
    public void Replacing_a_value_keeps_every_other_byte_including_the_comment()
    {
        var edited = ReadoutTextEditor.SetNumber(Text, "adc.rate_hz", 4e7, out var error);
        Assert.Null(error);
        Assert.Equal(Text.Replace("\"20 MHz\"", "40000000", StringComparison.Ordinal), edited);
    }

    [Fact]
    public void A_key_written_in_nanoseconds_is_replaced_by_the_samples_key()
    {
        var edited = ReadoutTextEditor.SetNumber(Text, "timing.signal.count", 12, out _);
        Assert.Equal(Text.Replace("count_ns = 3800", "count = 12", StringComparison.Ordinal), edited);
    }

    [Fact]
    public void An_element_of_an_array_of_tables_is_addressed_by_index()
    {
        var edited = ReadoutTextEditor.SetNumber(Text, "noise.source[1].flicker_corner_hz", 2.5e3, out _);
        Assert.Equal(Text.Replace("flicker_corner_hz = 20", "flicker_corner_hz = 2500", StringComparison.Ordinal), edited);
    }

    [Fact]
    public void A_missing_key_is_added_to_its_table()
    {
        var edited = ReadoutTextEditor.SetNumber(Text, "adc.noise_lsb", 0.25, out _);
        Assert.Equal(Text.Replace("bits = 16\n", "bits = 16\nnoise_lsb = 0.25\n", StringComparison.Ordinal), edited);
    }

    [Fact]
    public void Fractions_become_float_literals_and_whole_numbers_integers()
    {
        Assert.Equal("3", ReadoutTextEditor.Literal(3.0));
        Assert.Equal("0.1", ReadoutTextEditor.Literal(0.1));
        Assert.Equal("1E+20", ReadoutTextEditor.Literal(1e20));
    }
}
