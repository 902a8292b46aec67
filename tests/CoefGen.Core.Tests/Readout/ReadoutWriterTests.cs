using CoefGen.Core.Readout;
using static CoefGen.Core.Tests.Readout.ReadoutFixture;

namespace CoefGen.Core.Tests.Readout;

public class ReadoutWriterTests
{
    [Fact]
    public void Canonical_file_gives_timing_in_samples_with_the_shortest_transfer_sample()
    {
        var toml = Minimal
            .Replace("pixel_samples = 400", "pixel_ns = \"20 us\"", StringComparison.Ordinal)
            .Replace("start = 20\ncount = 160", "start_ns = 1010\ncount = 160", StringComparison.Ordinal);
        var description = Load(toml).Description!;
        var written = ReadoutWriter.ToToml(description);
        Assert.Contains("pixel_samples = 400\n", written, StringComparison.Ordinal);
        Assert.Contains("transfer_sample = 200\n", written, StringComparison.Ordinal); // 200 / 20e6 divides back exactly
        Assert.Contains("[timing.reset]\nstart = 20\ncount = 160\n", written, StringComparison.Ordinal);
        Assert.DoesNotContain("_ns", written, StringComparison.Ordinal);
        var reloaded = Load(written).Description!;
        Assert.Empty(reloaded.Timing.Rounding);
        DescriptionAssert.Equivalent(description with { Timing = description.Timing with { Rounding = [] } }, reloaded);
    }

    [Fact]
    public void Strings_are_escaped_so_they_load_back_unchanged()
    {
        var description = Load(Minimal + "\n[[emit]]\ntemplate = 'a\\b \"c\"'\npath = \"x\\ty.h\"\n").Description!;
        var reloaded = Load(ReadoutWriter.ToToml(description)).Description!;
        Assert.Equal([new EmitSpec("a\\b \"c\"", "x\ty.h")], reloaded.Emit);
    }

    [Fact]
    public void Psd_csv_holds_amplitude_densities_in_nanovolts()
    {
        var csv = ReadoutWriter.ToPsdCsv(new PsdTable("t.csv", [0.0, 1000], [25e-18, 4e-18]));
        Assert.Equal("frequency_hz, density_nv_per_rthz\n0, 5\n1000, 2\n", csv);
    }
}
