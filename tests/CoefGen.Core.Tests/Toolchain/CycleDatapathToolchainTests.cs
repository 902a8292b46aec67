using CoefGen.Core.Tests.Vectors;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// General cycles through emission, golden vectors and the reference datapath, which takes the coefficient index of
/// each cycle sample from the sample-index table: zero mismatches in GHDL, Icarus and the C reference, and a clean
/// Verilator -Wall lint. Covered: 64 repeated reads with one reset each (pole settling, 3072 coefficients) and
/// correlated multiple sampling (4 pairs); the up-the-ramp example adds shot noise to the vectors.
/// </summary>
public class CycleDatapathToolchainTests
{
    public static TheoryData<string, int, int> Cases => new()
    {
        { "cms_rows.toml", 200, 60 },
        { "skipper_reads.toml", 100, 6 },
        { "up_the_ramp.toml", 300, 100 },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void Cycle_datapath_matches_every_golden_output(string example, int icarusPixels, int ghdlPixels)
    {
        var r = ExampleDesigns.Load(Path.Combine("cycles", example));
        Assert.NotNull(r.Datapath.Windows);
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, r, icarusPixels);
        ReferenceBench.AssertPass(ReferenceBench.Icarus(dir, prefix), icarusPixels);
        ReferenceBench.AssertPass(ReferenceBench.C(dir, prefix), icarusPixels);
        ReferenceBench.AssertPass(ReferenceBench.Ghdl(dir, prefix, ghdlPixels), ghdlPixels);
    }

    [Fact]
    public void Cycle_datapath_lints_clean_under_verilator_Wall() =>
        ReferenceDatapathLintTests.AssertLintClean(ExampleDesigns.Load(Path.Combine("cycles", "skipper_reads.toml")));

    /// <summary>Negative control: one coefficient of the last read off by one fails every bench.</summary>
    [Fact]
    public void A_corrupted_coefficient_of_a_later_read_fails_every_bench()
    {
        var r = ExampleDesigns.Load(Path.Combine("cycles", "cms_rows.toml"));
        var coefs = r.Datapath.Coefficients.ToArray();
        coefs[^3] += 1;
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, r, 30, r.Datapath with { Coefficients = coefs });
        ReferenceBench.AssertFail(ReferenceBench.Icarus(dir, prefix));
        ReferenceBench.AssertFail(ReferenceBench.C(dir, prefix));
        ReferenceBench.AssertFail(ReferenceBench.Ghdl(dir, prefix, 30));
    }
}
