using System.Diagnostics;
using System.Globalization;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;
using CoefGen.Core.Weights.TwoStage;

namespace CoefGen.Benchmarks;

/// <summary>
/// Repeated reads at scale: N reads of (m reset + m signal) samples, each after its own reset, with the benchmark's
/// white + 1/f + pole noise. Times the two-stage design (per-read table x read weights) at N reads, and the full
/// dense optimum against the two-stage one at a size where both run, in the same process.
/// </summary>
public static class TwoStageScale
{
    public static SampleGrid Grid(int reads, int perWindow)
    {
        var read = (2 * perWindow) + (2 * BenchmarkNoise.Gap);
        var windows = new List<CycleWindow>();
        for (var k = 0; k < reads; k++)
        {
            var start = k * read;
            var signal = start + perWindow + BenchmarkNoise.Gap;
            windows.Add(new CycleWindow("p", new SampleWindow(start, perWindow), ChargeSight.None, 0, k, k));
            windows.Add(new CycleWindow("s", new SampleWindow(signal, perWindow), ChargeSight.Transfer, (signal - 96) / BenchmarkNoise.RateHz, k, k));
        }

        return SampleGrid.FromCycle(BenchmarkNoise.RateHz, new CycleSpec(windows, reads, null, null, reads), BenchmarkNoise.PoleHz);
    }

    public static void Run(int reads, int perWindow, int compareReads)
    {
        Measure(reads, perWindow, dense: false);
        Measure(compareReads, perWindow, dense: true);
    }

    private static void Measure(int reads, int perWindow, bool dense)
    {
        var before = GC.GetTotalAllocatedBytes(precise: true);
        var sw = Stopwatch.StartNew();
        var grid = Grid(reads, perWindow);
        var r = BenchmarkNoise.Covariance(grid);
        var setup = sw.Elapsed.TotalMilliseconds;
        var two = TwoStageWeights.Design(grid, r, rejectDrift: false)!;
        var twoMs = sw.Elapsed.TotalMilliseconds - setup;
        var line = string.Create(CultureInfo.InvariantCulture,
            $"{reads} reads x 2x{perWindow}: {grid.Count} samples; setup {setup:F0} ms; two-stage {twoMs:F0} ms ({two.Iterations} steps), var {two.VarianceV2:E6}");
        if (dense)
        {
            var t0 = sw.Elapsed.TotalMilliseconds;
            var full = new DenseNullSpaceSolver().Solve(grid, r, rejectDrift: false);
            var denseMs = sw.Elapsed.TotalMilliseconds - t0;
            line += string.Create(CultureInfo.InvariantCulture,
                $"; full dense optimum {denseMs:F0} ms, var {full.VarianceV2:E6}; dense/two-stage time {denseMs / twoMs:F1}, two-stage penalty x{Math.Sqrt(two.VarianceV2 / full.VarianceV2):F6}");
        }

        using var self = Process.GetCurrentProcess();
        var allocated = GC.GetTotalAllocatedBytes(precise: true) - before;
        Console.WriteLine(line + string.Create(CultureInfo.InvariantCulture,
            $"; allocated {allocated / 1048576.0:F0} MiB, peak working set {self.PeakWorkingSet64 / 1048576.0:F0} MiB"));
    }
}
