using CoefGen.Core.Diagnostics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.FixedPoint.TwoStage;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;
using CoefGen.Core.Tests.Vectors;
using CoefGen.Core.Weights.TwoStage;
using static CoefGen.Core.Tests.Readout.ReadoutFixture;

namespace CoefGen.Core.Tests.Cycle;

/// <summary>[weights] form = "two-stage": the key's rules and the pipeline stage that makes the two-stage form the datapath.</summary>
public class TwoStageFormTests
{
    private const string TwoStageKey = "[weights]\nscheme = \"optimal\"\nform = \"two-stage\"\n";

    private static string Skipper(string edit = TwoStageKey) =>
        File.ReadAllText(ExampleDesigns.ExamplePath(Path.Combine("cycles", "skipper_reads.toml"))).Replace("[weights]\nscheme = \"optimal\"\n", edit, StringComparison.Ordinal);

    private static InputException Refused(string toml)
    {
        var load = Load(toml);
        Assert.True(load.Description is not null, string.Join("\n", load.Diagnostics));
        return Assert.Throws<InputException>(() => DesignPipeline.Run(load.Description!, Pipeline.ShippedExamples.Catalog));
    }

    [Fact]
    public void Form_defaults_to_full_and_reads_two_stage()
    {
        Assert.Equal(WeightsForm.Full, Load(CycleFiles.RepeatedReads).Description!.Weights.Form);
        var load = Load(Skipper());
        Assert.Empty(load.Diagnostics);
        Assert.Equal(WeightsForm.TwoStage, load.Description!.Weights.Form);

        // The canonical writer keeps the key (and writes nothing new for form = "full", so existing canonical text is unchanged).
        var written = ReadoutWriter.ToToml(load.Description);
        Assert.Contains("form = \"two-stage\"", written, StringComparison.Ordinal);
        Assert.DoesNotContain("form =", ReadoutWriter.ToToml(Load(CycleFiles.RepeatedReads).Description!), StringComparison.Ordinal);
    }

    [Fact]
    public void Unknown_form_lists_the_allowed_words()
    {
        var toml = Skipper("[weights]\nscheme = \"optimal\"\nform = \"twostage\"\n");
        var d = Load(toml).Diagnostics.Single(x => x.Severity == Severity.Error);
        Assert.Equal("weights.form", d.Key);
        Assert.Contains("two-stage", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Two_stage_on_a_classic_file_or_with_drift_rejection_or_another_scheme_is_a_located_error()
    {
        var classic = Minimal + "\n[weights]\nform = \"two-stage\"\n";
        AssertOnly(Load(classic), TwoStageCodes.NotIdenticalReads, "weights.form", LineOf(classic, "form ="));

        var drift = Skipper(TwoStageKey + "reject_drift = true\n");
        AssertOnly(Load(drift), TwoStageCodes.WithDriftRejection, "weights.form", LineOf(drift, "form ="));

        var boxcar = Skipper("[weights]\nscheme = \"boxcar\"\nform = \"two-stage\"\n");
        var e = AssertOnly(Load(boxcar), TwoStageCodes.SchemeNotOptimal, "weights.form", LineOf(boxcar, "form ="));
        Assert.Contains("scheme = \"optimal\"", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Two_stage_on_reads_that_are_not_identical_or_with_shot_noise_is_refused_by_the_pipeline()
    {
        // A window of its own reset group outside the repetition (after the 8 reads) breaks the identical-read layout.
        var extra = CycleFiles.RepeatedReads.Replace("[timing.repeat]", "[[timing.window]]\nname = \"tail\"\nstart = 396\ncount = 4\nsees = \"reset\"\ngroup = 1\n\n[timing.repeat]", StringComparison.Ordinal)
            + "\n[weights]\nform = \"two-stage\"\n";
        var ex = Refused(extra);
        var d = Assert.Single(ex.Diagnostics);
        Assert.Equal(TwoStageCodes.NotIdenticalReads, d.Code);
        Assert.Equal("weights.form", d.Key);
        Assert.Equal(LineOf(extra, "form ="), d.Location.Line);

        // Up the ramp with 2 samples per read and shot noise: identical positions, but the noise grows from read to read.
        var ramp = CycleFiles.Ramp.Replace("count = 1", "count = 2", StringComparison.Ordinal) + "\n[weights]\nform = \"two-stage\"\n";
        d = Assert.Single(Refused(ramp).Diagnostics);
        Assert.Equal(TwoStageCodes.WithShotNoise, d.Code);
        Assert.Equal("weights.form", d.Key);
    }

    [Fact]
    public void Pipeline_makes_the_two_stage_form_the_datapath_and_does_not_quantise_the_full_table()
    {
        var two = ExampleDesigns.FromText(Skipper(), "skipper_two_stage.toml");
        Assert.True(two.IsTwoStage);
        Assert.False(two.HasFullDatapath);
        Assert.Throws<InvalidOperationException>(() => two.Datapath);
        var ts = two.TwoStage!;
        Assert.Same(ts.Quantised.Proof, two.Proof);
        Assert.True(two.Proof.Safe);
        Assert.Equal(64, ts.Layout.Reads);
        Assert.Equal(48, ts.Quantised.Table.Count);

        // The stage computes exactly what the designers give when called directly, and form = "full" shows the same form.
        var real = TwoStageWeights.Design(two.Grid, two.Covariance, rejectDrift: false)!;
        var direct = TwoStageIntegerDesigner.Design(two.Grid, two.Covariance, real, two.Description.Adc, two.FixedPointSettings);
        Assert.Equal(direct.Table, ts.Quantised.Table);
        Assert.Equal(direct.ReadWeights, ts.Quantised.ReadWeights);
        var full = ExampleDesigns.Load(Path.Combine("cycles", "skipper_reads.toml"));
        Assert.True(full.HasFullDatapath);
        Assert.False(full.IsTwoStage);
        Assert.Equal(ts.Quantised.Table, full.TwoStage!.Quantised.Table);
        Assert.Same(full.Datapath.Proof, full.Proof);
    }

    [Fact]
    public void Too_many_coefficients_for_a_full_table_suggests_the_two_stage_form_and_two_stage_designs_it()
    {
        // 100 reads of 48 samples: 4800 coefficients, more than the 4096 of the default target; 48 and 100 fit.
        var many = Skipper().Replace("times = 64", "times = 100", StringComparison.Ordinal).Replace("pixel_samples = 4200", "pixel_samples = 6500", StringComparison.Ordinal);
        var fullFile = many.Replace("form = \"two-stage\"\n", "", StringComparison.Ordinal);
        var load = Load(fullFile);
        var resolution = FixedPointSettingsResolver.Resolve(load.Description!, Pipeline.ShippedExamples.Catalog);
        var d = resolution.Diagnostics.Single(x => x.Code == FixedPointCodes.TooManyCoefficients);
        Assert.Contains("form = \"two-stage\": its per-read table of 48 coefficients and 100 read weights fit", d.Message, StringComparison.Ordinal);

        var r = ExampleDesigns.FromText(many, "skipper_100.toml");
        Assert.False(r.HasFullDatapath);
        Assert.Equal(100, r.TwoStage!.Quantised.ReadWeights.Count);
        Assert.True(r.Proof.Safe);
    }

    [Fact]
    public void Two_stage_tables_that_do_not_fit_the_target_are_CG2005_at_the_form_key()
    {
        // 5000 reads: the read-weight table alone is longer than the 4096 entries of the default target.
        var toml = Skipper().Replace("times = 64", "times = 5000", StringComparison.Ordinal).Replace("pixel_samples = 4200", "pixel_samples = 320100", StringComparison.Ordinal);
        var load = Load(toml);
        Assert.True(load.Description is not null, string.Join("\n", load.Diagnostics));
        var d = FixedPointSettingsResolver.Resolve(load.Description!, Pipeline.ShippedExamples.Catalog).Diagnostics.Single(x => x.Code == FixedPointCodes.TooManyCoefficients);
        Assert.Equal("weights.form", d.Key);
        Assert.Contains("48 per-read coefficients and 5000 read weights", d.Message, StringComparison.Ordinal);
    }
}
