namespace CoefGen.Core.Readout.Loading;

/// <summary>
/// The unit a key carries in its name: the symbol a value string may spell (with an SI prefix) and the
/// power of ten of the key's own unit, e.g. "_ns" is seconds at 10^-9, "_uv_per_e" is V/e at 10^-6.
/// </summary>
/// <param name="Symbols">Accepted spellings of the unit, the first is the canonical one ("" = dimensionless).</param>
/// <param name="Exponent">Power of ten of the key's unit relative to the unprefixed symbol.</param>
internal sealed record KeyUnit(IReadOnlyList<string> Symbols, int Exponent)
{
    public static readonly KeyUnit Dimensionless = new([""], 0);

    public string Canonical => Symbols[0];

    /// <summary>The unit named by a key's suffix; dimensionless when the name has no unit.</summary>
    public static KeyUnit ForKey(string key)
    {
        ArgumentNullException.ThrowIfNull(key);
        if (key.EndsWith("_hz", StringComparison.Ordinal))
        {
            return new(["Hz"], 0);
        }

        if (key.EndsWith("_ns", StringComparison.Ordinal))
        {
            return new(["s"], -9);
        }

        if (key.EndsWith("_nv_per_rthz", StringComparison.Ordinal))
        {
            return new(["V/rtHz", "V/sqrt(Hz)", "V/\u221AHz"], -9);
        }

        if (key.EndsWith("_uv_per_e", StringComparison.Ordinal))
        {
            return new(["V/e"], -6);
        }

        if (key.EndsWith("_v", StringComparison.Ordinal))
        {
            return new(["V"], 0);
        }

        if (key.EndsWith("_lsb", StringComparison.Ordinal))
        {
            return new(["LSB"], 0);
        }

        return key == "gain" ? new(["", "V/V"], 0) : Dimensionless;
    }
}
