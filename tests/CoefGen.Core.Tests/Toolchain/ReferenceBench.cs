using CoefGen.Core.Emit;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Tests.Emit;
using CoefGen.Core.Vectors;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>Writes golden vectors, the coefficient files and the reference datapath + benches into a temp dir, and runs them.</summary>
public static class ReferenceBench
{
    /// <summary>
    /// Vectors from <paramref name="result"/>'s datapath; coefficient files from <paramref name="coefficientDesign"/>
    /// (the same design, or a tampered copy for negative tests). Returns the identifier prefix.
    /// </summary>
    public static string Write(TempDir dir, DesignResult result, int pixels, IntegerDesign? coefficientDesign = null)
    {
        var model = TemplateModel.Create(coefficientDesign ?? result.Datapath, TestDesigns.Provenance);
        foreach (var p in ReferenceTemplates.Packages)
        {
            Emitted.Write(dir, coefficientDesign ?? result.Datapath, p);
        }

        foreach (var (file, suffix) in ReferenceTemplates.Files)
        {
            var r = TemplateRenderer.RenderFile(model, Path.Combine(RepoPaths.Templates, file), TestContext.Current.CancellationToken);
            Assert.True(r.Succeeded, string.Join("\n", r.Diagnostics));
            dir.Write(model.Prefix + suffix, r.Text!);
        }

        var set = GoldenVectorGenerator.Generate(result, new VectorOptions(pixels, Seed: 11));
        foreach (var (name, text) in VectorFiles.Render(set, "coefgen", "test"))
        {
            dir.Write(name, text);
        }

        return model.Prefix;
    }

    /// <summary>Analyses the VHDL package, datapath and bench in GHDL and runs the bench on the first <paramref name="pixels"/> pixels.</summary>
    /// <param name="dir">Folder holding the files.</param>
    /// <param name="prefix">Identifier prefix of the files.</param>
    /// <param name="pixels">Pixels to run.</param>
    /// <param name="package">The VHDL package file the datapath uses (default the vhdl-package's, prefix_coefs_pkg.vhd).</param>
    public static ToolResult Ghdl(TempDir dir, string prefix, int pixels, string? package = null)
    {
        var ghdl = Tools.Require("ghdl");
        Directory.CreateDirectory(Path.Combine(dir.Path, "work"));
        ToolRunner.RunOk(ghdl, dir.Path, Emitted.Timeout, "-a", "--std=08", "-Werror", "--workdir=work",
            package ?? prefix + "_coefs_pkg.vhd", prefix + "_datapath.vhd", prefix + "_tb.vhd");
        return ToolRunner.Run(ghdl, dir.Path, Emitted.Timeout, "-r", "--std=08", "--workdir=work", prefix + "_tb", $"-gMAX_PIXELS={pixels}");
    }

    public static ToolResult Icarus(TempDir dir, string prefix)
    {
        var iverilog = Tools.Require("iverilog");
        var vvp = Tools.Require("vvp");
        ToolRunner.RunOk(iverilog, dir.Path, Emitted.Timeout, "-g2005-sv", "-I", ".", "-o", "tb.vvp", prefix + "_datapath.v", prefix + "_tb.v");
        return ToolRunner.Run(vvp, dir.Path, Emitted.Timeout, "-n", "tb.vvp");
    }

    public static ToolResult C(TempDir dir, string prefix)
    {
        var gcc = Tools.Require("gcc");
        ToolRunner.RunOk(gcc, dir.Path, Emitted.Timeout, "-std=c99", "-Wall", "-Wextra", "-Wpedantic", "-Werror", "-O2", "-o", "tb_c", prefix + "_tb.c");
        return ToolRunner.Run(Path.Combine(dir.Path, "tb_c"), dir.Path, Emitted.Timeout);
    }

    /// <summary>A run that passed: exit 0 and a "PASS n pixels" line with the expected count.</summary>
    public static void AssertPass(ToolResult r, int pixels)
    {
        Assert.True(r.ExitCode == 0, r.Describe());
        Assert.Contains($"PASS {pixels} pixels", r.StdOut + r.StdErr, StringComparison.Ordinal);
    }

    /// <summary>A run that caught the fault: non-zero exit, a FAIL line, no PASS line.</summary>
    public static void AssertFail(ToolResult r)
    {
        Assert.True(r.ExitCode != 0, r.Describe());
        Assert.Contains("FAIL", r.StdOut + r.StdErr, StringComparison.Ordinal);
        Assert.DoesNotContain("PASS", r.StdOut + r.StdErr, StringComparison.Ordinal);
    }
}
