namespace CoefGen.Core.Readout.Loading;

/// <summary>Reads [sensor].</summary>
internal static class SensorSectionReader
{
    /// <summary>The sensor, or null; <paramref name="gain"/> is set whenever the gain itself is usable.</summary>
    public static SensorSpec? Read(TableReader root, out double? gain)
    {
        gain = null;
        var sensor = root.Section("sensor", required: true);
        if (sensor is null)
        {
            return null;
        }

        sensor.RejectUnknown("conversion_gain_uv_per_e", "gain");
        var conversionGain = sensor.Quantity("conversion_gain_uv_per_e", required: true, PhysicalRange.ConversionGainUvPerE);
        gain = sensor.Has("gain") ? ReadGain(sensor) : 1.0;
        return conversionGain is null || gain is null ? null : new SensorSpec(conversionGain.Value, gain.Value);
    }

    /// <summary>
    /// The gain must be positive: the weights are designed for a charge step that raises the ADC code, and an
    /// inverting chain would silently give outputs of the wrong sign. Refused with the remedy instead.
    /// </summary>
    private static double? ReadGain(TableReader sensor)
    {
        var value = sensor.Quantity("gain", required: false, NumberRule.Any);
        if (value is not double g || g > 0)
        {
            return value is null ? null : sensor.Quantity("gain", required: false, PhysicalRange.Gain);
        }

        sensor.Context.Error(ReadoutCodes.OutOfRange, sensor.Entry("gain")!.ValueLocation, sensor.KeyPath("gain"),
            $"'gain' = {ValueReader.Format(g)} is not allowed; expected {PhysicalRange.Gain.Allowed}: the weights are designed for a charge step that raises the ADC code, so for an inverting chain give the gain's magnitude and invert the codes (or the output's sign) downstream");
        return null;
    }
}
