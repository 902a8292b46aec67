using CoefGen.Core.Formatting;
using System.Text.Json;

namespace CoefGen.Cli.Tests;

/// <summary>[weights] form = "two-stage" through the CLI: design prints the two-stage datapath, not a full table.</summary>
public class TwoStageCommandTests
{
    /// <summary>The shipped skipper example with form = "two-stage", written into a fresh folder.</summary>
    internal static string TwoStageSkipper(string? edit = null)
    {
        var text = File.ReadAllText(RepoPaths.Example(Path.Combine("cycles", "skipper_reads.toml")))
            .Replace("scheme = \"optimal\"\n", "scheme = \"optimal\"\nform = \"two-stage\"\n", StringComparison.Ordinal);
        var path = Path.Combine(RepoPaths.TempDir(), "skipper_two_stage.toml");
        File.WriteAllText(path, edit is null ? text : text + edit);
        return path;
    }

    [Fact]
    public void Design_text_shows_the_two_stage_tables_as_the_datapath_and_no_full_table()
    {
        var r = CliRunner.Run("design", TwoStageSkipper());
        Assert.True(r.ExitCode == 0, r.Error);
        Assert.Contains("the datapath (form = \"two-stage\")", r.Output, StringComparison.Ordinal);
        Assert.Contains("two-stage proof SAFE for every input", r.Output, StringComparison.Ordinal);
        Assert.Contains("Two-stage tables (optimal on target", r.Output, StringComparison.Ordinal);
        Assert.DoesNotContain("Fixed point (", r.Output, StringComparison.Ordinal);
        Assert.DoesNotContain("Weights of ", r.Output, StringComparison.Ordinal);
    }

    [Fact]
    public void Design_json_names_the_form_and_carries_the_integer_tables_under_two_stage()
    {
        var r = CliRunner.Run("design", TwoStageSkipper(), "--json");
        Assert.True(r.ExitCode == 0, r.Error);
        using var doc = JsonDocument.Parse(r.Output);
        var fixedPoint = doc.RootElement.GetProperty("fixed_point");
        Assert.Equal("two-stage", fixedPoint.GetProperty("form").GetString());
        Assert.False(fixedPoint.TryGetProperty("coefficients", out _));
        Assert.True(fixedPoint.GetProperty("safe").GetBoolean());
        var integer = doc.RootElement.GetProperty("two_stage").GetProperty("integer");
        Assert.Equal(48, integer.GetProperty("per_read_table").GetArrayLength());
        Assert.Equal(64, integer.GetProperty("read_weights").GetArrayLength());
    }

    /// <summary>The penalty line names the full optimum by scheme: with [scenarios] the robust scheme comes last.</summary>
    [Fact]
    public void The_two_stage_penalty_is_against_the_optimal_scheme_when_a_robust_scheme_is_chosen()
    {
        var text = File.ReadAllText(RepoPaths.Example(Path.Combine("cycles", "skipper_reads.toml")))
            .Replace("scheme = \"optimal\"", "scheme = \"robust\"", StringComparison.Ordinal)
            + "\n[scenarios]\nobjective = \"regret\"\n\n[scenarios.range]\n\"noise.source[0].flicker_corner_hz\" = [\"10 kHz\", \"200 kHz\"]\n";
        var path = Path.Combine(RepoPaths.TempDir(), "skipper_robust.toml");
        File.WriteAllText(path, text);
        var json = CliRunner.Run("design", path, "--json");
        Assert.True(json.ExitCode == 0, json.Error);
        using var doc = JsonDocument.Parse(json.Output);
        var schemes = doc.RootElement.GetProperty("schemes").EnumerateArray().ToList();
        var optimal = schemes.Single(s => s.GetProperty("scheme").GetString() == "optimal").GetProperty("noise_e_rms").GetDouble();
        var robust = schemes.Single(s => s.GetProperty("scheme").GetString() == "robust").GetProperty("noise_e_rms").GetDouble();
        Assert.NotEqual(Human.Num(optimal), Human.Num(robust)); // else the test could not tell them apart

        var r = CliRunner.Run("design", path);
        Assert.True(r.ExitCode == 0, r.Error);
        Assert.Contains($"of the full optimum ({Human.Num(optimal)} e-)", r.Output, StringComparison.Ordinal);
    }

    /// <summary>The shipped example has [[emit]] entries: the report lists them from the two-stage proof (no full datapath to ask).</summary>
    [Fact]
    public void Report_of_the_shipped_two_stage_example_lists_its_emitted_files()
    {
        var outDir = Path.Combine(RepoPaths.TempDir(), "report");
        var r = CliRunner.Run("report", RepoPaths.Example(Path.Combine("cycles", "skipper_two_stage.toml")), "--out", outDir);
        Assert.True(r.ExitCode == 0, r.Error);
        var md = File.ReadAllText(Path.Combine(outDir, "report.md"));
        Assert.Contains("skipper_ts_two_stage.h", md, StringComparison.Ordinal);
        Assert.Contains("skipper_ts_two_stage_pkg.vhd", md, StringComparison.Ordinal);
    }

    [Fact]
    public void Diff_of_a_two_stage_file_is_a_located_error()
    {
        var path = TwoStageSkipper();
        var r = CliRunner.Run("diff", path, path);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("error CG1274: weights.form", r.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Emit_writes_the_two_stage_templates_and_refuses_a_full_table_template_for_a_two_stage_design()
    {
        var path = TwoStageSkipper();
        var outDir = Path.Combine(Path.GetDirectoryName(path)!, "out");
        var r = CliRunner.Run("emit", path, "--out", outDir, "--format", "two-stage-c-header", "--format", "two-stage-vhdl-package");
        Assert.True(r.ExitCode == 0, r.Error);
        var header = File.ReadAllText(Path.Combine(outDir, "skipper_ch0_two_stage.h"));
        Assert.Contains("#define SKIPPER_CH0_READ_COUNT 64", header, StringComparison.Ordinal);
        Assert.Contains("static inline int64_t skipper_ch0_apply(const int32_t *codes)", header, StringComparison.Ordinal);
        Assert.True(File.Exists(Path.Combine(outDir, "skipper_ch0_two_stage_pkg.vhd")));

        var wrong = CliRunner.Run("emit", path, "--out", Path.Combine(outDir, "x"), "--format", "c-header");
        Assert.Equal(2, wrong.ExitCode);
        Assert.Contains("CG3103", wrong.Error, StringComparison.Ordinal);
        Assert.False(Directory.Exists(Path.Combine(outDir, "x")));

        var full = CliRunner.Run("emit", RepoPaths.Example(Path.Combine("cycles", "skipper_reads.toml")), "--out", Path.Combine(outDir, "y"), "--format", "two-stage-c-header");
        Assert.Equal(2, full.ExitCode);
        Assert.Contains("need form = \"two-stage\"", full.Error, StringComparison.Ordinal);
    }

    [Fact]
    public void Report_has_the_two_stage_section_and_every_number_in_it_equals_design_json()
    {
        var path = TwoStageSkipper();
        var html = Study.ReportCommandTests.ReportOf(path, out var dir);
        Assert.Contains("<h2>Two-stage datapath</h2>", html, StringComparison.Ordinal);
        Assert.Contains("Proven safe: the two-stage integer datapath", html, StringComparison.Ordinal);
        Assert.DoesNotContain("<h2>Integer datapath</h2>", html, StringComparison.Ordinal);
        Assert.Contains("data-json=\"two_stage.integer.proof.checks[5].required_bits\"", html, StringComparison.Ordinal);
        using var json = JsonDocument.Parse(CliRunner.Run("design", path, "--json").Output);
        Study.ReportCommandTests.AssertEveryKeyedCellEquals(json, html, File.ReadAllText(Path.Combine(dir, "report.md")));
        Study.ReportCommandTests.AssertNoENotation(html);
    }

    [Fact]
    public void Vectors_of_a_two_stage_design_verify_against_their_own_expected_outputs_and_catch_a_wrong_pixel()
    {
        var path = TwoStageSkipper();
        var dir = Path.Combine(Path.GetDirectoryName(path)!, "vectors");
        var r = CliRunner.Run("vectors", path, "--out", dir, "--pixels", "30");
        Assert.True(r.ExitCode == 0, r.Error);
        Assert.True(File.Exists(Path.Combine(dir, "skipper_ch0_datapath.v")));
        Assert.Equal(30, File.ReadAllLines(Path.Combine(dir, "expected_read_sums.txt")).Length);
        using (var manifest = JsonDocument.Parse(File.ReadAllText(Path.Combine(dir, "manifest.json"))))
        {
            Assert.Equal("two-stage", manifest.RootElement.GetProperty("form").GetString());
        }

        var good = CliRunner.Run("verify", path, "--vectors", dir, "--dut", Path.Combine(dir, "expected_out.hex"));
        Assert.True(good.ExitCode == 0, good.Output + good.Error);
        var lines = File.ReadAllLines(Path.Combine(dir, "expected_out.hex"));
        lines[12] = lines[12] == "00000000" ? "00000001" : "00000000";
        var dump = Path.Combine(Path.GetDirectoryName(path)!, "bad.hex");
        File.WriteAllLines(dump, lines);
        Assert.Equal(1, CliRunner.Run("verify", path, "--vectors", dir, "--dut", dump).ExitCode);
    }

    [Fact]
    public void Two_stage_with_noise_capture_is_a_located_error()
    {
        var dir = RepoPaths.TempDir();
        var cycles = Path.GetDirectoryName(RepoPaths.Example(Path.Combine("cycles", "skipper_capture.toml")))!;
        File.Copy(Path.Combine(cycles, "skipper_capture_idle.i16"), Path.Combine(dir, "skipper_capture_idle.i16"));
        var text = File.ReadAllText(Path.Combine(cycles, "skipper_capture.toml")).Replace("[weights]\n", "[weights]\nform = \"two-stage\"\n", StringComparison.Ordinal);
        var path = Path.Combine(dir, "skipper_capture.toml");
        File.WriteAllText(path, text);
        var r = CliRunner.Run("design", path);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("error CG1275: weights.form", r.Error, StringComparison.Ordinal);
    }
}
