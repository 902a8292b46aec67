using System.Globalization;
using System.Net;
using System.Security.Cryptography;
using System.Text.Json;
using System.Text.RegularExpressions;

namespace CoefGen.Cli.Tests.Study;

public partial class ReportCommandTests
{
    [GeneratedRegex("<td data-json=\"([^\"]+)\">([^<]*)</td>")]
    private static partial Regex KeyedCell();

    internal static string Report(string example, out string dir)
    {
        dir = RepoPaths.TempDir();
        var r = CliRunner.Run("report", RepoPaths.Example(example), "--out", dir);
        Assert.True(r.ExitCode == 0, r.Error);
        return File.ReadAllText(Path.Combine(dir, "report.html"));
    }

    [Theory]
    [InlineData("fast_imaging.toml")]
    [InlineData("slowscan_spectro.toml")]
    [InlineData("slowscan_robust.toml")]
    public void Every_number_in_the_report_equals_design_json(string example)
    {
        var html = Report(example, out var dir);
        using var json = JsonDocument.Parse(CliRunner.Run("design", RepoPaths.Example(example), "--json").Output);
        var cells = KeyedCell().Matches(html);
        Assert.True(cells.Count > 50, $"only {cells.Count} keyed numbers");
        var markdown = File.ReadAllText(Path.Combine(dir, "report.md"));
        foreach (Match c in cells)
        {
            var path = WebUtility.HtmlDecode(c.Groups[1].Value);
            var shown = WebUtility.HtmlDecode(c.Groups[2].Value);
            var value = Json.At(json.RootElement, path);
            var expected = value.ValueKind == JsonValueKind.String ? value.GetString() : value.GetDouble().ToString("G6", CultureInfo.InvariantCulture);
            Assert.True(expected == shown, $"{path}: report {shown}, design --json {expected}");
            Assert.Contains($"| {shown} |", markdown, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void The_emitted_files_sha256_equal_what_emit_writes_and_the_report_is_deterministic()
    {
        var html = Report("slowscan_spectro.toml", out _);
        var again = Report("slowscan_spectro.toml", out _);
        Assert.Equal(html, again);
        var emitDir = RepoPaths.TempDir();
        Assert.Equal(0, CliRunner.Run("emit", RepoPaths.Example("slowscan_spectro.toml"), "--out", emitDir).ExitCode);
        foreach (var name in new[] { "red_ch0_coefs.h", "red_ch0_coefs_pkg.vhd" })
        {
            var sha = Convert.ToHexStringLower(SHA256.HashData(File.ReadAllBytes(Path.Combine(emitDir, name))));
            Assert.Contains($"<td>{name}</td>", html, StringComparison.Ordinal);
            Assert.Contains($"<td>{sha}</td>", html, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void The_html_page_is_self_contained()
    {
        var html = Report("ir_measured.toml", out _);
        Assert.DoesNotContain("<script", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("href=", html, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("src=", html, StringComparison.OrdinalIgnoreCase);
        Assert.Equal(4, Regex.Count(html, "<svg "));
        Assert.Contains("Fixed-point proof", html, StringComparison.Ordinal);
    }
}
