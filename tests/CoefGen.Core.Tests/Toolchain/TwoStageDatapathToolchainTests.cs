using CoefGen.Core.Emit;
using CoefGen.Core.FixedPoint.TwoStage;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Tests.Cycle;
using CoefGen.Core.Tests.Emit;
using CoefGen.Core.Vectors;
using CoefGen.Core.Vectors.TwoStage;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// The two-stage reference datapaths (templates/ref-two-stage-datapath.v and .vhd, with the shared self-checking benches)
/// against the two-stage golden vectors: 0 mismatches in Icarus and GHDL on both representative cases, a clean Verilator
/// -Wall lint, and a corrupted table entry fails both (negative control).
/// </summary>
public class TwoStageDatapathToolchainTests
{
    public static TheoryData<string> Names => TwoStageCases.Names;

    /// <summary>Vectors from <paramref name="r"/>; packages and datapath from <paramref name="tables"/> (the same design, or a tampered copy).</summary>
    private static string Write(TempDir dir, DesignResult r, int pixels, TwoStageIntegerDesign? tables = null)
    {
        var model = TwoStageCases.Model(tables is null ? r : r with { TwoStage = r.TwoStage! with { Quantised = tables } });
        foreach (var p in ReferenceTemplates.TwoStagePackages)
        {
            Assert.True(BuiltinTemplates.TryGet(p, out var t));
            dir.Write(t.DefaultOutputName(model.Prefix), BuiltinRender.Render(model, p));
        }

        foreach (var (file, suffix) in ReferenceTemplates.TwoStageFiles)
        {
            var rendered = TemplateRenderer.RenderFile(model, Path.Combine(RepoPaths.Templates, file), TestContext.Current.CancellationToken);
            Assert.True(rendered.Succeeded, string.Join("\n", rendered.Diagnostics));
            dir.Write(model.Prefix + suffix, rendered.Text!);
        }

        foreach (var (name, text) in TwoStageVectorFileWriter.Render(TwoStageVectorGenerator.Source(r, new VectorOptions(pixels, Seed: 11)), "coefgen", "test"))
        {
            dir.Write(name, text);
        }

        return model.Prefix;
    }

    private static ToolResult Ghdl(TempDir dir, string prefix, int pixels)
    {
        var ghdl = Tools.Require("ghdl");
        Directory.CreateDirectory(Path.Combine(dir.Path, "work"));
        ToolRunner.RunOk(ghdl, dir.Path, Emitted.Timeout, "-a", "--std=08", "-Werror", "--workdir=work",
            prefix + "_two_stage_pkg.vhd", prefix + "_datapath.vhd", prefix + "_tb.vhd");
        return ToolRunner.Run(ghdl, dir.Path, Emitted.Timeout, "-r", "--std=08", "--workdir=work", prefix + "_tb", $"-gMAX_PIXELS={pixels}");
    }

    [Theory]
    [MemberData(nameof(Names))]
    public void Two_stage_datapath_matches_every_golden_output_in_Icarus_and_GHDL(string name)
    {
        var r = TwoStageCases.Named(name);
        using var dir = new TempDir();
        var prefix = Write(dir, r, 60);
        ReferenceBench.AssertPass(ReferenceBench.Icarus(dir, prefix), 60);
        ReferenceBench.AssertPass(Ghdl(dir, prefix, 20), 20);
    }

    [Fact]
    public void Two_stage_datapath_lints_clean_under_verilator_Wall()
    {
        var verilator = Tools.Require("verilator");
        foreach (var r in new[] { TwoStageCases.Skipper(), TwoStageCases.SharedReset() })
        {
            using var dir = new TempDir();
            var prefix = Write(dir, r, 1);
            ToolRunner.RunOk(verilator, dir.Path, Emitted.Timeout, "--lint-only", "-Wall", "-I.", "--top-module", prefix + "_datapath", prefix + "_datapath.v");
        }
    }

    /// <summary>Negative control: one per-read table entry off by one (every read uses it) fails the bench.</summary>
    [Fact]
    public void A_corrupted_table_entry_fails_the_bench()
    {
        var r = TwoStageCases.Skipper();
        var d = r.TwoStage!.Quantised;
        var table = d.Table.ToArray();
        table[7] += 1;
        using var dir = new TempDir();
        var prefix = Write(dir, r, 30, d with { Table = table });
        ReferenceBench.AssertFail(ReferenceBench.Icarus(dir, prefix));
        ReferenceBench.AssertFail(Ghdl(dir, prefix, 30));
    }
}
