using static CoefGen.Core.Tests.Readout.ReadoutFixture;

namespace CoefGen.Core.Tests.Readout;

/// <summary>
/// Out-of-range numbers are located CG1xxx errors naming the key, the value and what is allowed; the loader never
/// throws and nothing reaches a library check. Each case replaces one line of the minimal file (the new text's
/// first line is where the error must point).
/// </summary>
public class BadNumberTests
{
    public static TheoryData<string, string, string, string> Cases() => new()
    {
        { "rate_hz = \"20 MHz\"", "rate_hz = 1e308", "CG1004", "adc.rate_hz" },
        { "rate_hz = \"20 MHz\"", "rate_hz = 1e-300", "CG1004", "adc.rate_hz" },
        { "rate_hz = \"20 MHz\"", "rate_hz = 0", "CG1004", "adc.rate_hz" },
        { "rate_hz = \"20 MHz\"", "rate_hz = \"1e300 MHz\"", "CG1004", "adc.rate_hz" },
        { "rate_hz = \"20 MHz\"", "rate_hz = inf", "CG1004", "adc.rate_hz" },
        { "full_scale_v = 2.0", "full_scale_v = 1e308", "CG1004", "adc.full_scale_v" },
        { "full_scale_v = 2.0", "full_scale_v = 1e-300", "CG1004", "adc.full_scale_v" },
        { "full_scale_v = 2.0", "full_scale_v = -1.0", "CG1004", "adc.full_scale_v" },
        { "full_scale_v = 2.0", "full_scale_v = nan", "CG1004", "adc.full_scale_v" },
        { "full_scale_v = 2.0", "full_scale_v = 2.0\nnoise_lsb = 1e308", "CG1004", "adc.noise_lsb" },
        { "full_scale_v = 2.0", "full_scale_v = 2.0\nnoise_lsb = -0.5", "CG1004", "adc.noise_lsb" },
        { "conversion_gain_uv_per_e = 4.0", "conversion_gain_uv_per_e = 1e-308", "CG1004", "sensor.conversion_gain_uv_per_e" },
        { "conversion_gain_uv_per_e = 4.0", "conversion_gain_uv_per_e = 1e308", "CG1004", "sensor.conversion_gain_uv_per_e" },
        { "gain = 2.0", "gain = 1e308", "CG1004", "sensor.gain" },
        { "gain = 2.0", "gain = 1e-300", "CG1004", "sensor.gain" },
        { "gain = 2.0", "gain = 0", "CG1004", "sensor.gain" },
        { "gain = 2.0", "gain = -2.0", "CG1004", "sensor.gain" },
        { "gain = 2.0", "gain = \"-3 V/V\"", "CG1004", "sensor.gain" },
        { "front_end_pole_hz = \"2 MHz\"", "front_end_pole_hz = 1e308", "CG1004", "noise.front_end_pole_hz" },
        { "front_end_pole_hz = \"2 MHz\"", "front_end_pole_hz = 1e-300", "CG1004", "noise.front_end_pole_hz" },
        { "front_end_pole_hz = \"2 MHz\"", "front_end_pole_hz = \"2 MHz\"\nbandwidth_hz = 1e308", "CG1004", "noise.bandwidth_hz" },
        { "front_end_pole_hz = \"2 MHz\"", "front_end_pole_hz = \"2 MHz\"\nbandwidth_hz = 0.05", "CG1310", "noise.bandwidth_hz" },
        { "front_end_pole_hz = \"2 MHz\"", "front_end_pole_hz = \"2 MHz\"\nbandwidth_hz = 0.1", "CG1310", "noise.bandwidth_hz" },
        { "white_nv_per_rthz = 6.0", "white_nv_per_rthz = 1e308", "CG1004", "noise.source[0].white_nv_per_rthz" },
        { "white_nv_per_rthz = 6.0", "white_nv_per_rthz = -1.0", "CG1004", "noise.source[0].white_nv_per_rthz" },
        { "flicker_corner_hz = \"30 kHz\"", "flicker_corner_hz = 1e308", "CG1004", "noise.source[0].flicker_corner_hz" },
        { "low_cutoff_hz = 0.1", "low_cutoff_hz = 1e-300", "CG1004", "noise.source[0].low_cutoff_hz" },
        { "low_cutoff_hz = 0.1", "low_cutoff_hz = 1e308", "CG1004", "noise.source[0].low_cutoff_hz" },
        { "pixel_samples = 400", "pixel_ns = 1e308", "CG1004", "timing.pixel_ns" },
        { "transfer_sample = 200", "transfer_sample = 1e308", "CG1004", "timing.transfer_sample" },
        { "transfer_sample = 200", "transfer_ns = 1e300", "CG1004", "timing.transfer_ns" },
        { "[noise]", "[fixed_point]\nacc_bits = 65\n\n[noise]", "CG1004", "fixed_point.acc_bits" },
        { "[noise]", "[fixed_point]\noutput_bits = 65\n\n[noise]", "CG1004", "fixed_point.output_bits" },
        { "[noise]", "[fixed_point]\noutput_bits = 1\n\n[noise]", "CG1004", "fixed_point.output_bits" },
        { "[noise]", "[weights]\nwindow = \"explicit\"\nreset = [1e308, 1.0]\nsignal = [1.0]\n\n[noise]", "CG1004", "weights.reset[0]" },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Out_of_range_number_is_a_located_error_naming_key_value_and_the_allowed_range(string oldText, string newText, string code, string key)
    {
        var toml = With(oldText, newText);
        var result = Load(toml);
        Assert.Null(result.Description);
        var name = key.Split('.')[^1].Split('[')[0];
        var line = LineOf(toml, name + " = ");
        var d = AssertError(result, code, key, line);
        Assert.True(d.Message.Contains("allowed", StringComparison.Ordinal) || d.Message.Contains("expected", StringComparison.Ordinal), d.Message);
        Assert.True(d.Location.Column > 0, d.ToString());
    }

    [Fact]
    public void Table_rows_beyond_the_physical_range_are_located_in_the_csv()
    {
        var toml = With("front_end_pole_hz = \"2 MHz\"", "front_end_pole_hz = \"2 MHz\"\npsd_table = \"s.csv\"");
        var result = Load(toml, new Dictionary<string, string> { ["s.csv"] = "10, 5\n100, 1e308\n1e300, 4\n" });
        Assert.Null(result.Description);
        Assert.Equal([2, 3], result.Diagnostics.Where(d => d.Code == "CG1004").Select(d => d.Location.Line));
    }

    [Fact]
    public void Sixty_four_bit_accumulator_and_output_are_accepted()
    {
        var toml = Minimal + "\n[fixed_point]\ntarget = \"mcu32-acc64\"\nacc_bits = 64\noutput_bits = 64\n";
        var result = Load(toml);
        Assert.True(result.Succeeded, string.Join("\n", result.Diagnostics));
        Assert.Equal(64, result.Description!.FixedPoint.AccBits);
        Assert.Equal(64, result.Description.FixedPoint.OutputBits);
    }
}
