using System.Text;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Tests.Readout;

/// <summary>A small valid readout file to break in one place per test, and helpers to load and locate.</summary>
internal static class ReadoutFixture
{
    public const string SourcePath = "cfg/spec.toml";

    /// <summary>Valid: reset 20..179, transfer at 200, signal 220..379, cycle 400 samples.</summary>
    public const string Minimal = """
        name = "spec_ch0"

        [adc]
        rate_hz = "20 MHz"
        bits = 16
        full_scale_v = 2.0

        [sensor]
        conversion_gain_uv_per_e = 4.0
        gain = 2.0

        [timing]
        pixel_samples = 400
        transfer_sample = 200

        [timing.reset]
        start = 20
        count = 160

        [timing.signal]
        start = 220
        count = 160

        [noise]
        front_end_pole_hz = "2 MHz"

        [[noise.source]]
        name = "amplifier"
        white_nv_per_rthz = 6.0
        flicker_corner_hz = "30 kHz"
        low_cutoff_hz = 0.1

        """;

    public static LoadResult Load(string toml, IReadOnlyDictionary<string, string>? files = null) =>
        ReadoutLoader.Load(Encoding.UTF8.GetBytes(toml), SourcePath,
            path => files is not null && files.TryGetValue(path, out var text) ? Encoding.UTF8.GetBytes(text) : null);

    /// <summary>The minimal file with one exact piece of text replaced (the text must occur once).</summary>
    public static string With(string oldText, string newText)
    {
        var index = Minimal.IndexOf(oldText, StringComparison.Ordinal);
        Assert.True(index >= 0, $"fixture does not contain '{oldText}'");
        Assert.Equal(index, Minimal.LastIndexOf(oldText, StringComparison.Ordinal));
        return Minimal[..index] + newText + Minimal[(index + oldText.Length)..];
    }

    /// <summary>1-based line of the first line that contains <paramref name="text"/>.</summary>
    public static int LineOf(string toml, string text)
    {
        var lines = toml.Split('\n');
        for (var i = 0; i < lines.Length; i++)
        {
            if (lines[i].Contains(text, StringComparison.Ordinal))
            {
                return i + 1;
            }
        }

        throw new InvalidOperationException($"'{text}' not in the file");
    }

    /// <summary>Asserts the load failed with exactly one diagnostic of the code, on the key and line given.</summary>
    public static Diagnostic AssertError(LoadResult result, string code, string key, int line)
    {
        Assert.Null(result.Description);
        var matching = result.Diagnostics.Where(d => d.Code == code).ToList();
        Assert.True(matching.Count == 1, $"expected one {code}, got: {string.Join(" | ", result.Diagnostics)}");
        var diagnostic = matching[0];
        Assert.Equal(Severity.Error, diagnostic.Severity);
        Assert.Equal(key, diagnostic.Key);
        Assert.Equal(line, diagnostic.Location.Line);
        return diagnostic;
    }

    /// <summary>Asserts the load failed and every diagnostic has the code (no collateral noise).</summary>
    public static Diagnostic AssertOnly(LoadResult result, string code, string key, int line)
    {
        var diagnostic = AssertError(result, code, key, line);
        Assert.True(result.Diagnostics.Count == 1, $"expected only {code}, got: {string.Join(" | ", result.Diagnostics)}");
        return diagnostic;
    }
}
