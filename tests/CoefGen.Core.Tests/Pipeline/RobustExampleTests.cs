using CoefGen.Core.Readout;
using CoefGen.Core.Tests.Toolchain;
using CoefGen.Core.Tests.Vectors;
using CoefGen.Core.Vectors;

namespace CoefGen.Core.Tests.Pipeline;

/// <summary>The shipped robust example: the 1/f corner of the output amplifier between 20 and 200 kHz.</summary>
public class RobustExampleTests
{
    private const string Example = "slowscan_robust.toml";

    [Fact]
    public void The_robust_table_has_no_larger_worst_regret_than_the_nominal_optimum()
    {
        // Minimax regret (definition): no weights have a smaller worst ratio, the nominal optimum included.
        var r = ExampleDesigns.Load(Example);
        var t = r.Regret!;
        Assert.Equal(4, t.Scenarios.Count);
        Assert.Equal("noise.source[0].flicker_corner_hz", t.VariedKey);
        Assert.Equal([60e3, 20e3, Math.Sqrt(20e3 * 200e3), 200e3], t.VariedValues!);
        var optimal = t.Rows.Single(x => x.Scheme == WeightScheme.Optimal);
        var robust = t.Rows.Single(x => x.Scheme == WeightScheme.Robust);
        Assert.True(robust.WorstRatio <= optimal.WorstRatio, $"robust {robust.WorstRatio:R} vs optimal {optimal.WorstRatio:R}");
        Assert.True(t.Rows.All(x => x.Ratio.All(q => q >= 1 - 1e-9)), "no scheme beats a scenario's own optimum");
        Assert.True(t.Robust.RelativeGap < 1e-6, $"gap {t.Robust.RelativeGap}");
        Assert.Equal(WeightScheme.Robust, r.Chosen.Scheme);
    }

    /// <summary>
    /// One scenario on a ramp with photon and dark shot noise: the minimax is the plain optimum (definition) of the
    /// covariance the design uses, shot term included; without it the robust weights would be the read-noise optimum.
    /// </summary>
    [Fact]
    public void Robust_weights_of_a_ramp_see_its_shot_noise()
    {
        var name = Path.Combine("cycles", "up_the_ramp.toml");
        var text = File.ReadAllText(ExampleDesigns.ExamplePath(name));
        var optimal = ExampleDesigns.Load(name);
        Assert.NotNull(optimal.Covariance.Shot);
        Assert.DoesNotContain("[weights]", text, StringComparison.Ordinal); // the example takes the default scheme (optimal)
        var robust = ExampleDesigns.FromText(text + "\n[weights]\nscheme = \"robust\"\n\n[scenarios]\n", "ramp_nominal_only.toml");
        var h = robust.Chosen.H;
        var reference = optimal.Weights.Single(w => w.Scheme == WeightScheme.Optimal).H;
        Assert.Equal(WeightScheme.Robust, robust.Chosen.Scheme);
        Assert.True(h.Zip(reference, (a, b) => Math.Abs(a - b)).Max() <= 1e-9 * reference.Max(Math.Abs));
    }

    [Fact]
    public void With_the_nominal_noise_as_the_only_scenario_the_robust_design_is_the_optimal_design()
    {
        // One scenario: the minimax is the plain optimum (definition), so the integer tables are the optimal ones too.
        var text = File.ReadAllText(ExampleDesigns.ExamplePath("slowscan_spectro.toml"));
        var optimal = ExampleDesigns.Load("slowscan_spectro.toml");
        var robust = ExampleDesigns.FromText(text.Replace("scheme = \"optimal\"", "scheme = \"robust\"", StringComparison.Ordinal) + "\n[scenarios]\n", "nominal_only.toml");
        var h = robust.Chosen.H;
        var reference = optimal.Chosen.H;
        Assert.Equal(WeightScheme.Robust, robust.Chosen.Scheme);
        Assert.True(h.Zip(reference, (a, b) => Math.Abs(a - b)).Max() <= 1e-9 * reference.Max(Math.Abs));
        Assert.Equal(optimal.Datapath.Coefficients, robust.Datapath.Coefficients);
        Assert.Equal(0, robust.Regret!.Robust.RelativeGap);
    }

    [Fact]
    public void Vectors_of_the_robust_design_match_the_bit_exact_model_with_no_mismatch()
    {
        var r = ExampleDesigns.Load(Example);
        Assert.True(r.Datapath.Proof.Safe);
        // The golden outputs (BitExactModel) against the independent big-integer reference of the arithmetic,
        // through the same comparison `verify` runs on a DUT dump.
        var set = GoldenVectorGenerator.Generate(r, new VectorOptions(200, 7));
        var reference = set.Pixels.Select(p => (long)ReferenceArithmetic.Apply(set.Design, p.Codes)).ToArray();
        var mismatches = OutputComparison.Compare(set.Pixels.Select(p => p.Expected.Output).ToArray(), reference);
        Assert.Empty(mismatches.Mismatches);
        Assert.Equal(200, mismatches.Compared);
    }

    [Fact]
    public void The_reference_datapath_in_Icarus_and_the_C_reference_match_the_robust_golden_outputs()
    {
        using var dir = new TempDir();
        var prefix = ReferenceBench.Write(dir, ExampleDesigns.Load(Example), 300);
        ReferenceBench.AssertPass(ReferenceBench.Icarus(dir, prefix), 300);
        ReferenceBench.AssertPass(ReferenceBench.C(dir, prefix), 300);
    }
}
