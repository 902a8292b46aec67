using System.Text;
using CoefGen.Core.Readout;

namespace CoefGen.Benchmarks;

/// <summary>
/// A 2 x 4096 readout for the end-to-end benchmark: 100 MS/s, 40.96 us reset and signal windows, white + 1/f noise
/// through a front-end pole, optimal weights, 32-bit MCU target (65536 coefficients allowed, 8192 used).
/// </summary>
public static class LargeDesignReadout
{
    public const string Name = "2x4096";

    public const string Toml = """
        name = "wide_2x4096"

        [adc]
        rate_hz = "100 MHz"
        bits = 16
        full_scale_v = 2.0
        coding = "twos-complement"
        noise_lsb = 0.5

        [sensor]
        conversion_gain_uv_per_e = 5.0
        gain = 2.0

        [timing]
        pixel_samples = 8400
        transfer_sample = 4200
        step = "pole"

        [timing.reset]
        start = 40
        count = 4096

        [timing.signal]
        start = 4260
        count = 4096

        [noise]
        front_end_pole_hz = "5 MHz"

        [[noise.source]]
        name = "output amplifier"
        at = "sensor"
        white_nv_per_rthz = 6.0
        flicker_corner_hz = "100 kHz"
        low_cutoff_hz = 1.0

        [weights]
        scheme = "optimal"
        reject_drift = false

        [fixed_point]
        target = "mcu32-acc64"
        """;

    public static ReadoutDescription Load() =>
        RepoFiles.Load(Encoding.UTF8.GetBytes(Toml), Name + ".toml", _ => null);
}
