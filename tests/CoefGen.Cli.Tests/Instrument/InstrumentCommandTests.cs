using System.Diagnostics;
using System.Text.Json;

namespace CoefGen.Cli.Tests.Instrument;

/// <summary>design, emit, check and diff on the example instrument (4 modes x 4 channels).</summary>
public class InstrumentCommandTests
{
    internal static string CopyExample()
    {
        var dir = RepoPaths.TempDir();
        foreach (var f in Directory.GetFiles(RepoPaths.Example("camera4")))
        {
            File.Copy(f, Path.Combine(dir, Path.GetFileName(f)));
        }

        return dir;
    }

    [Fact]
    public void Design_of_the_instrument_lists_sixteen_tables_and_the_shared_proof_and_json_agrees()
    {
        var r = CliRunner.Run("design", Path.Combine(RepoPaths.Example("camera4"), "cam4.toml"));
        Assert.True(r.ExitCode == 0, r.Error);
        Assert.Contains("4 modes x 4 channels, 16 tables for one datapath", r.Output, StringComparison.Ordinal);
        foreach (var mode in new[] { "slow", "normal", "binned", "fast" })
        {
            foreach (var ch in new[] { "a", "b", "c", "d" })
            {
                Assert.Contains($"\n  {mode}/{ch} ", r.Output, StringComparison.Ordinal);
            }
        }

        Assert.Contains("SAFE for every input inside the ADC range, in every table", r.Output, StringComparison.Ordinal);
        Assert.Matches(@"final accumulator sum\s+\d+\s+48\s+\+\d+\s+slow/", r.Output);
        Assert.DoesNotContain("accumulator final", r.Output, StringComparison.Ordinal); // check identifiers stay in JSON

        var j = CliRunner.Run("design", Path.Combine(RepoPaths.Example("camera4"), "cam4.toml"), "--json");
        using var doc = JsonDocument.Parse(j.Output);
        Assert.Equal("coefgen.instrument/1", doc.RootElement.GetProperty("schema").GetString());
        var tables = doc.RootElement.GetProperty("tables");
        Assert.Equal(16, tables.GetArrayLength());
        Assert.Equal("fast", tables[13].GetProperty("mode").GetString());
        Assert.True(tables[13].GetProperty("read_noise_e").GetProperty("optimal").GetDouble() > 0);
        Assert.True(doc.RootElement.GetProperty("datapath").GetProperty("safe").GetBoolean());
    }

    [Fact]
    public void Check_passes_after_emit_and_exits_1_when_any_one_table_is_stale()
    {
        var dir = CopyExample();
        var instrument = Path.Combine(dir, "cam4.toml");
        var emit = CliRunner.Run("emit", instrument);
        Assert.True(emit.ExitCode == 0, emit.Error);
        Assert.Equal(16 + 3, Directory.GetFiles(dir, "cam4_*_*_coefs.h").Length + Directory.GetFiles(dir, "cam4_tables*").Length);
        var ok = CliRunner.Run("check", instrument);
        Assert.Equal(0, ok.ExitCode);
        Assert.Contains("all 19 files up to date", ok.Output, StringComparison.Ordinal);

        var one = Path.Combine(dir, "cam4_binned_c_coefs.h");
        var bytes = File.ReadAllBytes(one);
        bytes[bytes.Length / 2] ^= 0x01;
        File.WriteAllBytes(one, bytes);
        var stale = CliRunner.Run("check", instrument);
        Assert.Equal(1, stale.ExitCode);
        Assert.Contains("cam4_binned_c_coefs.h: STALE", stale.Output, StringComparison.Ordinal);
        Assert.Contains("1 of 19 files stale or missing", stale.Output, StringComparison.Ordinal);

        // A channel's gain changes its four tables and the combined packages, nothing else.
        Assert.Equal(0, CliRunner.Run("emit", instrument).ExitCode);
        File.WriteAllText(instrument, File.ReadAllText(instrument).Replace("sensor.gain = 1.8", "sensor.gain = 1.7", StringComparison.Ordinal));
        var changed = CliRunner.Run("check", instrument);
        Assert.Equal(1, changed.ExitCode);
        var staleNames = changed.Output.Split('\n').Where(l => l.Contains("STALE", StringComparison.Ordinal)).Select(l => l[..l.IndexOf(':', StringComparison.Ordinal)]).ToArray();
        Assert.Equal(["cam4_tables.h", "cam4_tables_pkg.vhd", "cam4_tables_pkg.sv", "cam4_slow_d_coefs.h", "cam4_normal_d_coefs.h", "cam4_binned_d_coefs.h", "cam4_fast_d_coefs.h"], staleNames);
    }

    [Fact]
    public void Diff_of_a_file_against_itself_prints_no_change_and_a_clock_change_names_each_changed_quantity()
    {
        var same = CliRunner.Run("diff", Path.Combine(RepoPaths.Example("camera4"), "cam4.toml"), Path.Combine(RepoPaths.Example("camera4"), "cam4.toml"));
        Assert.Equal(0, same.ExitCode);
        Assert.Contains("no change", same.Output, StringComparison.Ordinal);

        var dir = CopyExample();
        var basePath = Path.Combine(dir, "cam4_base.toml");
        File.WriteAllText(basePath, File.ReadAllText(basePath).Replace("rate_hz = \"40 MHz\"", "rate_hz = \"50 MHz\"", StringComparison.Ordinal));
        var clock = CliRunner.Run("diff", Path.Combine(RepoPaths.Example("camera4"), "cam4.toml"), Path.Combine(dir, "cam4.toml"));
        Assert.True(clock.ExitCode == 1, clock.Error);
        foreach (var q in new[] { "pixel samples", "windows", "read noise e- (boxcar)", "read noise e- (optimal)", "coefficient count", "largest coefficient change" })
        {
            Assert.Contains($"normal/a  {q}", clock.Output, StringComparison.Ordinal);
        }

        Assert.Contains("8..42 58..92", clock.Output, StringComparison.Ordinal);
        Assert.DoesNotContain("slow/", clock.Output, StringComparison.Ordinal); // slow mode sets its own 20 MHz clock
        Assert.Contains("in 12 tables", clock.Output, StringComparison.Ordinal);
    }

    [Fact]
    public void Diff_against_a_git_revision_compares_the_committed_state_with_the_file_on_disk()
    {
        var git = "git";
        var dir = RepoPaths.TempDir();
        var readout = Path.Combine(dir, "fast.toml");
        File.Copy(RepoPaths.Example("fast_imaging.toml"), readout);
        void Git(params string[] args)
        {
            var p = Process.Start(new ProcessStartInfo(git, ["-C", dir, "-c", "user.name=t", "-c", "user.email=t@t", .. args]) { RedirectStandardOutput = true, RedirectStandardError = true })!;
            p.WaitForExit();
            Assert.Equal(0, p.ExitCode);
        }

        Git("init", "-q");
        Git("add", "fast.toml");
        Git("commit", "-q", "-m", "x");
        Assert.Equal(0, CliRunner.Run("diff", readout, "--rev", "HEAD").ExitCode);

        File.WriteAllText(readout, File.ReadAllText(readout).Replace("count = 28", "count = 24", StringComparison.Ordinal));
        var r = CliRunner.Run("diff", readout, "--rev", "HEAD", "--json");
        Assert.Equal(1, r.ExitCode);
        using var doc = JsonDocument.Parse(r.Output);
        Assert.Equal("coefgen.diff/1", doc.RootElement.GetProperty("schema").GetString());
        var changes = doc.RootElement.GetProperty("changes").EnumerateArray().ToArray();
        Assert.Contains(changes, c => c.GetProperty("quantity").GetString() == "coefficient count" && c.GetProperty("before").GetString() == "56" && c.GetProperty("after").GetString() == "48");

        Assert.Equal(2, CliRunner.Run("diff", readout, "--rev", "no-such-rev").ExitCode);
        Assert.Equal(2, CliRunner.Run("diff", readout).ExitCode);
    }

    /// <summary>Vectors per table equal, byte for byte, the vectors of the table's standalone readout file, and verify accepts them.</summary>
    [Fact]
    public void Vectors_of_an_instrument_are_per_table_and_equal_the_standalone_tables_vectors()
    {
        var dir = CopyExample();
        var out4 = Path.Combine(dir, "v");
        var r = CliRunner.Run("vectors", Path.Combine(dir, "cam4.toml"), "--out", out4, "--pixels", "40");
        Assert.True(r.ExitCode == 0, r.Error);
        Assert.Equal(16, Directory.GetDirectories(out4).Length);

        // fast/b written out by hand as its own readout file, with the shared widths.
        var standalone = Path.Combine(dir, "fast_b.toml");
        File.Copy(Path.Combine(RepoPaths.Root, "tests", "CoefGen.Core.Tests", "Instrument", "cam4_fast_b.toml"), standalone);
        var alone = Path.Combine(dir, "alone");
        Assert.Equal(0, CliRunner.Run("vectors", standalone, "--out", alone, "--pixels", "40", "--no-rtl").ExitCode);
        foreach (var f in new[] { "stimulus.hex", "expected_out.hex", "expected_acc.hex", "stimulus.txt" })
        {
            Assert.Equal(File.ReadAllBytes(Path.Combine(alone, f)), File.ReadAllBytes(Path.Combine(out4, "fast_b", f)));
        }

        // The instrument's per-table expected outputs, read as a DUT dump, pass verify against the standalone vectors.
        Assert.Equal(0, CliRunner.Run("verify", standalone, "--vectors", alone, "--dut", Path.Combine(out4, "fast_b", "expected_out.hex")).ExitCode);
    }
}
