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
        var conversionGain = sensor.Quantity("conversion_gain_uv_per_e", required: true, NumberRule.Positive);
        gain = sensor.Has("gain") ? sensor.Quantity("gain", required: false, NumberRule.NonZero) : 1.0;
        return conversionGain is null || gain is null ? null : new SensorSpec(conversionGain.Value, gain.Value);
    }
}
