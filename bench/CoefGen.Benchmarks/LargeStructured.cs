using BenchmarkDotNet.Attributes;

namespace CoefGen.Benchmarks;

/// <summary>The structured solver alone at 2 × 16384 (the dense covariance would be 8.6 GB).</summary>
[MemoryDiagnoser]
public class LargeStructured
{
    private SolverCase? _case;

    [Params(16384)]
    public int PerWindow { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        _case = new SolverCase(PerWindow);
        _case.Structured(); // JIT outside the measurement
    }

    [Benchmark]
    public double Structured() => _case!.Structured().VarianceV2;
}
