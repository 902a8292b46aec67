using System.Diagnostics;
using System.Globalization;
using BenchmarkDotNet.Configs;
using BenchmarkDotNet.Engines;
using BenchmarkDotNet.Jobs;
using BenchmarkDotNet.Running;
using BenchmarkDotNet.Toolchains.InProcess.Emit;
using CoefGen.Benchmarks;
using CoefGen.Core.Weights.Structured;

// Modes:
//   (none) | bench     BenchmarkDotNet: dense vs structured at 2x{256,1024,4096}, structured at 2x16384
//   precond [n...]     iterations and time per preconditioner
//   crossover [n...]   Stopwatch dense vs structured at small sizes (for OptimalSolverChoice)
//   peak n             one structured solve of 2 x n in this process: time, iterations, allocated bytes, peak working set
//   twostage [N m n]   Stopwatch: the two-stage design of N reads x 2 x m (default 1000 x 2 x 64); dense vs two-stage at n reads
//   design             BenchmarkDotNet: the whole DesignPipeline.Run of each shipped example and of a 2x4096 readout
//   design-scale [n]   Stopwatch: examples/cycles/skipper_1000.toml through `coefgen design` (child process: wall, CPU, peak RSS)
//                      and DesignPipeline.Run; dense vs structured on the same readout cut to n reads (default 16)
//   stages file        Stopwatch around each design stage of one readout file (profiling aid)
//   vectors-profile file n   Stopwatch around the stages of `vectors` (profiling aid)
//   fft L reps         CPU time of one FFT pair of length L
MathNet.Numerics.Control.UseManaged();
var mode = args.Length > 0 ? args[0] : "bench";
var sizes = mode is "stages" or "vectors-profile" ? [] : args.Skip(1).Select(a => int.Parse(a, CultureInfo.InvariantCulture)).ToArray();
switch (mode)
{
    case "bench":
        // In-process: no generated child project to build (2-core box, strict repo build settings).
        // ColdStart with one measured invocation per case (GlobalSetup has already run the JIT): BDN's
        // other strategies add jitting/warm-up invocations, and the dense 2x4096 solve alone takes minutes.
        // The MemoryDiagnoser adds one more invocation for the allocation count.
        var job = Job.Default
            .WithToolchain(new InProcessEmitToolchain(TimeSpan.FromMinutes(30), logOutput: true))
            .WithStrategy(RunStrategy.ColdStart)
            .WithLaunchCount(1)
            .WithWarmupCount(0)
            .WithIterationCount(1)
            .WithId("short");
        var config = DefaultConfig.Instance.AddJob(job).WithOptions(ConfigOptions.DisableOptimizationsValidator);
        BenchmarkRunner.Run([typeof(SolverComparison), typeof(LargeStructured)], config);
        break;
    case "design":
        // In-process as above. Throughput with the pilot choosing invocations per iteration (about 100 for a
        // millisecond example, 1 for 2x4096); 3 warm-up and 15 measured iterations keep the whole run about a minute.
        var designJob = Job.Default
            .WithToolchain(new InProcessEmitToolchain(TimeSpan.FromMinutes(30), logOutput: true))
            .WithLaunchCount(1)
            .WithWarmupCount(3)
            .WithIterationCount(15)
            .WithId("design");
        BenchmarkRunner.Run<DesignPipelineBenchmarks>(DefaultConfig.Instance.AddJob(designJob)
            .WithOptions(ConfigOptions.DisableOptimizationsValidator)
            .WithSummaryStyle(BenchmarkDotNet.Reports.SummaryStyle.Default.WithMaxParameterColumnWidth(24)));
        break;
    case "precond":
        foreach (var n in sizes.Length > 0 ? sizes : [256, 1024, 4096])
        {
            foreach (var noise in new[] { "white+1/f+pole", "strong-ar1", "1/f-dominated" })
            {
                var c = new SolverCase(n, noise);
                foreach (var kind in Enum.GetValues<PreconditionerKind>())
                {
                    var sw = Stopwatch.StartNew();
                    var s = StructuredOptimalSolver.Solve(c.Covariance, c.Columns, c.Rhs, kind);
                    Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                        $"2x{n,-6} {noise,-15} {kind,-16} converged={s.Converged} iterations={s.Iterations,5} residual={s.RelativeResidual:E2} time={sw.Elapsed.TotalMilliseconds,9:F1} ms"));
                }
            }
        }

        break;
    case "crossover":
        foreach (var n in sizes.Length > 0 ? sizes : [16, 32, 64, 128, 192, 256, 384, 512])
        {
            var c = new SolverCase(n);
            c.Dense();
            c.Structured();
            var reps = Math.Max(1, 20000 / (n * 4));
            var sw = Stopwatch.StartNew();
            for (var i = 0; i < reps; i++)
            {
                c.Dense();
            }

            var dense = sw.Elapsed.TotalMilliseconds / reps;
            sw.Restart();
            for (var i = 0; i < reps; i++)
            {
                c.Structured();
            }

            var structured = sw.Elapsed.TotalMilliseconds / reps;
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"2x{n,-5} dense={dense,9:F2} ms structured={structured,9:F2} ms structured/dense={structured / dense:F3}"));
        }

        break;
    case "peak":
        {
            var n = sizes.Length > 0 ? sizes[0] : 16384;
            var before = GC.GetTotalAllocatedBytes(precise: true);
            var sw = Stopwatch.StartNew();
            var c = new SolverCase(n);
            var setup = sw.Elapsed.TotalMilliseconds;
            var s = c.Structured();
            var solve = sw.Elapsed.TotalMilliseconds - setup;
            var allocated = GC.GetTotalAllocatedBytes(precise: true) - before;
            using var self = Process.GetCurrentProcess();
            Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"2x{n}: setup {setup:F0} ms (covariance lags), solve {solve:F0} ms, iterations {s.Iterations}, residual {s.RelativeResidual:E2}, " +
                $"allocated {allocated / 1048576.0:F1} MiB, peak working set {self.PeakWorkingSet64 / 1048576.0:F1} MiB, var {s.VarianceV2:R}"));
            break;
        }

    case "twostage":
        // Two-stage design of N repeated reads (default 1000 reads x 2 x 64), then dense vs two-stage at 16 reads.
        TwoStageScale.Run(sizes.Length > 0 ? sizes[0] : 1000, sizes.Length > 1 ? sizes[1] : 64, sizes.Length > 2 ? sizes[2] : 16);
        break;

    case "fft":
        FftProbe.Run(sizes[0], sizes[1]);
        break;

    case "design-scale":
        // The whole design of the 1000-read example (child coefgen process and in-process), then dense vs structured at n reads.
        DesignScale.Run(sizes.Length > 0 ? sizes[0] : 16);
        break;

    case "vectors-profile":
        VectorProfile.Run(args[1], int.Parse(args[2], CultureInfo.InvariantCulture));
        break;

    case "stages":
        StageProfile.Run(args[1]);
        break;

    default:
        Console.Error.WriteLine("modes: bench | design | design-scale [n] | precond [n...] | crossover [n...] | peak n | twostage [reads perWindow compareReads] | stages file | vectors-profile file n | fft L reps");
        return 2;
}

return 0;
