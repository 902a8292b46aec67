using System.Diagnostics;
using System.Net;
using System.Text.RegularExpressions;

namespace CoefGen.Cli.Tests.Study;

/// <summary>
/// Renders the report of every shipped example in headless Chromium at 1400 px: no console errors, a screenshot that
/// is not blank, and no element (nor any chart label inside its chart) wider than the page or its box.
/// </summary>
public partial class ReportBrowserTests
{
    private const int PageWidth = 1400;

    // Run in the page after layout; lists every element sticking out of the viewport, out of its own box (scrollWidth),
    // and every SVG text or shape outside its chart. The result goes into the DOM for --dump-dom.
    private const string Probe = """
        <script>
        (() => {
          const bad = [];
          const width = document.documentElement.clientWidth;
          const name = e => e.tagName.toLowerCase() + (e.className && typeof e.className === 'string' ? '.' + e.className : '') + ' "' + (e.textContent || '').trim().slice(0, 40) + '"';
          if (document.documentElement.scrollWidth > width) bad.push('page scrolls sideways: ' + document.documentElement.scrollWidth + ' > ' + width);
          for (const e of document.body.querySelectorAll('*')) {
            const r = e.getBoundingClientRect();
            if (r.right > width + 0.5 || r.left < -0.5) bad.push('outside the page: ' + name(e) + ' ' + r.left + '..' + r.right);
            if (!(e instanceof SVGElement) && e.scrollWidth > e.clientWidth + 1 && getComputedStyle(e).display !== 'inline') bad.push('content wider than its box: ' + name(e) + ' ' + e.scrollWidth + ' > ' + e.clientWidth);
          }
          for (const svg of document.querySelectorAll('svg')) {
            const box = svg.getBoundingClientRect();
            for (const t of svg.querySelectorAll('text, path, rect, line, circle')) {
              const r = t.getBoundingClientRect();
              if (r.left < box.left - 0.5 || r.right > box.right + 0.5 || r.top < box.top - 0.5 || r.bottom > box.bottom + 0.5) bad.push('clipped in chart "' + svg.querySelector('title').textContent + '": ' + name(t));
            }
          }
          const out = document.createElement('pre');
          out.id = 'probe-result';
          out.textContent = 'PRO' + 'BE[' + bad.join('\n') + ']PRO' + 'BE'; // split so the script's own text never matches
          document.body.appendChild(out);
        })();
        </script>
        """;

    [GeneratedRegex(@"PROBE\[(.*?)\]PROBE", RegexOptions.Singleline)]
    private static partial Regex ProbeResult();

    private static string RequireChromium()
    {
        var found = (Environment.GetEnvironmentVariable("PATH") ?? "").Split(Path.PathSeparator)
            .Where(d => d.Length > 0).SelectMany(d => new[] { Path.Combine(d, "chromium"), Path.Combine(d, "chromium-browser") }).FirstOrDefault(File.Exists);
        if (found is not null)
        {
            return found;
        }

        const string msg = "chromium not found on PATH (apt-get install --no-install-recommends chromium)";
        if (Environment.GetEnvironmentVariable("REQUIRE_HDL_TOOLS") == "1")
        {
            Assert.Fail(msg + " and REQUIRE_HDL_TOOLS=1");
        }

        Assert.Skip(msg + "; set REQUIRE_HDL_TOOLS=1 to make this a failure");
        return null!;
    }

    [Theory]
    [MemberData(nameof(ReportCommandTests.Examples), MemberType = typeof(ReportCommandTests))]
    public async Task The_report_renders_without_console_errors_is_not_blank_and_nothing_overflows_at_1400_px(string example)
    {
        var chromium = RequireChromium();
        var html = ReportCommandTests.Report(example, out var dir);
        var png = Path.Combine(dir, "shot.png");
        var (code, log) = await Chromium(chromium, [$"--screenshot={png}", $"--window-size={PageWidth},2400", new Uri(Path.Combine(dir, "report.html")).AbsoluteUri]);
        Assert.True(code == 0, log);

        // Page console messages are logged as "CONSOLE(line)"; D-Bus and sandbox noise of a headless box is not the page's.
        var console = log.Split('\n').Where(l => l.Contains("CONSOLE", StringComparison.Ordinal) || l.Contains("Uncaught", StringComparison.Ordinal)).ToList();
        Assert.True(console.Count == 0, string.Join("\n", console));
        var (w, h, nonWhite) = PngPixels.Count(File.ReadAllBytes(png));
        Assert.Equal((PageWidth, 2400), (w, h));
        Assert.True(nonWhite > w * h / 100, $"only {nonWhite} non-white pixels of {w * h}");

        var probed = Path.Combine(dir, "probe.html");
        File.WriteAllText(probed, html.Replace("</body>", Probe + "</body>", StringComparison.Ordinal));
        var (dumpCode, dom) = await Chromium(chromium, ["--dump-dom", $"--window-size={PageWidth},2400", new Uri(probed).AbsoluteUri]);
        Assert.True(dumpCode == 0, dom);
        var result = ProbeResult().Match(dom);
        Assert.True(result.Success, "the probe did not run:\n" + dom[..Math.Min(2000, dom.Length)]);
        var findings = WebUtility.HtmlDecode(result.Groups[1].Value);
        Assert.True(findings.Length == 0, findings);
    }

    [Fact]
    public async Task The_report_of_an_unsafe_design_keeps_its_banner_and_advice_on_the_page()
    {
        var chromium = RequireChromium();
        var html = ReportCommandTests.ReportOf(Emit.UnsafeDesignTests.UnsafeCopy(), out var dir);
        Assert.Contains("What to change:", html, StringComparison.Ordinal);
        Assert.Equal("", await Probed(chromium, html, dir));
    }

    [Fact]
    public async Task The_report_of_a_two_stage_design_keeps_its_tables_and_proof_on_the_page()
    {
        var chromium = RequireChromium();
        var html = ReportCommandTests.ReportOf(RepoPaths.Example(Path.Combine("cycles", "skipper_two_stage.toml")), out var dir);
        Assert.Contains("<h2>Two-stage datapath</h2>", html, StringComparison.Ordinal);
        Assert.Equal("", await Probed(chromium, html, dir));
    }

    [Fact]
    public async Task The_instrument_summary_page_of_sixteen_tables_renders_and_nothing_overflows_at_1400_px()
    {
        var chromium = RequireChromium();
        var dir = RepoPaths.TempDir();
        var r = CliRunner.Run("report", Path.Combine(RepoPaths.Example("camera4"), "cam4.toml"), "--out", dir);
        Assert.True(r.ExitCode == 0, r.Error);
        var html = File.ReadAllText(Path.Combine(dir, "report.html"));
        Assert.Contains("<a href=\"fast_d/report.html\">fast/d</a>", html, StringComparison.Ordinal);
        Assert.Equal("", await Probed(chromium, html, dir));
    }

    /// <summary>The probe's findings on <paramref name="html"/> rendered at 1400 px (empty when nothing overflows).</summary>
    private static async Task<string> Probed(string chromium, string html, string dir)
    {
        var probed = Path.Combine(dir, "probe.html");
        File.WriteAllText(probed, html.Replace("</body>", Probe + "</body>", StringComparison.Ordinal));
        var (code, dom) = await Chromium(chromium, ["--dump-dom", $"--window-size={PageWidth},2400", new Uri(probed).AbsoluteUri]);
        Assert.True(code == 0, dom);
        var result = ProbeResult().Match(dom);
        Assert.True(result.Success, "the probe did not run");
        return WebUtility.HtmlDecode(result.Groups[1].Value);
    }

    [Fact]
    public async Task The_probe_finds_an_element_wider_than_the_page()
    {
        // Negative control: the same probe on a page with a 2000 px wide block and a chart label past its chart's edge.
        var chromium = RequireChromium();
        var dir = RepoPaths.TempDir();
        var page = Path.Combine(dir, "wide.html");
        File.WriteAllText(page, "<!DOCTYPE html><html><body><div style=\"width:2000px\">wide</div>" +
            "<svg width=\"200\" height=\"100\"><title>t</title><text x=\"190\" y=\"50\">a long label</text></svg>" + Probe + "</body></html>");
        var (code, dom) = await Chromium(chromium, ["--dump-dom", $"--window-size={PageWidth},800", new Uri(page).AbsoluteUri]);
        Assert.Equal(0, code);
        var findings = WebUtility.HtmlDecode(ProbeResult().Match(dom).Groups[1].Value);
        Assert.Contains("page scrolls sideways", findings, StringComparison.Ordinal);
        Assert.Contains("outside the page: div", findings, StringComparison.Ordinal);
        Assert.Contains("clipped in chart \"t\": text \"a long label\"", findings, StringComparison.Ordinal);
    }

    private static async Task<(int Code, string Output)> Chromium(string chromium, IEnumerable<string> args)
    {
        var profile = Directory.CreateTempSubdirectory("coefgen-chromium-").FullName;
        var psi = new ProcessStartInfo(chromium) { RedirectStandardOutput = true, RedirectStandardError = true, RedirectStandardInput = true, UseShellExecute = false };
        foreach (var a in new[]
        {
            "--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
            "--disable-component-update", "--disable-sync", "--hide-scrollbars", $"--user-data-dir={profile}", "--enable-logging=stderr", "--v=0",
        }.Concat(args))
        {
            psi.ArgumentList.Add(a);
        }

        using var p = Process.Start(psi)!;
        p.StandardInput.Close();
        var stdout = p.StandardOutput.ReadToEndAsync(TestContext.Current.CancellationToken);
        var stderr = p.StandardError.ReadToEndAsync(TestContext.Current.CancellationToken);
        using var timeout = CancellationTokenSource.CreateLinkedTokenSource(TestContext.Current.CancellationToken);
        timeout.CancelAfter(TimeSpan.FromSeconds(60));
        try
        {
            await p.WaitForExitAsync(timeout.Token);
        }
        catch (OperationCanceledException)
        {
            p.Kill(entireProcessTree: true);
            Assert.Fail("chromium timed out after 60 s");
        }

        return (p.ExitCode, await stdout + await stderr);
    }
}
