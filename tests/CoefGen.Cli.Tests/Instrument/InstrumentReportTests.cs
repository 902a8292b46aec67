using System.Text.Json;
using System.Text.RegularExpressions;
using CoefGen.Cli.Tests.Study;

namespace CoefGen.Cli.Tests.Instrument;

/// <summary>`report INSTRUMENT --out DIR`: a summary page of every table and the shared datapath, linked to one report per table.</summary>
public class InstrumentReportTests
{
    private static string Instrument => Path.Combine(RepoPaths.Example("camera4"), "cam4.toml");

    [Fact]
    public void The_summary_links_every_tables_report_and_every_number_equals_design_json()
    {
        var dir = RepoPaths.TempDir();
        var r = CliRunner.Run("report", Instrument, "--out", dir);
        Assert.True(r.ExitCode == 0, r.Error);
        var html = File.ReadAllText(Path.Combine(dir, "report.html"));
        var markdown = File.ReadAllText(Path.Combine(dir, "report.md"));
        var links = Regex.Matches(html, "<a href=\"([^\"]+)\">").Select(m => m.Groups[1].Value).ToArray();
        Assert.Equal(16, links.Length);
        foreach (var link in links)
        {
            Assert.True(File.Exists(Path.Combine(dir, link)), link);
            Assert.Contains("(" + link.Replace("report.html", "report.md", StringComparison.Ordinal) + ")", markdown, StringComparison.Ordinal);
        }

        // A table's page is the report of that table's design: its summary names the table's readout.
        Assert.Contains("Design report: cam4_fast_d", File.ReadAllText(Path.Combine(dir, "fast_d", "report.html")), StringComparison.Ordinal);

        using var json = JsonDocument.Parse(CliRunner.Run("design", Instrument, "--json").Output);
        var keyed = Regex.Count(html, "data-json=\"tables\\[");
        Assert.Equal(16 * 10, keyed); // per table: pixel time, samples, three schemes, penalty, margin, coefficients, P, shift (the windows are text)
        ReportCommandTests.AssertEveryKeyedCellEquals(json, html, markdown);
        ReportCommandTests.AssertNoENotation(html);
        Assert.Contains("data-json=\"datapath.checks[2].margin_bits\"", html, StringComparison.Ordinal);
    }

    [Fact]
    public void The_report_is_byte_identical_on_a_second_run_and_a_bad_instrument_writes_nothing()
    {
        var a = RepoPaths.TempDir();
        var b = RepoPaths.TempDir();
        Assert.Equal(0, CliRunner.Run("report", Instrument, "--out", a).ExitCode);
        Assert.Equal(0, CliRunner.Run("report", Instrument, "--out", b).ExitCode);
        var files = Directory.GetFiles(a, "*", SearchOption.AllDirectories).Select(f => Path.GetRelativePath(a, f)).Order(StringComparer.Ordinal).ToArray();
        Assert.Equal(2 + (16 * 9), files.Length);
        foreach (var f in files)
        {
            Assert.Equal(File.ReadAllBytes(Path.Combine(a, f)), File.ReadAllBytes(Path.Combine(b, f)));
        }

        var dir = InstrumentCommandTests.CopyExample();
        var instrument = Path.Combine(dir, "cam4.toml");
        File.WriteAllText(instrument, File.ReadAllText(instrument).Replace("sensor.gain = 2.2", "sensor.gain = -2.2", StringComparison.Ordinal));
        var outDir = Path.Combine(dir, "rep");
        var bad = CliRunner.Run("report", instrument, "--out", outDir);
        Assert.Equal(2, bad.ExitCode);
        Assert.Matches(@"cam4\.toml:\d+:\d+: error CG", bad.Error);
        Assert.False(Directory.Exists(outDir) && Directory.EnumerateFileSystemEntries(outDir).Any());
    }
}
