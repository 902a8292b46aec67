using System.Diagnostics;
using System.Globalization;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Vectors;

namespace CoefGen.Benchmarks;

/// <summary>Stopwatch around the stages of `vectors` for one readout file (profiling aid).</summary>
public static class VectorProfile
{
    public static void Run(string path, int pixels)
    {
        var d = RepoFiles.Load(File.ReadAllBytes(path), path, _ => null);
        var clock = new StageClock();
        void Lap(string what) => clock.Lap(what);

        var result = DesignPipeline.Run(d, RepoFiles.Targets());
        Lap("design");
        var sampler = CirculantNoiseSampler.Create(result.Covariance, result.Noise, d.Adc.RateHz);
        Lap($"circulant sampler L={sampler.EmbeddingLength}");
        var reach = new AccumulatorTarget(result.Datapath, 0);
        Lap("accumulator target");
        var built = BranchPixels.Build(result.Datapath, 0);
        Lap($"branch pixels ({built.Pixels.Count} built, {built.Unreached.Count} unreached)");
        var source = GoldenVectorGenerator.Source(result, result.Datapath, new VectorOptions(pixels, 1));
        Lap("source (sampler, branch pixels)");
        var count = 0;
        foreach (var p in source.Pixels)
        {
            count++;
        }

        Lap($"{count} pixels drawn and run");
        source = GoldenVectorGenerator.Source(result, result.Datapath, new VectorOptions(pixels, 1));
        VectorFileWriter.Write(source, _ => Stream.Null, "coefgen", "bench");
        Lap("source again + files to Stream.Null");
    }
}
