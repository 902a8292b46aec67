using System.Diagnostics;
using System.Globalization;
using CoefGen.Core.Weights.Structured;

namespace CoefGen.Benchmarks;

/// <summary>CPU time of one forward + inverse FFT pair at a power-of-two length (profiling aid).</summary>
public static class FftProbe
{
    public static void Run(int length, int reps)
    {
        var sw = Stopwatch.StartNew();
        var cpu0 = Process.GetCurrentProcess().TotalProcessorTime;
        var fft = new Fft(length);
        var build = Process.GetCurrentProcess().TotalProcessorTime - cpu0;
        var re = new double[length];
        var im = new double[length];
        re[1] = 1;
        var cpu1 = Process.GetCurrentProcess().TotalProcessorTime;
        for (var i = 0; i < reps; i++)
        {
            fft.Forward(re, im);
            fft.Inverse(re, im);
        }

        var per = (Process.GetCurrentProcess().TotalProcessorTime - cpu1).TotalMilliseconds / reps;
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"fft {length}: build {build.TotalMilliseconds:F1} ms cpu, forward+inverse {per:F1} ms cpu, wall total {sw.ElapsedMilliseconds} ms"));
    }
}
