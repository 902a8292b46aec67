using BenchmarkDotNet.Attributes;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;

namespace CoefGen.Benchmarks;

/// <summary>The whole design (covariance, three weight schemes, predictions, integer datapath) of each shipped example and of a 2 x 4096 readout.</summary>
[MemoryDiagnoser]
public class DesignPipelineBenchmarks
{
    private ReadoutDescription? _description;
    private TargetCatalog? _targets;

    /// <summary>Every examples/*.toml, then the embedded 2 x 4096 readout.</summary>
    public static IEnumerable<string> Cases() => [.. RepoFiles.ExampleNames(), LargeDesignReadout.Name];

    [ParamsSource(nameof(Cases))]
    public string Case { get; set; } = "";

    [GlobalSetup]
    public void Setup()
    {
        _targets = RepoFiles.Targets();
        _description = Case == LargeDesignReadout.Name ? LargeDesignReadout.Load() : RepoFiles.LoadExample(Case);
        Run(); // JIT outside the measurement, and fail early if the case does not design
    }

    [Benchmark]
    public double Run() => DesignPipeline.Run(_description!, _targets!).Datapath.NoisePenaltyPercent;
}
