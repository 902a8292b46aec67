using System.Text;
using CoefGen.Core.Readout;
using static CoefGen.Core.Tests.Readout.ReadoutFixture;

namespace CoefGen.Core.Tests.Readout;

public class KeyValidationTests
{
    [Fact]
    public void Text_that_is_not_toml_is_a_syntax_error()
    {
        var result = Load("this is not toml\n");
        Assert.Null(result.Description);
        Assert.NotEmpty(result.Diagnostics);
        Assert.All(result.Diagnostics, d => Assert.Equal("CG0001", d.Code));
        Assert.Equal(1, result.Diagnostics[0].Location.Line);
    }

    [Fact]
    public void Toml_syntax_error_reports_tomlyns_line_and_column()
    {
        var toml = With("[sensor]", "[sensor");
        var result = Load(toml);
        Assert.Null(result.Description);
        Assert.All(result.Diagnostics, x => Assert.Equal("CG0001", x.Code));
        var d = result.Diagnostics[0]; // Tomlyn's recovery may add follow-on errors after the first
        Assert.Equal(LineOf(toml, "[sensor"), d.Location.Line);
        Assert.Equal(8, d.Location.Column); // the newline after "[sensor"
    }

    [Fact]
    public void Bytes_that_are_not_utf8_are_a_syntax_error()
    {
        var result = ReadoutLoader.Load([0xFF, 0xFE, 0x00, 0x80], SourcePath, _ => null);
        var d = Assert.Single(result.Diagnostics);
        Assert.Equal("CG0001", d.Code);
        Assert.Equal(1, d.Location.Line);
    }

    [Fact]
    public void Redefined_key_is_a_syntax_error()
    {
        var toml = With("bits = 16", "bits = 16\nbits = 18");
        var d = AssertOnly(Load(toml), "CG0001", "", LineOf(toml, "bits = 18"));
        Assert.Contains("bits", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Unknown_key_suggests_the_nearest_allowed_key()
    {
        var toml = With("bits = 16", "bits = 16\nrate_hzz = 3");
        var d = AssertOnly(Load(toml), "CG1001", "adc.rate_hzz", LineOf(toml, "rate_hzz"));
        Assert.Contains("did you mean 'rate_hz'", d.Message, StringComparison.Ordinal);
        Assert.Equal(1, d.Location.Column);
    }

    [Fact]
    public void Unknown_table_suggests_the_nearest_section()
    {
        var toml = Minimal + "\n[weight]\nscheme = \"boxcar\"\n";
        var d = AssertOnly(Load(toml), "CG1001", "weight", LineOf(toml, "[weight]"));
        Assert.Contains("did you mean 'weights'", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Missing_required_key_is_reported_at_its_section()
    {
        var toml = With("bits = 16\n", "");
        var d = AssertOnly(Load(toml), "CG1002", "adc.bits", LineOf(toml, "[adc]"));
        Assert.Contains("bits", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Missing_required_section_is_reported_against_the_file()
    {
        var toml = With("[sensor]\nconversion_gain_uv_per_e = 4.0\ngain = 2.0\n", "");
        AssertOnly(Load(toml), "CG1002", "sensor", 0);
    }

    [Fact]
    public void Missing_name_is_reported()
    {
        var toml = With("name = \"spec_ch0\"\n", "");
        AssertOnly(Load(toml), "CG1002", "name", 0);
    }

    [Fact]
    public void Float_for_an_integer_key_is_a_type_error()
    {
        var toml = With("bits = 16", "bits = 16.0");
        var d = AssertOnly(Load(toml), "CG1003", "adc.bits", LineOf(toml, "bits = 16.0"));
        Assert.Equal(8, d.Location.Column);
    }

    [Theory]
    [InlineData("rate_hz = \"20 MHz\"", "rate_hz = \"fast\"", "adc.rate_hz")]
    [InlineData("rate_hz = \"20 MHz\"", "rate_hz = true", "adc.rate_hz")]
    [InlineData("gain = 2.0", "gain = [2.0]", "sensor.gain")]
    [InlineData("pixel_samples = 400", "pixel_samples = \"400\"", "timing.pixel_samples")]
    [InlineData("name = \"amplifier\"", "name = 7", "noise.source[0].name")]
    public void Value_of_the_wrong_type_is_a_type_error(string oldText, string newText, string key)
    {
        var toml = With(oldText, newText);
        AssertOnly(Load(toml), "CG1003", key, LineOf(toml, newText));
    }

    [Fact]
    public void Section_given_as_a_value_is_a_type_error()
    {
        var toml = With("[sensor]\nconversion_gain_uv_per_e = 4.0\ngain = 2.0\n", "sensor = 3\n");
        toml = "sensor = 3\n" + toml.Replace("sensor = 3\n", "", StringComparison.Ordinal);
        AssertOnly(Load(toml), "CG1003", "sensor", 1);
    }

    [Theory]
    [InlineData("rate_hz = \"20 MHz\"", "rate_hz = 0", "adc.rate_hz")]
    [InlineData("rate_hz = \"20 MHz\"", "rate_hz = nan", "adc.rate_hz")]
    [InlineData("rate_hz = \"20 MHz\"", "rate_hz = \"-20 MHz\"", "adc.rate_hz")]
    [InlineData("full_scale_v = 2.0", "full_scale_v = -1.0", "adc.full_scale_v")]
    [InlineData("full_scale_v = 2.0", "full_scale_v = inf", "adc.full_scale_v")]
    [InlineData("bits = 16", "bits = 33", "adc.bits")]
    [InlineData("bits = 16", "bits = 1", "adc.bits")]
    [InlineData("gain = 2.0", "gain = 0", "sensor.gain")]
    [InlineData("low_cutoff_hz = 0.1", "low_cutoff_hz = 0", "noise.source[0].low_cutoff_hz")]
    [InlineData("white_nv_per_rthz = 6.0", "white_nv_per_rthz = -6.0", "noise.source[0].white_nv_per_rthz")]
    [InlineData("count = 160\n\n[timing.signal]", "count = 0\n\n[timing.signal]", "timing.reset.count")]
    [InlineData("start = 20\n", "start = -1\n", "timing.reset.start")]
    [InlineData("name = \"amplifier\"", "name = \"\"", "noise.source[0].name")]
    public void Value_out_of_range_is_reported_at_the_value(string oldText, string newText, string key)
    {
        var toml = With(oldText, newText);
        var firstLine = newText.Split('\n')[0];
        AssertOnly(Load(toml), "CG1004", key, LineOf(toml, firstLine));
    }

    [Fact]
    public void Fixed_point_widths_are_range_checked()
    {
        var toml = Minimal + "\n[fixed_point]\ncoef_bits = 64\noutput_frac_bits = 33\nsample_bits = 1.5\n";
        var result = Load(toml);
        AssertError(result, "CG1003", "fixed_point.sample_bits", LineOf(toml, "sample_bits"));
        Assert.Equal(["fixed_point.coef_bits", "fixed_point.output_frac_bits"], result.Diagnostics.Where(d => d.Code == "CG1004").Select(d => d.Key));
    }

    [Fact]
    public void Word_that_is_not_allowed_lists_the_allowed_words()
    {
        var toml = With("bits = 16", "bits = 16\ncoding = \"gray\"");
        var d = AssertOnly(Load(toml), "CG1005", "adc.coding", LineOf(toml, "coding"));
        Assert.Contains("\"twos-complement\", \"offset-binary\"", d.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("\n[weights]\nscheme = \"optimum\"\n", "weights.scheme", "did you mean \"optimal\"")]
    [InlineData("\n[fixed_point]\nrounding = \"nearest\"\n", "fixed_point.rounding", "\"half-up\", \"half-even\", \"truncate\"")]
    [InlineData("\n[noise.source.x]\n", "noise.source[0].x", "")]
    public void Words_in_later_sections_are_checked_too(string appended, string key, string messagePart)
    {
        var toml = Minimal + appended;
        var result = Load(toml);
        var code = key.EndsWith(".x", StringComparison.Ordinal) ? "CG1001" : "CG1005";
        var d = AssertOnly(result, code, key, LineOf(toml, appended.Trim().Split('\n')[^1]));
        Assert.Contains(messagePart, d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Both_keys_of_a_pair_is_an_error_at_the_second()
    {
        var toml = With("pixel_samples = 400", "pixel_samples = 400\npixel_ns = 20000");
        AssertOnly(Load(toml), "CG1006", "timing.pixel_ns", LineOf(toml, "pixel_ns"));
    }

    [Fact]
    public void Neither_key_of_a_pair_is_an_error_at_the_section()
    {
        var toml = With("transfer_sample = 200\n", "");
        AssertOnly(Load(toml), "CG1006", "timing.transfer_sample", LineOf(toml, "[timing]"));
    }

    [Fact]
    public void Duplicate_source_name_is_reported_at_the_second_name()
    {
        var toml = Minimal + "\n[[noise.source]]\nname = \"amplifier\"\nwhite_nv_per_rthz = 1\n";
        var lines = toml.Split('\n');
        var second = Array.FindLastIndex(lines, l => l.Contains("name = \"amplifier\"", StringComparison.Ordinal)) + 1;
        AssertOnly(Load(toml), "CG1007", "noise.source[1].name", second);
    }

    [Theory]
    [InlineData("9ch")]
    [InlineData("spec-ch0")]
    [InlineData("")]
    [InlineData("_x")]
    public void Name_that_is_not_an_identifier_is_refused(string name)
    {
        var toml = With("name = \"spec_ch0\"", $"name = \"{name}\"");
        var d = AssertOnly(Load(toml), "CG1008", "name", 1);
        Assert.Equal(8, d.Location.Column);
    }

    [Fact]
    public void Crlf_line_ends_and_a_bom_do_not_move_lines()
    {
        var toml = With("bits = 16", "bits = 16.0").Replace("\n", "\r\n", StringComparison.Ordinal);
        var bytes = Encoding.UTF8.GetPreamble().Concat(Encoding.UTF8.GetBytes(toml)).ToArray();
        var result = ReadoutLoader.Load(bytes, SourcePath, _ => null);
        AssertOnly(result, "CG1003", "adc.bits", LineOf(toml, "bits = 16.0"));
    }
}
