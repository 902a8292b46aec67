using CoefGen.Core.Formatting;

namespace CoefGen.Core.Tests.Formatting;

/// <summary>The one formatter for people: expectations written by hand (common practice, no source).</summary>
public class HumanTests
{
    [Theory]
    [InlineData(2e7, "Hz", "20 MHz")] // the issue's "2E+07 Hz"
    [InlineData(5e-6, "s", "5 us")] // "5E-06 s"
    [InlineData(9.15466e-6, "V", "9.155 uV")] // "9.15466E-06 V rms"
    [InlineData(4e7, "Hz", "40 MHz")] // a sweep axis value "4E+07"
    [InlineData(1.51e6, "Hz", "1.51 MHz")]
    [InlineData(999.96, "Hz", "1 kHz")] // rounding carries into the next prefix
    [InlineData(-2.5e-3, "V", "-2.5 mV")]
    [InlineData(0, "Hz", "0 Hz")]
    [InlineData(3.2e-19, "V", "3.2 x 10^-19 V")] // beyond the prefixes: a power of ten, not E-notation
    public void SiShort_uses_prefixes_and_four_figures(double value, string unit, string expected) => Assert.Equal(expected, Human.SiShort(value, unit));

    [Fact]
    public void Si_keeps_trailing_zeros_for_columns_and_percent_uses_figures()
    {
        Assert.Equal("20.00 MHz", Human.Si(2e7, "Hz"));
        Assert.Equal("1.000 kHz", Human.Si(999.96, "Hz"));
        Assert.Equal("4.302 x 10^-10 %", Human.Percent(4.30167e-12)); // the issue's "4.30167E-10 %"
        Assert.Equal("12.35 %", Human.Percent(0.1234567));
        Assert.Equal("100 %", Human.Percent(1));
        Assert.Equal("0.9194", Human.NumShort(0.9194373109119643)); // the 17-digit header comment
        Assert.Equal("0.9194 e- rms", Human.With(0.9194373109119643, "e- rms"));
        Assert.Equal("12350000", Human.NumShort(12345678));
        Assert.Equal("1.5 x 10^9", Human.NumShort(1.5e9));
        Assert.Equal("0.0001234", Human.NumShort(1.234e-4));
        Assert.Equal("1.234 x 10^-5", Human.NumShort(1.234e-5));
        Assert.Equal("1.000", Human.Num(1));
    }

    [Fact]
    public void No_value_from_1e_minus_30_to_1e30_is_printed_in_e_notation()
    {
        for (var e = -30.0; e <= 30; e += 0.37)
        {
            foreach (var text in new[] { Human.NumShort(Math.Pow(10, e)), Human.SiShort(-Math.Pow(10, e), "V"), Human.Percent(Math.Pow(10, e)), Human.Si(Math.Pow(10, e), "Hz") })
            {
                Assert.DoesNotContain("E", text, StringComparison.Ordinal);
                Assert.Matches(@"^-?\d+(\.\d+)?( x 10\^-?\d+)?( \S+)?$", text);
            }
        }
    }
}
