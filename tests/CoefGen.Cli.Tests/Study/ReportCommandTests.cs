using System.Globalization;
using System.Net;
using System.Security.Cryptography;
using System.Text.Json;
using System.Text.RegularExpressions;
using CoefGen.Cli.Tests.Emit;

namespace CoefGen.Cli.Tests.Study;

public partial class ReportCommandTests
{
    public static readonly TheoryData<string> Examples = ["fast_imaging.toml", "slowscan_spectro.toml", "ir_measured.toml", "capture_bench.toml", "slowscan_robust.toml", "cycles/cms_rows.toml", "cycles/up_the_ramp.toml"];

    [GeneratedRegex("<td(?: class=\"raw\")? data-json=\"([^\"]+)\"(?: data-value=\"([^\"]+)\")?>(.*?)</td>")]
    private static partial Regex KeyedCell();

    [GeneratedRegex(@"^-?\d+(\.\d+)?")]
    private static partial Regex LeadingNumber();

    // A digit, optional fraction, then e/E and an exponent: 2E+07, 9.15466E-06, 1e5.
    [GeneratedRegex(@"\d(\.\d+)?[eE][+-]?\d")]
    private static partial Regex ENotation();

    [GeneratedRegex("<(td|pre|details)[^>]*class=\"raw\"[^>]*>.*?</\\1>", RegexOptions.Singleline)]
    private static partial Regex RawElement();

    [GeneratedRegex("<svg .*?</svg>", RegexOptions.Singleline)]
    private static partial Regex Svg();

    [GeneratedRegex("<g class=\"series\"><title>([^<]*)</title>\n<path [^>]*stroke=\"(#[0-9a-f]{6})\"[^>]*?(?: stroke-dasharray=\"([^\"]*)\")?/>")]
    private static partial Regex SeriesPath();

    internal static string Report(string example, out string dir) => ReportOf(RepoPaths.Example(example), out dir);

    internal static string ReportOf(string readout, out string dir, int exitCode = 0, params string[] extra)
    {
        dir = RepoPaths.TempDir();
        var r = CliRunner.Run(["report", readout, "--out", dir, .. extra]);
        Assert.True(r.ExitCode == exitCode, r.Error);
        return File.ReadAllText(Path.Combine(dir, "report.html"));
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Every_number_in_the_report_equals_design_json(string example)
    {
        var html = Report(example, out var dir);
        using var json = JsonDocument.Parse(CliRunner.Run("design", RepoPaths.Example(example), "--json").Output);
        var keyed = KeyedCell().Count(html);
        Assert.True(keyed > 50, $"only {keyed} keyed numbers");
        AssertEveryKeyedCellEquals(json, html, File.ReadAllText(Path.Combine(dir, "report.md")));
    }

    /// <summary>Every keyed cell of the page shows the value at its path in the JSON document (rounded as the page rounds it), and its number is in the Markdown too.</summary>
    internal static void AssertEveryKeyedCellEquals(JsonDocument json, string html, string markdown)
    {
        var cells = KeyedCell().Matches(html);
        foreach (Match c in cells)
        {
            var path = WebUtility.HtmlDecode(c.Groups[1].Value);
            var shown = WebUtility.HtmlDecode(Regex.Replace(c.Groups[3].Value, "<[^>]+>", ""));
            var value = Json.At(json.RootElement, path);
            if (value.ValueKind == JsonValueKind.String)
            {
                Assert.True(value.GetString() == shown || shown.EndsWith(" " + value.GetString(), StringComparison.Ordinal), $"{path}: report {shown}, design --json {value.GetString()}");
                continue;
            }

            // Full precision in data-value; the shown text rounds it to 4 significant figures under an SI prefix or as a percentage.
            var exact = value.GetDouble();
            Assert.True(c.Groups[2].Success, $"{path} has no data-value");
            Assert.Equal(exact, double.Parse(c.Groups[2].Value, CultureInfo.InvariantCulture));
            var lead = LeadingNumber().Match(shown.Replace('\u2212', '-'));
            Assert.True(lead.Success, $"{path}: '{shown}' does not start with a number");
            var number = double.Parse(lead.Value, CultureInfo.InvariantCulture);
            var power = Regex.Match(shown, @"× 10(−?\d+)");
            if (power.Success)
            {
                number *= Math.Pow(10, int.Parse(power.Groups[1].Value.Replace('−', '-'), CultureInfo.InvariantCulture));
            }

            var scales = new[] { 1e12, 1e9, 1e6, 1e3, 1, 1e-3, 1e-6, 1e-9, 1e-12, 1e-15, 0.01 };
            Assert.True(exact == 0 ? number == 0 : scales.Any(s => Math.Abs((number * s) - exact) <= 5e-4 * Math.Abs(exact)), $"{path}: shown '{shown}', exact {exact}");
            Assert.Contains(lead.Value, markdown, StringComparison.Ordinal);
        }
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void No_number_outside_raw_elements_is_in_e_notation(string example)
    {
        AssertNoENotation(Report(example, out _));
        Assert.Matches(ENotation(), "2E+07 9.15466E-06"); // the pattern itself finds what the issue reported
    }

    /// <summary>No number outside raw elements (hashes, integer lists) of the page is written in E-notation.</summary>
    internal static void AssertNoENotation(string html)
    {
        var page = Regex.Replace(html, "<style>.*?</style>", "", RegexOptions.Singleline); // CSS colours such as #e3f2e6 are not numbers
        var text = WebUtility.HtmlDecode(Regex.Replace(RawElement().Replace(page, ""), "<[^>]+>", " "));
        var hits = ENotation().Matches(text).Select(m => text.Substring(Math.Max(0, m.Index - 30), Math.Min(60, text.Length - Math.Max(0, m.Index - 30)))).ToList();
        Assert.True(hits.Count == 0, string.Join("\n", hits));
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Every_chart_has_a_title_a_description_and_distinct_dash_patterns_and_a_series_keeps_its_style_across_charts(string example)
    {
        var html = Report(example, out _);
        var charts = Svg().Matches(html).Select(m => m.Value).ToList();
        Assert.True(charts.Count >= 7, $"{charts.Count} charts");
        var styles = new Dictionary<string, (string, string)>();
        foreach (var chart in charts)
        {
            Assert.Matches("^<svg [^>]*role=\"img\"[^>]*>\n<title>[^<]+</title>\n<desc>[^<]+</desc>", chart);
            var series = SeriesPath().Matches(chart).Select(m => (Name: m.Groups[1].Value, Colour: m.Groups[2].Value, Dash: m.Groups[3].Value)).ToList();
            Assert.Equal(series.Count, Regex.Count(chart, "<g class=\"series\">"));
            Assert.True(series.Select(s => s.Dash).Distinct().Count() == series.Count, "repeated dash pattern in " + string.Join(", ", series));
            foreach (var s in series)
            {
                if (styles.TryGetValue(s.Name, out var seen))
                {
                    Assert.True(seen == (s.Colour, s.Dash), $"'{s.Name}' drawn as {s.Colour}/{s.Dash} and as {seen}");
                }

                styles[s.Name] = (s.Colour, s.Dash);
            }
        }

        Assert.Contains("<title>Where the noise comes from", html.Replace("<h2>", "<title>", StringComparison.Ordinal), StringComparison.Ordinal);
        Assert.Contains("nV/√Hz", html, StringComparison.Ordinal);
    }

    [Fact]
    public void The_source_table_lists_every_noise_parameter()
    {
        var html = Report("fast_imaging.toml", out _);
        Assert.Contains("<th>white level</th><th>white level at the ADC</th><th>1/f corner</th><th>1/f low cutoff</th>", html, StringComparison.Ordinal);
        Assert.Contains("<td>sensor (x gain to the ADC)</td>", html, StringComparison.Ordinal);
        Assert.Contains("data-json=\"readout.noise.sources[0].flicker_corner_hz\"", html, StringComparison.Ordinal);
        Assert.Contains("<summary>The 56 integer coefficients", html, StringComparison.Ordinal);
        Assert.Contains("c_k = round(h_k * 2^P), P = ", html, StringComparison.Ordinal);
        Assert.Contains("Time and frequency domain cross-check", html, StringComparison.Ordinal);
        Assert.Contains("coefgen 0.", html, StringComparison.Ordinal);
    }

    [Fact]
    public void A_capture_design_shows_the_captures_spectrum_and_a_split_budget()
    {
        var html = Report("capture_bench.toml", out _);
        Assert.Contains("<title>Measured spectrum of the capture at the ADC input</title>", html, StringComparison.Ordinal);
        Assert.Contains("measured analog noise (all sources together)", html, StringComparison.Ordinal);
        Assert.Contains("quantisation + ADC own noise", html, StringComparison.Ordinal);
        Assert.DoesNotContain(">100 %<", html, StringComparison.Ordinal);
    }

    [Fact]
    public void An_unsafe_design_is_bannered_lists_no_emitted_files_and_fails_with_require_safe()
    {
        var path = UnsafeDesignTests.UnsafeCopy();
        var html = ReportOf(path, out _);
        Assert.Contains("<div class=\"banner alarm\" role=\"alert\">NOT SAFE", html, StringComparison.Ordinal);
        Assert.True(html.IndexOf("banner alarm", StringComparison.Ordinal) < html.IndexOf("<h2>The description", StringComparison.Ordinal));
        Assert.DoesNotContain("<th>SHA-256</th>", html, StringComparison.Ordinal);
        Assert.Contains("refuses to write", html, StringComparison.Ordinal);
        var strict = ReportOf(path, out var dir, exitCode: 1, "--require-safe");
        Assert.Equal(html, strict);
        Assert.True(File.Exists(Path.Combine(dir, "report.md")));
        var design = CliRunner.Run("design", path, "--require-safe");
        Assert.Equal(1, design.ExitCode);
        Assert.Contains("CG2020", design.Error, StringComparison.Ordinal);
        Assert.Equal(0, CliRunner.Run("design", path).ExitCode);
        Assert.Equal(0, CliRunner.Run("design", RepoPaths.Example("fast_imaging.toml"), "--require-safe").ExitCode);
        Assert.Contains("banner safe", Report("fast_imaging.toml", out _), StringComparison.Ordinal);
    }

    [Fact]
    public void The_emitted_files_sha256_equal_what_emit_writes_and_the_report_is_deterministic()
    {
        var html = Report("slowscan_spectro.toml", out var first);
        var again = Report("slowscan_spectro.toml", out var second);
        Assert.Equal(html, again);
        foreach (var chart in Directory.GetFiles(first, "*.svg"))
        {
            Assert.Equal(File.ReadAllBytes(chart), File.ReadAllBytes(Path.Combine(second, Path.GetFileName(chart))));
        }

        var emitDir = RepoPaths.TempDir();
        Assert.Equal(0, CliRunner.Run("emit", RepoPaths.Example("slowscan_spectro.toml"), "--out", emitDir).ExitCode);
        foreach (var name in new[] { "red_ch0_coefs.h", "red_ch0_coefs_pkg.vhd" })
        {
            var sha = Convert.ToHexStringLower(SHA256.HashData(File.ReadAllBytes(Path.Combine(emitDir, name))));
            Assert.Contains($"<td>{name}</td>", html, StringComparison.Ordinal);
            Assert.Contains($"<td class=\"raw\">{sha}</td>", html, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void The_html_page_is_self_contained()
    {
        var html = Report("ir_measured.toml", out _);
        Assert.DoesNotContain("<script", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("href=", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("src=", html, StringComparison.OrdinalIgnoreCase);
        Assert.Equal(7, Regex.Count(html, "<svg "));
        Assert.Contains("Fixed-point proof", html, StringComparison.Ordinal);
    }
}
