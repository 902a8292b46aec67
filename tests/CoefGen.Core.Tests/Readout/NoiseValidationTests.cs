using CoefGen.Core.Diagnostics;
using static CoefGen.Core.Tests.Readout.ReadoutFixture;

namespace CoefGen.Core.Tests.Readout;

public class NoiseValidationTests
{
    private const string Pole = "front_end_pole_hz = \"2 MHz\"";

    private static string WithTable(string path = "spectrum.csv") => With(Pole, Pole + $"\npsd_table = \"{path}\"");

    private static Dictionary<string, string> Csv(string content) => new() { ["spectrum.csv"] = content };

    [Fact]
    public void Missing_table_file_is_reported_at_the_psd_table_value()
    {
        var toml = WithTable("nowhere.csv");
        var d = AssertOnly(Load(toml), "CG1301", "noise.psd_table", LineOf(toml, "psd_table"));
        Assert.Equal(13, d.Location.Column);
        Assert.Contains(Path.Combine("cfg", "nowhere.csv"), d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Unparsable_csv_line_is_reported_in_the_csv_file()
    {
        var d = AssertOnly(Load(WithTable(), Csv("frequency_hz, density\n0, 5\n10, five\n20, 3\n")), "CG1302", "noise.psd_table", 3);
        Assert.Equal(Path.Combine("cfg", "spectrum.csv"), d.Location.File);
    }

    [Fact]
    public void Csv_row_with_three_fields_is_unparsable()
    {
        var d = AssertOnly(Load(WithTable(), Csv("# comment\n0, 5\n10, 4, 1\n")), "CG1302", "noise.psd_table", 3);
        Assert.Equal(Path.Combine("cfg", "spectrum.csv"), d.Location.File);
    }

    [Fact]
    public void Frequencies_that_do_not_increase_are_reported_at_their_row()
    {
        var d = AssertOnly(Load(WithTable(), Csv("0, 5\n\n10, 4\n10, 3\n")), "CG1303", "noise.psd_table", 4);
        Assert.Equal(Path.Combine("cfg", "spectrum.csv"), d.Location.File);
    }

    [Fact]
    public void Negative_density_is_reported_at_its_row()
    {
        AssertOnly(Load(WithTable(), Csv("0, 5\n10, -4\n")), "CG1304", "noise.psd_table", 2);
    }

    [Fact]
    public void Table_with_one_point_is_too_short()
    {
        var toml = WithTable();
        var d = AssertOnly(Load(toml, Csv("f, d\n# only one\n0, 5\n")), "CG1305", "noise.psd_table", LineOf(toml, "psd_table"));
        Assert.Equal(SourcePath, d.Location.File);
    }

    [Fact]
    public void Adc_referred_table_is_not_scaled_by_the_gain()
    {
        var toml = With(Pole, Pole + "\npsd_table = \"spectrum.csv\"\npsd_at = \"adc\"");
        var table = Load(toml, Csv("0, 5\n1e3, 4\n")).Description!.Noise.Table!;
        Assert.Equal([25e-18, 16e-18], table.DensityV2PerHz.Select(v => Math.Round(v * 1e18, 12) / 1e18));
    }

    [Fact]
    public void No_source_and_no_table_is_reported_at_the_noise_section()
    {
        var toml = Minimal[..Minimal.IndexOf("[[noise.source]]", StringComparison.Ordinal)];
        AssertOnly(Load(toml), "CG1306", "noise", LineOf(toml, "[noise]"));
    }

    [Fact]
    public void No_noise_section_at_all_is_reported_against_the_file()
    {
        var toml = Minimal[..Minimal.IndexOf("[noise]", StringComparison.Ordinal)];
        AssertOnly(Load(toml), "CG1306", "noise", 0);
    }

    [Fact]
    public void Table_alone_is_enough_noise()
    {
        var toml = Minimal[..Minimal.IndexOf("[[noise.source]]", StringComparison.Ordinal)] + "psd_table = \"spectrum.csv\"\n";
        toml = toml.Replace("[noise]\n" + Pole + "\n\n", "[noise]\n" + Pole + "\n", StringComparison.Ordinal);
        var result = Load(toml, Csv("0, 5\n1e3, 4\n"));
        Assert.Empty(result.Diagnostics);
        Assert.Empty(result.Description!.Noise.Sources);
    }

    [Fact]
    public void Source_without_pole_or_bandwidth_has_unbounded_variance()
    {
        var toml = With(Pole + "\n", "");
        AssertOnly(Load(toml), "CG1307", "noise.source[0]", LineOf(toml, "[[noise.source]]"));
    }

    [Fact]
    public void Low_cutoff_at_or_above_the_corner_warns_but_loads()
    {
        var toml = With("low_cutoff_hz = 0.1", "low_cutoff_hz = \"30 kHz\"");
        var result = Load(toml);
        Assert.NotNull(result.Description);
        var d = Assert.Single(result.Diagnostics);
        Assert.Equal(("CG1308", Severity.Warning, "noise.source[0].low_cutoff_hz"), (d.Code, d.Severity, d.Key));
        Assert.Equal(LineOf(toml, "low_cutoff_hz"), d.Location.Line);
    }

    [Fact]
    public void Source_without_white_density_is_missing_a_key()
    {
        var toml = With("white_nv_per_rthz = 6.0\n", "");
        AssertOnly(Load(toml), "CG1002", "noise.source[0].white_nv_per_rthz", LineOf(toml, "[[noise.source]]"));
    }
}
