using CoefGen.Cli.Diagnostics;

namespace CoefGen.Cli.Tests.BadInput;

/// <summary>The all-or-nothing writer's good paths and the exit-code policy's edges (the corpus covers the refusals).</summary>
public class OutputPolicyTests
{
    [Fact]
    public void A_file_whose_bytes_do_not_change_keeps_its_modification_time_and_a_changed_one_is_replaced()
    {
        using var s = new Sandbox();
        Assert.Equal(0, CliRunner.Run("emit", s.Fast).ExitCode);
        var same = s.Path("tile7_v3_coefs.vh");
        var changed = s.Path("tile7_v3_coefs_pkg.sv");
        var old = new DateTime(2001, 2, 3, 4, 5, 6, DateTimeKind.Utc);
        File.SetLastWriteTimeUtc(same, old);
        File.AppendAllText(changed, "// edited by hand\n");
        File.SetLastWriteTimeUtc(changed, old);

        var r = CliRunner.Run("emit", s.Fast);
        Assert.True(r.ExitCode == 0, r.Error);
        Assert.Contains(r.Output.Split('\n'), l => l.StartsWith("unchanged ", StringComparison.Ordinal) && l.EndsWith("tile7_v3_coefs.vh", StringComparison.Ordinal));
        Assert.Contains(r.Output.Split('\n'), l => l.StartsWith("wrote ", StringComparison.Ordinal) && l.EndsWith("tile7_v3_coefs_pkg.sv", StringComparison.Ordinal));
        Assert.Equal(old, File.GetLastWriteTimeUtc(same));
        Assert.NotEqual(old, File.GetLastWriteTimeUtc(changed));
        Assert.DoesNotContain("edited by hand", File.ReadAllText(changed), StringComparison.Ordinal);
        Assert.DoesNotContain(Directory.EnumerateFileSystemEntries(s.Root), e => Path.GetFileName(e).StartsWith(".coefgen-stage-", StringComparison.Ordinal));
    }

    [Fact]
    public void A_new_nested_output_folder_appears_whole_and_a_link_that_stays_inside_is_written_through()
    {
        using var s = new Sandbox();
        var deep = s.Path("build/gen/rtl");
        var r = CliRunner.Run("vectors", s.Fast, "--out", deep, "--pixels", "20", "--no-rtl");
        Assert.True(r.ExitCode == 0, r.Error);
        Assert.True(File.Exists(Path.Combine(deep, "manifest.json")));
        Assert.DoesNotContain(Directory.EnumerateFileSystemEntries(s.Path("build/gen")), e => Path.GetFileName(e).StartsWith(".coefgen-stage-", StringComparison.Ordinal));

        s.Dir("real");
        s.Link("tile7_v3_coefs.vh", s.Path("real/coefs.vh"));
        Assert.Equal(0, CliRunner.Run("emit", s.Fast).ExitCode);
        Assert.NotNull(new FileInfo(s.Path("tile7_v3_coefs.vh")).LinkTarget);
        Assert.Contains("localparam", File.ReadAllText(s.Path("real/coefs.vh")), StringComparison.Ordinal);
    }

    [Fact]
    [System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
    public void A_read_only_output_folder_is_CG0031_and_stays_empty()
    {
        using var s = new Sandbox();
        var ro = s.Dir("ro");
        File.SetUnixFileMode(ro, UnixFileMode.UserRead | UnixFileMode.UserExecute);
        try
        {
            var probe = Path.Combine(ro, "probe");
            try
            {
                File.WriteAllText(probe, "");
                File.Delete(probe);
                Assert.Skip("this user writes into read-only folders (root); the unwritable /proc cases of the corpus cover CG0031");
            }
            catch (UnauthorizedAccessException)
            {
            }

            var r = CliRunner.Run("emit", s.Fast, "--out", ro, "-f", "c-header");
            Assert.Equal(2, r.ExitCode);
            Assert.StartsWith($"--out: error {CliCodes.OutputNotWritable}:", r.Error, StringComparison.Ordinal);
            Assert.Empty(Directory.EnumerateFileSystemEntries(ro));
        }
        finally
        {
            File.SetUnixFileMode(ro, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.UserExecute);
        }
    }

    [Fact]
    public void A_mistyped_command_or_option_suggests_the_right_one_in_one_line_without_the_help_text()
    {
        var r = CliRunner.Run("desgin", "x.toml");
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("did you mean 'design'?", r.Error, StringComparison.Ordinal);
        Assert.Contains("Run `coefgen --help`", r.Error, StringComparison.Ordinal);
        Assert.True(r.Error.Split('\n', StringSplitOptions.RemoveEmptyEntries).Length <= 3, r.Error);

        var o = CliRunner.Run("design", RepoPaths.Example("fast_imaging.toml"), "--jsn");
        Assert.Equal(2, o.ExitCode);
        Assert.Contains("did you mean '--json'?", o.Error, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData("Cannot parse argument 'x' for option '--seed' as expected type 'System.UInt64'.", "'x' is not an unsigned integer")]
    [InlineData("Cannot parse argument '1.5' for option '--pixels' as expected type 'System.Int32'.", "'1.5' is not an integer")]
    [InlineData("Cannot parse argument 'q' for option '--target-noise-e' as expected type 'System.Nullable`1[System.Double]'.", "'q' is not a number")]
    [InlineData("Argument 'z' not recognized. Must be one of:\n\t'auto'\n\t'hex'", "Argument 'z' not recognized. Must be one of: 'auto' 'hex'")]
    public void Parser_messages_lose_their_type_names(string message, string plain) =>
        Assert.Equal(plain, CommandLineErrors.Plain(message));

    [Fact]
    public void An_unexpected_exception_is_one_CG9000_line_with_exit_3_and_a_trace_only_with_debug()
    {
        using var quiet = new StringWriter();
        Assert.Equal(ExitCodes.Internal, LastResort.Report(new InvalidOperationException("the impossible happened"), debug: false, quiet));
        var line = quiet.ToString();
        Assert.StartsWith($"coefgen: error {CliCodes.Internal}: internal error: the impossible happened", line, StringComparison.Ordinal);
        Assert.Single(line.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.DoesNotContain("Exception", line, StringComparison.Ordinal);

        using var loud = new StringWriter();
        try
        {
            throw new InvalidOperationException("with a trace");
        }
        catch (InvalidOperationException ex)
        {
            Assert.Equal(ExitCodes.Internal, LastResort.Report(ex, debug: true, loud));
        }

        Assert.Contains("   at ", loud.ToString(), StringComparison.Ordinal);
        using var io = new StringWriter();
        Assert.Equal(ExitCodes.BadInput, LastResort.Report(new IOException("disk full"), debug: false, io));
        Assert.Contains($"error {CliCodes.FileSystem}:", io.ToString(), StringComparison.Ordinal);
    }
}
