using System.Text.Json;

namespace CoefGen.Cli.Tests.Instrument;

/// <summary>`sweep INSTRUMENT --vary ...`: every table swept, printed and written per table, deterministic.</summary>
public class InstrumentSweepCommandTests
{
    /// <summary>The example instrument reduced to three tables, to keep the suite lean.</summary>
    private static string ThreeTables()
    {
        var dir = InstrumentCommandTests.CopyExample();
        var instrument = Path.Combine(dir, "cam4.toml");
        File.WriteAllText(instrument, File.ReadAllText(instrument).Replace("base = \"cam4_base.toml\"", "base = \"cam4_base.toml\"\ntables = [\"slow/a\", \"binned/c\", \"fast/d\"]", StringComparison.Ordinal));
        return instrument;
    }

    [Fact]
    public void Text_csv_and_json_hold_every_table_in_table_order_and_are_the_same_bytes_on_a_second_run()
    {
        var instrument = ThreeTables();
        var csv = Path.Combine(Path.GetDirectoryName(instrument)!, "s.csv");
        var r = CliRunner.Run("sweep", instrument, "--vary", "timing.signal.count_ns=300,325", "--csv", csv);
        Assert.True(r.ExitCode == 0, r.Error);
        Assert.Equal(["table slow/a", "table binned/c", "table fast/d"], r.Output.Split('\n').Where(l => l.StartsWith("table ", StringComparison.Ordinal)).ToArray());
        var rows = File.ReadAllLines(csv);
        Assert.StartsWith("table,point,timing.signal.count_ns,", rows[0], StringComparison.Ordinal);
        Assert.Equal(["slow/a", "slow/a", "binned/c", "binned/c", "fast/d", "fast/d"], rows.Skip(1).Select(l => l.Split(',')[0]).ToArray());
        var first = File.ReadAllBytes(csv);
        var again = CliRunner.Run("sweep", instrument, "--vary", "timing.signal.count_ns=300,325", "--csv", csv);
        Assert.Equal(r.Output, again.Output);
        Assert.Equal(first, File.ReadAllBytes(csv));

        var j = CliRunner.Run("sweep", instrument, "--vary", "timing.signal.count_ns=300,325", "--json");
        Assert.True(j.ExitCode == 0, j.Error);
        using var doc = JsonDocument.Parse(j.Output);
        Assert.Equal("coefgen.instrument-sweep/1", doc.RootElement.GetProperty("schema").GetString());
        var tables = doc.RootElement.GetProperty("tables");
        Assert.Equal(["slow/a", "binned/c", "fast/d"], tables.EnumerateArray().Select(t => t.GetProperty("table").GetString()).ToArray());

        // Each table's sweep is the sweep of that table: the JSON's noise equals the CSV row of the same table and point.
        var fastD = tables[2].GetProperty("sweep").GetProperty("points")[1].GetProperty("schemes")[0].GetProperty("noise_e_rms").GetDouble();
        Assert.Equal(fastD.ToString("R", System.Globalization.CultureInfo.InvariantCulture), rows[6].Split(',')[3]);
        Assert.NotEqual(rows[2].Split(',')[3], rows[6].Split(',')[3]);
    }

    [Fact]
    public void An_unknown_key_a_search_option_or_a_bad_instrument_is_a_located_error_exit_2_and_writes_nothing()
    {
        var instrument = ThreeTables();
        var csv = Path.Combine(Path.GetDirectoryName(instrument)!, "s.csv");
        var unknown = CliRunner.Run("sweep", instrument, "--vary", "sensor.gian=2", "--csv", csv);
        Assert.Equal(2, unknown.ExitCode);
        Assert.Contains("--vary: error CG6011", unknown.Error, StringComparison.Ordinal);
        Assert.Contains("did you mean 'gain'", unknown.Error, StringComparison.Ordinal);
        Assert.False(File.Exists(csv));

        var search = CliRunner.Run("sweep", instrument, "--target-noise-e", "1");
        Assert.Equal(2, search.ExitCode);
        Assert.Contains("--target-noise-e: error CG0010", search.Error, StringComparison.Ordinal);

        File.WriteAllText(instrument, File.ReadAllText(instrument).Replace("\"fast/d\"]", "\"fats/d\"]", StringComparison.Ordinal));
        var typo = CliRunner.Run("sweep", instrument, "--vary", "sensor.gain=2", "--csv", csv);
        Assert.Equal(2, typo.ExitCode);
        Assert.Matches(@"cam4\.toml:\d+:\d+: error CG", typo.Error);
        Assert.False(File.Exists(csv));
    }
}
