using System.Text.Json;

namespace CoefGen.Cli.Tests;

/// <summary>The shipped robust example through design (text and JSON), emit, vectors and verify.</summary>
public class RobustDesignCommandTests
{
    private const string Example = "slowscan_robust.toml";

    [Fact]
    public void Design_prints_the_regret_table_with_worst_case_and_mean_rows_and_the_duality_gap()
    {
        var r = CliRunner.Run("design", RepoPaths.Example(Example));
        Assert.True(r.ExitCode == 0, r.Error);
        Assert.Contains("robust (least worst regret over 4 scenarios) *", r.Output, StringComparison.Ordinal);
        Assert.Contains("Noise scenarios (4;", r.Output, StringComparison.Ordinal);
        Assert.Contains("duality gap", r.Output, StringComparison.Ordinal);
        Assert.Contains("\n  worst case ", r.Output, StringComparison.Ordinal);
        Assert.Contains("\n  mean ", r.Output, StringComparison.Ordinal);
        Assert.Contains("source[0].flicker_corner_hz=200000", r.Output, StringComparison.Ordinal);
    }

    [Fact]
    public void Design_json_has_the_scenarios_object_and_robust_has_the_smallest_worst_ratio()
    {
        var r = CliRunner.Run("design", RepoPaths.Example(Example), "--json");
        Assert.True(r.ExitCode == 0, r.Error);
        using var doc = JsonDocument.Parse(r.Output);
        var root = doc.RootElement;
        var schemes = root.GetProperty("schemes").EnumerateArray().Select(s => s.GetProperty("scheme").GetString()).ToArray();
        Assert.Equal(["boxcar", "weighted", "optimal", "robust"], schemes);
        var s = root.GetProperty("scenarios");
        Assert.Equal("regret", s.GetProperty("objective").GetString());
        Assert.Equal("noise.source[0].flicker_corner_hz", s.GetProperty("varied_key").GetString());
        var cases = s.GetProperty("cases").EnumerateArray().ToArray();
        Assert.Equal(4, cases.Length);
        Assert.Equal(20000, cases[1].GetProperty("overrides").GetProperty("noise.source[0].flicker_corner_hz").GetDouble());
        Assert.Equal(1.0, cases.Sum(c => c.GetProperty("robust_lambda").GetDouble()), 12);
        Assert.True(s.GetProperty("robust_solve").GetProperty("relative_duality_gap").GetDouble() < 1e-6);
        var regret = s.GetProperty("regret").EnumerateArray().ToArray();
        Assert.Equal(schemes, regret.Select(x => x.GetProperty("scheme").GetString()).ToArray());
        var worst = regret.Select(x => x.GetProperty("worst_ratio").GetDouble()).ToArray();
        Assert.Equal(worst.Min(), worst[3]);
        foreach (var row in regret)
        {
            Assert.Equal(4, row.GetProperty("noise_e_rms").GetArrayLength());
            Assert.Equal(4, row.GetProperty("ratio_to_optimum").GetArrayLength());
        }
    }

    [Fact]
    public void Vectors_of_the_robust_design_verify_with_no_mismatch()
    {
        var dir = RepoPaths.TempDir();
        var v = CliRunner.Run("vectors", RepoPaths.Example(Example), "--out", dir, "--pixels", "50", "--seed", "3");
        Assert.True(v.ExitCode == 0, v.Error);
        var dump = Path.Combine(dir, "dut.txt");
        File.WriteAllLines(dump, File.ReadAllLines(Path.Combine(dir, "expected.txt")).Select(l => l.Split(' ')[0]));
        var r = CliRunner.Run("verify", RepoPaths.Example(Example), "--vectors", dir, "--dut", dump);
        Assert.True(r.ExitCode == 0, r.Output + r.Error);
        Assert.Contains("compared 50 pixels", r.Output, StringComparison.Ordinal);
    }

    [Fact]
    public void Emit_writes_the_robust_tables()
    {
        var dir = RepoPaths.TempDir();
        var r = CliRunner.Run("emit", RepoPaths.Example(Example), "--out", dir);
        Assert.True(r.ExitCode == 0, r.Output + r.Error);
        var header = File.ReadAllText(Path.Combine(dir, "red_ch0_robust_coefs.h"));
        Assert.Contains("Scheme: robust (least worst regret over 4 scenarios)", header, StringComparison.Ordinal);
    }
}

/// <summary>Scenarios with noise.capture: the robust weights come from the parametric scenarios, are predicted on the capture, and the regret rows are the weights actually shown.</summary>
public class RobustOnCaptureTests
{
    [Fact]
    public void The_robust_scheme_survives_the_capture_and_the_regret_table_rates_the_capture_optimum()
    {
        var dir = RepoPaths.TempDir();
        foreach (var f in Directory.GetFiles(Path.Combine(RepoPaths.Root, "examples"), "capture_bench*"))
        {
            File.Copy(f, Path.Combine(dir, Path.GetFileName(f)));
        }

        var path = Path.Combine(dir, "capture_bench.toml");
        var toml = File.ReadAllText(path).Replace("scheme = \"optimal\"", "scheme = \"robust\"", StringComparison.Ordinal)
            + "\n[scenarios.range]\n\"noise.source[0].white_nv_per_rthz\" = [20, 40]\n";
        File.WriteAllText(path, toml);
        var r = CliRunner.Run("design", path, "--json");
        Assert.True(r.ExitCode == 0, r.Error);
        using var doc = JsonDocument.Parse(r.Output);
        var root = doc.RootElement;
        var schemes = root.GetProperty("schemes").EnumerateArray().ToArray();
        Assert.Equal("robust", schemes[3].GetProperty("scheme").GetString());
        Assert.True(schemes[3].GetProperty("chosen").GetBoolean());
        var optimalOnCapture = schemes[2].GetProperty("variance_v2").GetDouble();
        Assert.True(schemes[3].GetProperty("variance_v2").GetDouble() >= optimalOnCapture * (1 - 1e-12));
        var regret = root.GetProperty("scenarios").GetProperty("regret").EnumerateArray().ToArray();
        Assert.Equal("optimal on the capture", regret[2].GetProperty("label").GetString());
        Assert.True(regret[3].GetProperty("worst_noise_e_rms").GetDouble() <= regret[2].GetProperty("worst_noise_e_rms").GetDouble());
    }
}

/// <summary>sweep over a readout with scenarios: every scheme's worst-case regret per point, equal to `design` at that point.</summary>
public class RobustSweepTests
{
    [Fact]
    public void Sweep_reports_the_worst_regret_of_every_scheme_as_design_does_and_robust_is_never_above_optimal()
    {
        var example = RepoPaths.Example("slowscan_robust.toml");
        var dir = RepoPaths.TempDir();
        var csv = Path.Combine(dir, "s.csv");
        var sweep = CliRunner.Run("sweep", example, "--vary", "noise.front_end_pole_hz=2M,3M", "--json", "--csv", csv);
        Assert.True(sweep.ExitCode == 0, sweep.Error);
        using var doc = JsonDocument.Parse(sweep.Output);
        var points = doc.RootElement.GetProperty("points").EnumerateArray().ToArray();
        Assert.Equal(2, points.Length);
        var header = File.ReadAllLines(csv)[0].Split(',');
        Assert.Contains("robust_worst_regret", header);
        var text = File.ReadAllText(example);
        for (var i = 0; i < points.Length; i++)
        {
            var schemes = points[i].GetProperty("schemes").EnumerateArray().ToDictionary(s => s.GetProperty("scheme").GetString()!, s => s.GetProperty("worst_regret").GetDouble());
            Assert.True(schemes["robust"] <= schemes["optimal"]);
            var path = Path.Combine(dir, $"p{i.ToString(System.Globalization.CultureInfo.InvariantCulture)}.toml");
            File.WriteAllText(path, text.Replace("front_end_pole_hz = \"2.5 MHz\"", i == 0 ? "front_end_pole_hz = 2000000" : "front_end_pole_hz = 3000000", StringComparison.Ordinal));
            using var design = JsonDocument.Parse(CliRunner.Run("design", path, "--json").Output);
            var regret = design.RootElement.GetProperty("scenarios").GetProperty("regret").EnumerateArray().ToArray();
            Assert.Equal(regret[3].GetProperty("worst_ratio").GetDouble(), schemes["robust"]);
            Assert.Equal(regret[2].GetProperty("worst_ratio").GetDouble(), schemes["optimal"]);
        }
    }
}
