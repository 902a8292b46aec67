using CoefGen.Core.Readout.Loading;

namespace CoefGen.Core.Tests.Readout;

public class SiQuantityTests
{
    [Theory]
    [InlineData("40 MHz", "rate_hz", 40e6)]
    [InlineData("40M", "rate_hz", 40e6)]
    [InlineData("40e6", "rate_hz", 40e6)]
    [InlineData("1.5 kHz", "low_cutoff_hz", 1500)]
    [InlineData("100 mHz", "low_cutoff_hz", 0.1)]
    [InlineData("40 Hz", "rate_hz", 40)]
    [InlineData("2.5 us", "transfer_ns", 2500)]
    [InlineData("2.5u", "transfer_ns", 2500)]
    [InlineData("2500", "transfer_ns", 2500)]
    [InlineData("0.5 s", "pixel_ns", 5e8)]
    [InlineData("4 uV/e", "conversion_gain_uv_per_e", 4)]
    [InlineData("6 nV/rtHz", "white_nv_per_rthz", 6)]
    [InlineData("2 V", "full_scale_v", 2)]
    [InlineData("500 mV", "full_scale_v", 0.5)]
    [InlineData("0.25 LSB", "noise_lsb", 0.25)]
    [InlineData("-2 V/V", "gain", -2)]
    [InlineData(" 7 ", "gain", 7)]
    public void Si_string_converts_to_the_unit_of_the_key(string text, string key, double expected)
    {
        Assert.True(SiQuantity.TryParse(text, KeyUnit.ForKey(key), out var value, out var error), error);
        Assert.Equal(expected, value, 12);
    }

    [Theory]
    [InlineData("40 ms", "rate_hz")]
    [InlineData("40 mhz", "rate_hz")]
    [InlineData("fast", "rate_hz")]
    [InlineData("40 V", "rate_hz")]
    [InlineData("2.5 uHz", "transfer_ns")]
    [InlineData("1 2", "gain")]
    [InlineData("inf", "rate_hz")]
    [InlineData("", "rate_hz")]
    public void Si_string_with_a_wrong_unit_or_no_number_is_refused(string text, string key)
    {
        Assert.False(SiQuantity.TryParse(text, KeyUnit.ForKey(key), out _, out var error));
        Assert.NotEmpty(error);
    }

    [Fact]
    public void Lower_case_unit_gets_a_case_hint()
    {
        Assert.False(SiQuantity.TryParse("40 mhz", KeyUnit.ForKey("rate_hz"), out _, out var error));
        Assert.Contains("case-sensitive", error, StringComparison.Ordinal);
    }

    [Fact]
    public void Unit_that_does_not_match_the_key_is_a_type_error_in_the_file()
    {
        var toml = ReadoutFixture.With("rate_hz = \"20 MHz\"", "rate_hz = \"40 ms\"");
        var d = ReadoutFixture.AssertOnly(ReadoutFixture.Load(toml), "CG1003", "adc.rate_hz", ReadoutFixture.LineOf(toml, "rate_hz"));
        Assert.Equal(11, d.Location.Column); // the value, after 'rate_hz = '
    }

    [Fact]
    public void Did_you_mean_finds_the_nearest_key_within_a_third_of_its_length()
    {
        string[] keys = ["rate_hz", "bits", "full_scale_v", "coding", "noise_lsb"];
        Assert.Equal("rate_hz", DidYouMean.Suggest("rate_hzz", keys));
        Assert.Equal("rate_hz", DidYouMean.Suggest("rtae_hz", keys)); // neighbour swap is one edit
        Assert.Equal("bits", DidYouMean.Suggest("bit", keys));
        Assert.Null(DidYouMean.Suggest("sample_rate", keys));
        Assert.Equal(3, DidYouMean.Distance("kitten", "sitting")); // textbook example, common knowledge
    }
}
