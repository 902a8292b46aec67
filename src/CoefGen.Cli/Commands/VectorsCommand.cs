using System.CommandLine;
using CoefGen.Cli.Io;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Emit;
using CoefGen.Core.Vectors;
using CoefGen.Core.Vectors.TwoStage;

namespace CoefGen.Cli.Commands;

/// <summary>`coefgen vectors FILE --out DIR [--pixels N] [--seed S] [--no-rtl]`.</summary>
internal static class VectorsCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var file = new Argument<FileInfo>("readout") { Description = "The readout file (TOML)." };
        var outDir = new Option<DirectoryInfo>("--out", "-o") { Description = "Folder for the vectors (created if missing).", Required = true };
        var pixels = new Option<int>("--pixels", "-n") { Description = $"Pixel cycles to generate (edge cases first). Default {VectorOptions.DefaultPixels}.", DefaultValueFactory = _ => VectorOptions.DefaultPixels };
        var seed = new Option<ulong>("--seed") { Description = $"PRNG seed; the same seed gives the same bytes. Default {VectorOptions.DefaultSeed}.", DefaultValueFactory = _ => VectorOptions.DefaultSeed };
        var noRtl = new Option<bool>("--no-rtl") { Description = "Write only the vectors, not the reference datapath, testbenches and coefficient files." };
        var cmd = new Command(
            "vectors",
            "Write golden stimulus (noise with the model's covariance, known charges, a DC offset, rails, the proof's worst cases) " +
            "and the bit-exact expected outputs as hex, decimal and CSV with a manifest, plus a reference datapath and " +
            "testbenches (VHDL, Verilog, C). The files are written all-or-nothing (staged, then moved into place). Exit 2 on bad input.")
        {
            file, outDir, pixels, seed, noRtl,
        };
        cmd.SetAction(parse =>
        {
            var path = parse.GetRequiredValue(file).ToString();
            var n = parse.GetValue(pixels);
            if (n is < 1 or > VectorOptions.MaxPixels)
            {
                return DiagnosticPrinter.PrintFailure(error, [Diagnostic.Error(VectorCodes.PixelCount, SourceLocation.FileOnly("--pixels"),
                    $"{n} pixels; allowed 1..{VectorOptions.MaxPixels}")]);
            }

            if (InstrumentRunner.IsInstrument(path))
            {
                return InstrumentCommands.Vectors(path, parse.GetRequiredValue(outDir).FullName, new VectorOptions(n, parse.GetValue(seed)), output, error);
            }

            var result = DesignRunner.TryRun(path, error);
            if (result is null)
            {
                return ExitCodes.BadInput;
            }

            if (!result.Proof.Safe)
            {
                // Vectors of an unsafe design are still useful (they exercise overflow in the DUT); say so plainly.
                DiagnosticPrinter.Print(error, [UnsafeDesign.Describe(result, asError: false)]);
            }

            var files = new List<(string Name, byte[] Bytes)>();
            if (!parse.GetValue(noRtl))
            {
                var (packages, references) = result.IsTwoStage
                    ? (ReferenceTemplates.TwoStagePackages, ReferenceTemplates.TwoStageFiles)
                    : (ReferenceTemplates.Packages, ReferenceTemplates.Files);
                var entries = packages.Select(p => (p, BuiltinTemplates.TryGet(p, out var b) ? b.DefaultOutputName(Prefix(result)) : p))
                    .Concat(references.Select(f => (Path.Combine(ResourceLocator.TemplatesDir, f.FileName), Prefix(result) + f.OutputSuffix)))
                    .ToList();
                var artefacts = ArtefactPlan.Render(result, entries, error);
                if (artefacts is null)
                {
                    return ExitCodes.BadInput;
                }

                files.AddRange(artefacts.Select(a => (a.RelativePath, a.ToBytes())));
            }

            var options = new VectorOptions(n, parse.GetValue(seed));
            var source = result.IsTwoStage ? null : GoldenVectorGenerator.Source(result, result.Datapath, options);
            var twoStage = result.IsTwoStage ? TwoStageVectorGenerator.Source(result, options) : null;
            var dir = parse.GetRequiredValue(outDir).FullName;
            using var batch = new OutputBatch();
            foreach (var (name, bytes) in files)
            {
                batch.Add(dir, "--out", name, bytes, "--out");
            }

            // The vector files stream into the same staging folder, so the run still writes everything or nothing.
            var written = files.Count;
            if (batch.Stage(dir, "--out") is { } stage)
            {
                var progress = Console.IsErrorRedirected ? null : new PixelProgress(error, n);
                try
                {
                    Stream Open(string name)
                    {
                        written++;
                        return new FileStream(Path.Combine(stage.Folder, name), FileMode.Create, FileAccess.Write, FileShare.None, 1 << 16);
                    }

                    if (twoStage is not null)
                    {
                        TwoStageVectorFileWriter.Write(twoStage, Open, ToolInfo.Name, ToolInfo.Version, progress, alongside: files);
                    }
                    else
                    {
                        VectorFileWriter.Write(source!, Open, ToolInfo.Name, ToolInfo.Version, progress, alongside: files);
                    }
                }
                catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
                {
                    batch.Fail(stage, ex);
                }

                progress?.Done();
            }

            if (batch.Commit(error) is null)
            {
                return ExitCodes.BadInput;
            }

            if ((twoStage is null ? source!.SamplerNote : twoStage.SamplerNote) is string note)
            {
                DiagnosticPrinter.Print(error, [Diagnostic.Warning(VectorCodes.EmbeddingClipped, SourceLocation.FileOnly(path), note)]);
            }

            var kinds = source?.UnreachedBranches.Count ?? 0;
            output.WriteLine($"wrote {written} files to {Path.GetRelativePath(Directory.GetCurrentDirectory(), dir)}: {n} pixels, seed {options.Seed}" +
                (kinds == 0 ? "" : $"; {kinds} mode-separating targets unreachable (manifest: unreached_branches)"));
            return ExitCodes.Ok;
        });
        return cmd;
    }

    private static string Prefix(Core.Pipeline.DesignResult r) => IdentifierPrefix.FromName(r.Description.Name);
}
