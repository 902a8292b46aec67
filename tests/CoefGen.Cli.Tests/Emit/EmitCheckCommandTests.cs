namespace CoefGen.Cli.Tests.Emit;

public class EmitCheckCommandTests
{
    private static (string Dir, string Readout) CopyExample(string name)
    {
        var dir = RepoPaths.TempDir();
        foreach (var f in Directory.GetFiles(Path.Combine(RepoPaths.Root, "examples")))
        {
            File.Copy(f, Path.Combine(dir, Path.GetFileName(f)));
        }

        return (dir, Path.Combine(dir, name));
    }

    [Theory]
    [InlineData("slowscan_spectro.toml", "red_ch0_coefs.h")]
    [InlineData("fast_imaging.toml", "tile7_v3_coefs.vh")]
    public void Check_passes_right_after_emit_and_fails_naming_a_file_changed_by_one_byte(string example, string file)
    {
        var (dir, readout) = CopyExample(example);
        var emit = CliRunner.Run("emit", readout);
        Assert.True(emit.ExitCode == 0, emit.Error);
        Assert.Equal(0, CliRunner.Run("check", readout).ExitCode);

        var path = Path.Combine(dir, file);
        var bytes = File.ReadAllBytes(path);
        bytes[bytes.Length / 2] ^= 0x01;
        File.WriteAllBytes(path, bytes);
        var check = CliRunner.Run("check", readout);
        Assert.Equal(1, check.ExitCode);
        Assert.Contains($"{file}: STALE", check.Output, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_fails_after_a_readout_change_that_alters_a_coefficient_and_names_missing_files()
    {
        var (dir, readout) = CopyExample("fast_imaging.toml");
        Assert.Equal(0, CliRunner.Run("emit", readout).ExitCode);
        var text = File.ReadAllText(readout);
        File.WriteAllText(readout, text.Replace("count = 28", "count = 27", StringComparison.Ordinal));
        var check = CliRunner.Run("check", readout);
        Assert.Equal(1, check.ExitCode);
        Assert.Contains("STALE", check.Output, StringComparison.Ordinal);

        File.Delete(Path.Combine(dir, "tile7_v3_coefs.vh"));
        Assert.Contains("tile7_v3_coefs.vh: MISSING", CliRunner.Run("check", readout).Output, StringComparison.Ordinal);
    }

    [Fact]
    public void Emit_is_byte_identical_across_runs_and_writes_nothing_when_a_template_fails()
    {
        var (dir, readout) = CopyExample("slowscan_spectro.toml");
        var outA = Path.Combine(dir, "a");
        var outB = Path.Combine(dir, "b");
        Assert.Equal(0, CliRunner.Run("emit", readout, "--out", outA, "--format", "c-header", "vhdl-package", "sv-package", "verilog-include").ExitCode);
        Assert.Equal(0, CliRunner.Run("emit", readout, "--out", outB, "--format", "c-header", "vhdl-package", "sv-package", "verilog-include").ExitCode);
        var names = Directory.GetFiles(outA).Select(Path.GetFileName).Order(StringComparer.Ordinal).ToArray();
        Assert.Equal(4, names.Length);
        foreach (var n in names)
        {
            Assert.Equal(File.ReadAllBytes(Path.Combine(outA, n!)), File.ReadAllBytes(Path.Combine(outB, n!)));
        }

        var evil = Path.Combine(dir, "evil.txt.scriban");
        File.WriteAllText(evil, "{{ date.now }}\n");
        var outC = Path.Combine(dir, "c");
        var r = CliRunner.Run("emit", readout, "--out", outC, "--format", "c-header", "--template", evil);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("evil.txt.scriban:1:", r.Error, StringComparison.Ordinal);
        Assert.False(Directory.Exists(outC) && Directory.EnumerateFileSystemEntries(outC).Any(), "a failed emit wrote files");
    }

    [Fact]
    public void An_output_path_escaping_the_output_folder_is_refused()
    {
        var (dir, readout) = CopyExample("fast_imaging.toml");
        var text = File.ReadAllText(readout).Replace("path = \"tile7_v3_coefs.vh\"", "path = \"../escaped.vh\"", StringComparison.Ordinal);
        File.WriteAllText(readout, text);
        var r = CliRunner.Run("emit", readout);
        Assert.Equal(2, r.ExitCode);
        Assert.False(File.Exists(Path.Combine(Path.GetDirectoryName(dir)!, "escaped.vh")));
        Assert.False(File.Exists(Path.Combine(dir, "tile7_v3_coefs_pkg.sv")), "nothing may be written when one entry is refused");
    }
}

public class UnsafeDesignTests
{
    internal static string UnsafeCopy()
    {
        var dir = RepoPaths.TempDir();
        // An 8-bit output cannot hold the +-2^13 ADU range of a 14-bit ADC: the width proof says NOT SAFE.
        var text = File.ReadAllText(RepoPaths.Example("fast_imaging.toml"))
            .Replace("accumulator = \"saturate\"", "accumulator = \"saturate\"\noutput_bits = 8", StringComparison.Ordinal);
        var path = Path.Combine(dir, "unsafe.toml");
        File.WriteAllText(path, text);
        return path;
    }

    [Fact]
    public void Emit_refuses_an_unsafe_design_and_writes_nothing_unless_allowed()
    {
        var path = UnsafeCopy();
        var dir = Path.GetDirectoryName(path)!;
        var design = CliRunner.Run("design", path);
        Assert.Equal(0, design.ExitCode);
        Assert.Contains("NOT SAFE", design.Output, StringComparison.Ordinal);

        var refused = CliRunner.Run("emit", path);
        Assert.Equal(2, refused.ExitCode);
        Assert.Contains("CG2020", refused.Error, StringComparison.Ordinal);
        Assert.Contains("output needs", refused.Error, StringComparison.Ordinal);
        Assert.DoesNotContain(Directory.GetFiles(dir), f => !f.EndsWith(".toml", StringComparison.Ordinal));

        var allowed = CliRunner.Run("emit", path, "--allow-unsafe");
        Assert.Equal(0, allowed.ExitCode);
        Assert.Contains("warning CG2020", allowed.Error, StringComparison.Ordinal);
        Assert.True(File.Exists(Path.Combine(dir, "tile7_v3_coefs.vh")));
    }

    [Fact]
    public void Vectors_of_an_unsafe_design_are_written_with_a_warning()
    {
        var path = UnsafeCopy();
        var outDir = Path.Combine(Path.GetDirectoryName(path)!, "vec");
        var r = CliRunner.Run("vectors", path, "--out", outDir, "--pixels", "20", "--no-rtl");
        Assert.Equal(0, r.ExitCode);
        Assert.Contains("warning CG2020", r.Error, StringComparison.Ordinal);
        Assert.True(File.Exists(Path.Combine(outDir, "manifest.json")));
    }
}
