using System.Globalization;
using System.Text.RegularExpressions;

namespace CoefGen.Core.Readout;

/// <summary>
/// The noise keys a scenario may override (the same dotted paths `sweep --vary` rewrites) and how an
/// override changes a <see cref="NoiseSpec"/>.
/// </summary>
public static partial class NoiseOverrides
{
    /// <summary>The per-source keys that may be overridden, with whether zero is allowed.</summary>
    public static readonly IReadOnlyList<(string Key, bool ZeroAllowed)> SourceKeys =
        [("white_nv_per_rthz", true), ("flicker_corner_hz", true), ("low_cutoff_hz", false)];

    /// <summary>The [noise] keys that may be overridden (always positive).</summary>
    public static readonly IReadOnlyList<string> NoiseKeys = ["front_end_pole_hz", "bandwidth_hz"];

    [GeneratedRegex(@"^noise\.source\[(\d{1,6})\]\.([a-z_]+)$", RegexOptions.CultureInvariant)]
    private static partial Regex SourceKey();

    /// <summary>Every overridable key for a file with <paramref name="sourceCount"/> noise sources (for did-you-mean).</summary>
    public static IReadOnlyList<string> AllowedKeys(int sourceCount)
    {
        var keys = NoiseKeys.Select(k => "noise." + k).ToList();
        for (var i = 0; i < sourceCount; i++)
        {
            keys.AddRange(SourceKeys.Select(k => $"noise.source[{i.ToString(CultureInfo.InvariantCulture)}].{k.Key}"));
        }

        return keys;
    }

    /// <summary>Whether the key may be overridden and whether 0 is an allowed value; null when it is not an overridable key.</summary>
    public static bool? ZeroAllowed(string key, int sourceCount)
    {
        ArgumentNullException.ThrowIfNull(key);
        if (key.StartsWith("noise.", StringComparison.Ordinal) && NoiseKeys.Contains(key["noise.".Length..]))
        {
            return false;
        }

        var m = SourceKey().Match(key);
        if (!m.Success || int.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture) >= sourceCount)
        {
            return null;
        }

        var found = SourceKeys.Where(k => k.Key == m.Groups[2].Value).ToList();
        return found.Count == 0 ? null : found[0].ZeroAllowed;
    }

    /// <summary>The value a noise description gives an overridable key (null when it is not written, e.g. no pole).</summary>
    public static double? ValueOf(NoiseSpec noise, string key)
    {
        ArgumentNullException.ThrowIfNull(noise);
        ArgumentNullException.ThrowIfNull(key);
        if (key == "noise.front_end_pole_hz")
        {
            return noise.FrontEndPoleHz;
        }

        if (key == "noise.bandwidth_hz")
        {
            return noise.BandwidthHz;
        }

        var m = SourceKey().Match(key);
        var index = m.Success ? int.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture) : -1;
        if (index < 0 || index >= noise.Sources.Count)
        {
            return null;
        }

        var s = noise.Sources[index];
        return m.Groups[2].Value switch
        {
            "white_nv_per_rthz" => s.WhiteNvPerRtHz,
            "flicker_corner_hz" => s.FlickerCornerHz,
            "low_cutoff_hz" => s.LowCutoffHz,
            _ => null,
        };
    }

    /// <summary>The nominal noise with the overrides applied in order (keys must be valid: see <see cref="ZeroAllowed"/>).</summary>
    public static NoiseSpec Apply(NoiseSpec nominal, IEnumerable<NoiseOverride> overrides)
    {
        ArgumentNullException.ThrowIfNull(nominal);
        ArgumentNullException.ThrowIfNull(overrides);
        var noise = nominal;
        foreach (var o in overrides)
        {
            if (o.Key == "noise.front_end_pole_hz")
            {
                noise = noise with { FrontEndPoleHz = o.Value };
                continue;
            }

            if (o.Key == "noise.bandwidth_hz")
            {
                noise = noise with { BandwidthHz = o.Value };
                continue;
            }

            var m = SourceKey().Match(o.Key);
            var index = m.Success ? int.Parse(m.Groups[1].Value, CultureInfo.InvariantCulture) : -1;
            if (index < 0 || index >= noise.Sources.Count)
            {
                throw new ArgumentException($"'{o.Key}' is not an overridable noise key");
            }

            var s = noise.Sources[index];
            var changed = m.Groups[2].Value switch
            {
                "white_nv_per_rthz" => s with { WhiteNvPerRtHz = o.Value },
                "flicker_corner_hz" => s with { FlickerCornerHz = o.Value },
                "low_cutoff_hz" => s with { LowCutoffHz = o.Value },
                _ => throw new ArgumentException($"'{o.Key}' is not an overridable noise key"),
            };
            var sources = noise.Sources.ToArray();
            sources[index] = changed;
            noise = noise with { Sources = sources };
        }

        return noise;
    }
}
