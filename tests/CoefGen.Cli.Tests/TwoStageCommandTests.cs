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

    [Fact]
    public void Diff_of_a_two_stage_file_is_a_located_error()
    {
        var path = TwoStageSkipper();
        var r = CliRunner.Run("diff", path, path);
        Assert.Equal(2, r.ExitCode);
        Assert.Contains("error CG1274: weights.form", r.Error, StringComparison.Ordinal);
    }
}
