using System.Diagnostics;
using System.Globalization;
using System.Runtime.InteropServices;
using CoefGen.Core.Noise;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;
using CoefGen.Core.Study;
using CoefGen.Core.Weights;
using CoefGen.Core.Weights.Structured;
using CoefGen.Core.Weights.TwoStage;

namespace CoefGen.Benchmarks;

/// <summary>
/// The scale goal of repeated reads, in one run: examples/cycles/skipper_1000.toml (1000 reads x 2 x 64 = 128 000
/// weighted samples, 1000 reset groups, form = "two-stage") through the `coefgen design` process (wall, CPU and peak
/// RSS of the child from getrusage) and through DesignPipeline.Run in this process; then the same readout cut to a
/// number of reads where the dense solve also runs, dense against structured (time ratio, agreement), and the
/// structured and two-stage solves at 1000 reads.
/// </summary>
public static class DesignScale
{
    public const string Example = "cycles/skipper_1000.toml";

    public static void Run(int compareReads)
    {
        var path = Path.Combine(RepoFiles.Examples, Example);
        var text = File.ReadAllText(path);
        Cli("design", path);
        Cli("design --json", path);

        var d = Load(text);
        var targets = RepoFiles.Targets();
        var (cold, coldCpu) = Time(() => DesignPipeline.Run(d, targets));
        var (warm, warmCpu) = Time(() => DesignPipeline.Run(d, targets));
        Print($"DesignPipeline.Run, 1000 reads: cold {cold:F0} ms ({coldCpu:F0} ms CPU), warm {warm:F0} ms ({warmCpu:F0} ms CPU), peak working set of this process {PeakMiB():F0} MiB");

        var big = Covariance(d);
        var (bigStructured, bigStructuredMs) = Solve(() => StructuredOptimalSolver.Solve(big.R, ConstraintSystem.FromGrid(big.Grid, rejectDrift: false)));
        var (bigTwo, bigTwoMs) = Solve(() => TwoStageWeights.Design(big.Grid, big.R, rejectDrift: false)!);
        Print($"1000 reads ({big.Grid.Count} samples, {big.Grid.GroupCount} groups): structured {bigStructuredMs:F0} ms CPU ({bigStructured.Iterations} CG iterations, residual {bigStructured.RelativeResidual:E1}), " +
              $"two-stage {bigTwoMs:F0} ms CPU ({bigTwo.Iterations} alternating steps), two-stage penalty x{Math.Sqrt(bigTwo.VarianceV2 / bigStructured.VarianceV2):F6}");

        var small = Covariance(Load(Cut(text, compareReads)));
        var (dense, denseMs) = Solve(() => new DenseNullSpaceSolver().Solve(small.Grid, small.R, rejectDrift: false));
        var (structured, structuredMs) = Solve(() => new StructuredSolverAdapter().Solve(small.Grid, small.R, rejectDrift: false));
        var (two, twoMs) = Solve(() => TwoStageWeights.Design(small.Grid, small.R, rejectDrift: false)!);
        var weightDiff = structured.H.Zip(dense.H, (a, b) => Math.Abs(a - b)).Max() / dense.H.Max(Math.Abs);
        Print($"{compareReads} reads ({small.Grid.Count} samples, {small.Grid.GroupCount} groups): dense {denseMs:F0} ms CPU, structured {structuredMs:F0} ms CPU, " +
              $"structured/dense {structuredMs / denseMs:F4}; variance relative difference {Math.Abs(structured.VarianceV2 - dense.VarianceV2) / dense.VarianceV2:E1}, " +
              $"largest weight difference {weightDiff:E1} of the largest weight; two-stage {twoMs:F0} ms CPU, x{Math.Sqrt(two.VarianceV2 / dense.VarianceV2):F6} of the dense optimum");
        Print($"ratios in this run: structured at 1000 reads / dense at {compareReads} reads {bigStructuredMs / denseMs:F3}; " +
              $"structured at 1000 reads / structured at {compareReads} reads {bigStructuredMs / structuredMs:F1} for {(double)big.Grid.Count / small.Grid.Count:F1} x the samples");
    }

    /// <summary>The readout with <paramref name="reads"/> repetitions and the pixel cut to fit them (every = 140 samples).</summary>
    private static string Cut(string text, int reads)
    {
        var edited = ReadoutTextEditor.SetNumber(text, "timing.repeat.times", reads, out var error)
            ?? throw new InvalidOperationException(error);
        return ReadoutTextEditor.SetNumber(edited, "timing.pixel_samples", (reads * 140) + 100, out error)
            ?? throw new InvalidOperationException(error);
    }

    private static ReadoutDescription Load(string text) =>
        RepoFiles.Load(System.Text.Encoding.UTF8.GetBytes(text), Path.Combine("examples", Example), _ => null);

    private static (SampleGrid Grid, SampledCovariance R) Covariance(ReadoutDescription d)
    {
        var grid = SampleGrid.FromDescription(d);
        return (grid, NoiseModel.FromDescription(d).Sample(grid));
    }

    /// <summary>Runs the built coefgen (Release) as a child process and reports its wall time, CPU time and peak RSS.</summary>
    private static void Cli(string verb, string readout)
    {
        var dll = Path.Combine(RepoFiles.Root, "src", "CoefGen.Cli", "bin", "Release", "net10.0", "coefgen.dll");
        if (!File.Exists(dll))
        {
            Print($"coefgen {verb}: {dll} not found (dotnet build -c Release src/CoefGen.Cli), not measured");
            return;
        }

        var start = new ProcessStartInfo("dotnet") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        start.ArgumentList.Add(dll);
        foreach (var a in verb.Split(' '))
        {
            start.ArgumentList.Add(a);
        }

        start.ArgumentList.Add(readout);
        var before = Children();
        var sw = Stopwatch.StartNew();
        using var child = Process.Start(start)!;
        var output = child.StandardOutput.ReadToEndAsync();
        var errors = child.StandardError.ReadToEndAsync();
        child.WaitForExit();
        var wall = sw.Elapsed.TotalSeconds;
        var after = Children();
        var cpu = after.CpuSeconds - before.CpuSeconds;
        var bytes = System.Text.Encoding.UTF8.GetByteCount(output.Result);
        Print($"coefgen {verb} {Example}: exit {child.ExitCode}, {wall:F2} s wall, {cpu:F2} s CPU, peak RSS {after.MaxRssMiB:F0} MiB (largest child so far), {bytes} bytes of output, {output.Result.Count(c => c == '\n')} lines" +
              (errors.Result.Length > 0 ? $"; stderr: {errors.Result.Trim()}" : ""));
    }

    private static (T Value, double CpuMs) Solve<T>(Func<T> f)
    {
        var cpu = Process.GetCurrentProcess().TotalProcessorTime;
        var value = f();
        return (value, (Process.GetCurrentProcess().TotalProcessorTime - cpu).TotalMilliseconds);
    }

    private static (double WallMs, double CpuMs) Time(Action f)
    {
        var sw = Stopwatch.StartNew();
        var cpu = Process.GetCurrentProcess().TotalProcessorTime;
        f();
        return (sw.Elapsed.TotalMilliseconds, (Process.GetCurrentProcess().TotalProcessorTime - cpu).TotalMilliseconds);
    }

    private static double PeakMiB()
    {
        using var self = Process.GetCurrentProcess();
        return self.PeakWorkingSet64 / 1048576.0;
    }

    private static void Print(string line) => Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"{line}"));

    /// <summary>CPU time of the children waited for so far and their largest resident set (getrusage(RUSAGE_CHILDREN); ru_maxrss in kB on Linux).</summary>
    private static (double CpuSeconds, double MaxRssMiB) Children()
    {
        var u = new RUsage();
        return GetRUsage(-1, ref u) == 0
            ? (u.UserSeconds + u.SystemSeconds + ((u.UserMicroseconds + u.SystemMicroseconds) / 1e6), u.MaxRssKb / 1024.0)
            : (double.NaN, double.NaN);
    }

    [DllImport("libc", EntryPoint = "getrusage", SetLastError = true)]
    private static extern int GetRUsage(int who, ref RUsage usage);

    /// <summary>struct rusage on 64-bit Linux: two timevals, then 14 longs starting with ru_maxrss.</summary>
    [StructLayout(LayoutKind.Sequential)]
    private struct RUsage
    {
        public long UserSeconds;
        public long UserMicroseconds;
        public long SystemSeconds;
        public long SystemMicroseconds;
        public long MaxRssKb;
        public long Ixrss;
        public long Idrss;
        public long Isrss;
        public long Minflt;
        public long Majflt;
        public long Nswap;
        public long Inblock;
        public long Oublock;
        public long Msgsnd;
        public long Msgrcv;
        public long Nsignals;
        public long Nvcsw;
        public long Nivcsw;
    }
}
