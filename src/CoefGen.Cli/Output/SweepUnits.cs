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
}
