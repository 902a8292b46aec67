using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Tests.Readout;

public class ValidReadoutFileTests
{
    private const string Full = """
        # every feature of the readout file
        name = "spec_ch0"

        [adc]
        rate_hz = "20 MHz"
        bits = 14
        full_scale_v = "2 V"
        coding = "offset-binary"
        noise_lsb = 0.5

        [sensor]
        conversion_gain_uv_per_e = "4 uV/e"
        gain = 2.0

        [timing]
        pixel_ns = "2 us"
        transfer_ns = 510
        step = "pole"
        reset = { start_ns = 260, count_ns = "0.2 us" }

        [timing.signal]
        start = 12
        count = 4

        [noise]
        front_end_pole_hz = "2 MHz"
        bandwidth_hz = 10e6
        psd_table = "spectrum.csv"
        psd_at = "sensor"
        capture = "idle.csv"

        [[noise.source]]
        name = "amplifier"
        at = "sensor"
        white_nv_per_rthz = "6 nV/rtHz"
        flicker_corner_hz = "30 kHz"
        low_cutoff_hz = 0.1

        [[noise.source]]
        name = "adc_driver"
        at = "adc"
        white_nv_per_rthz = 3

        [weights]
        scheme = "weighted"
        window = "explicit"
        ramp_samples = 2
        reset = [1, 2.0, 2, 1]
        signal = [0.5, 1, 1, 0.5]
        reject_drift = true

        [fixed_point]
        target = "dsp18x27-acc48"
        coef_bits = 18
        sample_bits = 16
        acc_bits = 48
        output_bits = 24
        output_frac_bits = 4
        normalize = "shift"
        rounding = "half-even"
        accumulator = "saturate"

        [[emit]]
        template = "c-header"
        path = "spec_ch0_coefs.h"

        [[emit]]
        template = "templates/custom.scriban"
        path = "out/custom.txt"
        """;

    private const string Spectrum = """
        frequency_hz, density_nv_per_rthz
        # measured at the sensor output

        0, 10
        1000, 8.5
        1e6, 2
        """;

    private static LoadResult LoadFull() =>
        ReadoutFixture.Load(Full, new Dictionary<string, string> { ["spectrum.csv"] = Spectrum });

    [Fact]
    public void Full_file_loads_without_diagnostics()
    {
        var result = LoadFull();
        Assert.Empty(result.Diagnostics);
        Assert.NotNull(result.Description);
    }

    [Fact]
    public void Adc_and_sensor_values_are_converted_to_base_units()
    {
        var d = LoadFull().Description!;
        Assert.Equal(new AdcSpec(20e6, 14, 2.0, AdcCoding.OffsetBinary, 0.5), d.Adc);
        Assert.Equal(new SensorSpec(4.0, 2.0), d.Sensor);
        Assert.Equal("spec_ch0", d.Name);
        Assert.Equal(ReadoutFixture.SourcePath, d.SourcePath);
    }

    [Fact]
    public void Timing_in_nanoseconds_and_samples_resolves_at_the_adc_clock()
    {
        var t = LoadFull().Description!.Timing;
        Assert.Equal(40, t.PixelSamples);
        Assert.Equal(new SampleWindow(5, 4), t.Cycle.AsTwoWindow()!.Reset);
        Assert.Equal(new SampleWindow(12, 4), t.Cycle.AsTwoWindow()!.Signal);
        Assert.Equal(StepModel.Pole, t.Step);
        Assert.Equal(510 / 1e9, t.TransferTimeS);
    }

    [Fact]
    public void Noise_section_keeps_sources_table_and_limits()
    {
        var n = LoadFull().Description!.Noise;
        Assert.Equal(2e6, n.FrontEndPoleHz);
        Assert.Equal(10e6, n.BandwidthHz);
        Assert.Equal("idle.csv", n.CapturePath);
        Assert.Equal(
            [new NoiseSourceSpec("amplifier", NoiseReference.Sensor, 6, 30e3, 0.1), new NoiseSourceSpec("adc_driver", NoiseReference.Adc, 3, 0, 0.01)],
            n.Sources);
    }

    [Fact]
    public void Sensor_referred_table_is_scaled_by_the_gain_magnitude_and_squared()
    {
        var table = LoadFull().Description!.Noise.Table!;
        Assert.Equal("spectrum.csv", table.Name);
        Assert.Equal([0.0, 1000.0, 1e6], table.FrequencyHz);

        // (nV * 1e-9 * |gain|)^2 with |gain| = 2, as the readout format defines it.
        double[] expected = [Math.Pow(10e-9 * 2, 2), Math.Pow(8.5e-9 * 2, 2), Math.Pow(2e-9 * 2, 2)];
        Assert.Equal(expected, table.DensityV2PerHz);
    }

    [Fact]
    public void Weights_fixed_point_and_emit_are_stored_as_written()
    {
        var d = LoadFull().Description!;
        Assert.Equal(WeightScheme.Weighted, d.Weights.Scheme);
        Assert.Equal(WindowShape.Explicit, d.Weights.Window);
        Assert.Equal(2, d.Weights.RampSamples);
        Assert.Equal([1.0, 2, 2, 1], d.Weights.ExplicitReset!);
        Assert.Equal([0.5, 1, 1, 0.5], d.Weights.ExplicitSignal!);
        Assert.True(d.Weights.RejectDrift);
        Assert.Equal(new FixedPointSpec("dsp18x27-acc48", 18, 16, 48, 24, 4, "shift", "half-even", "saturate"), d.FixedPoint);
        Assert.Equal([new EmitSpec("c-header", "spec_ch0_coefs.h"), new EmitSpec("templates/custom.scriban", "out/custom.txt")], d.Emit);
    }

    [Fact]
    public void Content_hash_is_the_lower_case_sha256_of_the_bytes()
    {
        var d = LoadFull().Description!;
        var expected = Convert.ToHexStringLower(System.Security.Cryptography.SHA256.HashData(System.Text.Encoding.UTF8.GetBytes(Full)));
        Assert.Equal(expected, d.ContentSha256);
        Assert.Equal(64, d.ContentSha256.Length);
        Assert.Equal(d.ContentSha256.ToLowerInvariant(), d.ContentSha256);
    }

    [Fact]
    public void Key_locations_point_at_the_written_keys()
    {
        var d = LoadFull().Description!;
        Assert.Equal(new SourceLocation(ReadoutFixture.SourcePath, ReadoutFixture.LineOf(Full, "coef_bits"), 1), d.LocationOf("fixed_point.coef_bits"));
        Assert.Equal(ReadoutFixture.LineOf(Full, "reset = { start_ns"), d.LocationOf("timing.reset.count_ns").Line);
        Assert.Equal(ReadoutFixture.LineOf(Full, "name = \"adc_driver\""), d.LocationOf("noise.source[1].name").Line);
        Assert.Equal(0, d.LocationOf("adc.not_written").Line);
    }

    [Fact]
    public void Minimal_file_takes_the_documented_defaults()
    {
        var result = ReadoutFixture.Load(ReadoutFixture.Minimal);
        Assert.Empty(result.Diagnostics);
        var d = result.Description!;
        Assert.Equal(AdcCoding.TwosComplement, d.Adc.Coding);
        Assert.Equal(0, d.Adc.NoiseLsb);
        Assert.Equal(StepModel.Pole, d.Timing.Step); // a pole is given
        Assert.Empty(d.Timing.Rounding);
        Assert.Equal(200 / 20e6, d.Timing.TransferTimeS);
        Assert.Equal(new WeightsSpec(WeightScheme.Optimal, WindowShape.Trapezoid, 0, null, null, false), d.Weights);
        Assert.Equal(new FixedPointSpec(null, null, null, null, null, null, null, null, null), d.FixedPoint);
        Assert.Empty(d.Emit);
        Assert.Null(d.Noise.Table);
        Assert.Null(d.Noise.BandwidthHz);
    }

    [Fact]
    public void Step_defaults_to_ideal_without_a_pole()
    {
        var toml = ReadoutFixture.With("front_end_pole_hz = \"2 MHz\"", "bandwidth_hz = \"10 MHz\"");
        var d = ReadoutFixture.Load(toml).Description!;
        Assert.Equal(StepModel.Ideal, d.Timing.Step);
    }

    [Fact]
    public void Integer_value_is_accepted_for_a_float_key()
    {
        var d = ReadoutFixture.Load(ReadoutFixture.With("rate_hz = \"20 MHz\"", "rate_hz = 20000000")).Description!;
        Assert.Equal(20e6, d.Adc.RateHz);
    }
}
