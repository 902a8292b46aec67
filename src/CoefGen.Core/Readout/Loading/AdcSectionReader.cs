namespace CoefGen.Core.Readout.Loading;

/// <summary>Reads [adc].</summary>
internal static class AdcSectionReader
{
    private static readonly (string, AdcCoding)[] Codings =
    [
        ("twos-complement", AdcCoding.TwosComplement),
        ("offset-binary", AdcCoding.OffsetBinary),
    ];

    /// <summary>The ADC, or null when the section is missing or invalid. <paramref name="rateHz"/> is set whenever the rate itself is usable.</summary>
    public static AdcSpec? Read(TableReader root, out double? rateHz)
    {
        rateHz = null;
        var adc = root.Section("adc", required: true);
        if (adc is null)
        {
            return null;
        }

        adc.RejectUnknown("rate_hz", "bits", "full_scale_v", "coding", "noise_lsb");
        rateHz = adc.Quantity("rate_hz", required: true, PhysicalRange.RateHz);
        var bits = adc.Integer("bits", required: true, 2, 32);
        var fullScale = adc.Quantity("full_scale_v", required: true, PhysicalRange.FullScaleV);
        var coding = adc.Choice("coding", Codings);
        var noise = adc.Has("noise_lsb") ? adc.Quantity("noise_lsb", required: false, PhysicalRange.NoiseLsb) : 0.0;
        var codingOk = !adc.Has("coding") || coding is not null;
        if (rateHz is null || bits is null || fullScale is null || noise is null || !codingOk)
        {
            return null;
        }

        return new AdcSpec(rateHz.Value, (int)bits.Value, fullScale.Value, coding ?? AdcCoding.TwosComplement, noise.Value);
    }
}
