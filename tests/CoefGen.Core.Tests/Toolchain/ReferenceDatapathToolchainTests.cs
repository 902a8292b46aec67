using CoefGen.Core.Tests.Vectors;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// The reference datapath simulates against emitted golden vectors with zero mismatches: GHDL on 100 pixels
/// (numeric_std costs ~23 us per MAC), Icarus on 1000, and the C reference on all of them. Covered: two's
/// complement + wrap + half-up (slowscan), offset binary + saturate + half-even (fast imaging), and a
/// post-multiplier with truncation (fast imaging with normalize = "exact").
/// </summary>
public class ReferenceDatapathToolchainTests
{
    private const int IcarusPixels = 1000;
    private const int GhdlPixels = 100;

    public static TheoryData<string> Examples => ["slowscan_spectro.toml", "fast_imaging.toml"];

    [Theory]
    [MemberData(nameof(Examples))]
    public void Vhdl_datapath_matches_every_golden_output_in_GHDL(string example)
    {
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, ExampleDesigns.Load(example), GhdlPixels);
        ReferenceBench.AssertPass(ReferenceBench.Ghdl(dir, prefix, GhdlPixels), GhdlPixels);
    }

    [Theory]
    [MemberData(nameof(Examples))]
    public void Verilog_datapath_and_C_reference_match_every_golden_output(string example)
    {
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, ExampleDesigns.Load(example), IcarusPixels);
        ReferenceBench.AssertPass(ReferenceBench.Icarus(dir, prefix), IcarusPixels);
        ReferenceBench.AssertPass(ReferenceBench.C(dir, prefix), IcarusPixels);
    }

    [Fact]
    public void Post_multiplier_and_truncation_match_in_Icarus_and_GHDL()
    {
        var r = PostMultiplierExample.FastExactTruncate();
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, r, 300);
        ReferenceBench.AssertPass(ReferenceBench.Icarus(dir, prefix), 300);
        ReferenceBench.AssertPass(ReferenceBench.Ghdl(dir, prefix, 30), 30);
    }

    /// <summary>Negative control: one coefficient off by one in the emitted tables, vectors from the true design.</summary>
    [Fact]
    public void A_corrupted_coefficient_fails_every_bench()
    {
        var r = ExampleDesigns.Load("slowscan_spectro.toml");
        var coefs = r.Datapath.Coefficients.ToArray();
        coefs[40] += 1;
        var tampered = r.Datapath with { Coefficients = coefs };
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, r, 40, tampered);
        ReferenceBench.AssertFail(ReferenceBench.Ghdl(dir, prefix, 40));
        ReferenceBench.AssertFail(ReferenceBench.Icarus(dir, prefix));
        ReferenceBench.AssertFail(ReferenceBench.C(dir, prefix));
    }
}
