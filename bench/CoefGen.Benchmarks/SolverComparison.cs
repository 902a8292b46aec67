using BenchmarkDotNet.Attributes;

namespace CoefGen.Benchmarks;

/// <summary>Dense null-space solve (baseline) against the structured solver, same problem, same run.</summary>
[MemoryDiagnoser]
public class SolverComparison
{
    private SolverCase? _case;

    [Params(256, 1024, 4096)]
    public int PerWindow { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        _case = new SolverCase(PerWindow);
        // Run the JIT outside the measurement; a dense warm-up at 2x4096 would cost minutes, and JIT is
        // negligible next to it.
        _case.Structured();
        if (PerWindow <= 1024)
        {
            _case.Dense();
        }
    }

    [Benchmark(Baseline = true)]
    public double Dense() => _case!.Dense();

    [Benchmark]
    public double Structured() => _case!.Structured().VarianceV2;
}
