using CoefGen.Core.Study;

namespace CoefGen.Core.Tests.Study;

public class SweepAxisTests
{
    [Fact]
    public void A_linear_range_includes_its_stop_without_round_off()
    {
        var axis = SweepAxis.TryParse("adc.noise_lsb=0.1:0.5:0.1", out _)!;
        Assert.Equal([0.1, 0.2, 0.3, 0.4, 0.5], axis.Values);
    }

    [Fact]
    public void A_geometric_range_multiplies_by_its_factor_and_reads_si_prefixes()
    {
        var axis = SweepAxis.TryParse("noise.source[0].flicker_corner_hz=1k:1M:x10", out _)!;
        Assert.Equal("noise.source[0].flicker_corner_hz", axis.Key);
        Assert.Equal([1e3, 1e4, 1e5, 1e6], axis.Values);
    }

    [Fact]
    public void A_list_keeps_its_order()
    {
        Assert.Equal([20e6, 10e6, 40e6], SweepAxis.TryParse("adc.rate_hz=20M,10M,40M", out _)!.Values);
    }

    [Theory]
    [InlineData("adc.rate_hz")]
    [InlineData("adc.rate_hz=5:1:1")]
    [InlineData("adc.rate_hz=1:5:x1")]
    [InlineData("adc.rate_hz=a,b")]
    public void A_malformed_spec_is_an_error_message(string spec)
    {
        Assert.Null(SweepAxis.TryParse(spec, out var error));
        Assert.False(string.IsNullOrEmpty(error));
    }
}
