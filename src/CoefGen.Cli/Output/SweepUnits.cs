namespace CoefGen.Cli.Output;

/// <summary>The unit of a readout key for axis labels, from its name (the loader names units in keys).</summary>
internal static class SweepUnits
{
    public static string Label(string key)
    {
        var leaf = key[(key.LastIndexOf('.') + 1)..];
        var unit = leaf switch
        {
            _ when leaf.EndsWith("_hz", StringComparison.Ordinal) => "Hz",
            _ when leaf.EndsWith("_ns", StringComparison.Ordinal) => "ns",
            _ when leaf.EndsWith("_nv_per_rthz", StringComparison.Ordinal) => "nV/sqrt(Hz)",
            _ when leaf.EndsWith("_uv_per_e", StringComparison.Ordinal) => "uV/e-",
            _ when leaf.EndsWith("_lsb", StringComparison.Ordinal) => "LSB",
            _ when leaf.EndsWith("_v", StringComparison.Ordinal) => "V",
            "count" or "start" or "pixel_samples" or "transfer_sample" or "ramp_samples" => "samples",
            _ when leaf.EndsWith("bits", StringComparison.Ordinal) => "bits",
            _ => "",
        };
        return unit.Length == 0 ? key : $"{key} ({unit})";
    }

    /// <summary>An axis value for people: "40 MHz" for a _hz key, "3.8 us" for a _ns key, whole numbers exact, else 4 figures.</summary>
    public static string Format(string key, double value)
    {
        var leaf = key[(key.LastIndexOf('.') + 1)..];
        return leaf switch
        {
            _ when leaf.EndsWith("_hz", StringComparison.Ordinal) => Eng.SiShort(value, "Hz"),
            _ when leaf.EndsWith("_ns", StringComparison.Ordinal) => Eng.SiShort(value * 1e-9, "s"),
            _ when leaf.EndsWith("_v", StringComparison.Ordinal) => Eng.SiShort(value, "V"),
            _ when value == Math.Round(value) && Math.Abs(value) < 1e15 => Eng.Int((long)value),
            _ => Eng.NumShort(value),
        };
    }

    /// <summary>The unit chart ticks carry for a key ("Hz" gives ticks "40 MHz"), or null for plain numbers.</summary>
    public static string? TickUnit(string key)
    {
        var leaf = key[(key.LastIndexOf('.') + 1)..];
        return leaf.EndsWith("_hz", StringComparison.Ordinal) ? "Hz" : leaf.EndsWith("_v", StringComparison.Ordinal) ? "V" : null;
    }
}
