using static CoefGen.Core.Tests.Readout.ReadoutFixture;

namespace CoefGen.Core.Tests.Readout;

public class SeveralProblemsTests
{
    [Fact]
    public void File_with_several_problems_reports_every_one()
    {
        var toml = Minimal
            .Replace("name = \"spec_ch0\"", "name = \"0bad\"", StringComparison.Ordinal)
            .Replace("bits = 16", "bits = 16.0\nfull_scale = 2", StringComparison.Ordinal)
            .Replace("gain = 2.0", "gain = 0", StringComparison.Ordinal)
            .Replace("start = 220\ncount = 160", "start = 100\ncount = 160", StringComparison.Ordinal)
            .Replace("low_cutoff_hz = 0.1", "low_cutoff_hz = 0.1\nat = \"nowhere\"", StringComparison.Ordinal)
            + "\n[[emit]]\ntemplate = \"c-header\"\n";
        var result = Load(toml);
        Assert.Null(result.Description);
        var found = result.Diagnostics.Select(d => (d.Code, d.Key, d.Location.Line)).ToList();
        Assert.Equal(
            [
                ("CG1008", "name", 1),
                ("CG1001", "adc.full_scale", LineOf(toml, "full_scale = 2")),
                ("CG1003", "adc.bits", LineOf(toml, "bits = 16.0")),
                ("CG1004", "sensor.gain", LineOf(toml, "gain = 0")),
                ("CG1005", "noise.source[0].at", LineOf(toml, "at = \"nowhere\"")),
                ("CG1202", "timing.signal.start", LineOf(toml, "start = 100")),
                ("CG1002", "emit[0].path", LineOf(toml, "[[emit]]")),
            ],
            found);
    }
}
