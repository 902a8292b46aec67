namespace CoefGen.Core.Tests.Cycle;

/// <summary>Readout files with a general cycle, one per kind (invented scenarios), to break in one place per test.</summary>
internal static class CycleFiles
{
    internal const string Head = """
        name = "cyc"

        [adc]
        rate_hz = "10 MHz"
        bits = 16
        full_scale_v = 2.0
        noise_lsb = 0.5

        [sensor]
        conversion_gain_uv_per_e = 5.0
        gain = 1.0

        """;

    private const string WhiteNoise = """

        [noise]
        bandwidth_hz = "5 MHz"

        [[noise.source]]
        name = "amplifier"
        white_nv_per_rthz = 20.0

        """;

    /// <summary>Repeated non-destructive reads: pedestal 10..25, transfer at 30, signal 30..45, eight reads every 50 samples, each read after its own reset.</summary>
    public const string RepeatedReads = Head + """
        [timing]
        pixel_samples = 400

        [[timing.window]]
        name = "pedestal"
        start = 10
        count = 16
        sees = "reset"

        [[timing.window]]
        name = "signal"
        start = 30
        count = 16
        sees = "charge"
        transfer_sample = 30

        [timing.repeat]
        group = 0
        times = 8
        every = 50
        new_group = true
        """ + WhiteNoise;

    /// <summary>Fowler-4 on an integrating pixel: four reads after the reset, four at the end.</summary>
    public const string Fowler = Head + """
        [timing]
        pixel_samples = 1000

        [[timing.window]]
        name = "early"
        start = 10
        count = 4
        sees = "ramp"

        [[timing.window]]
        name = "late"
        start = 900
        count = 4
        sees = "ramp"

        [integration]
        start_sample = 10
        reference_samples = 890
        photon_flux_e_per_s = 0
        """ + WhiteNoise;

    /// <summary>Up the ramp: one sample every 20, 40 reads, integrating from sample 0.</summary>
    public const string Ramp = Head + """
        [timing]
        pixel_samples = 820

        [[timing.window]]
        name = "read"
        start = 10
        count = 1
        sees = "ramp"

        [timing.repeat]
        times = 40
        every = 20
        new_group = false

        [integration]
        start_sample = 0
        reference_samples = 20
        photon_flux_e_per_s = "2 M"
        dark_current_e_per_s = 1000
        levels_e_per_s = [0, 1e5, 1e7]
        """ + WhiteNoise;
}
