using System.Diagnostics;
using System.Globalization;

namespace CoefGen.Benchmarks;

/// <summary>Prints wall and CPU time since the last lap and the process's working set (profiling modes).</summary>
public sealed class StageClock
{
    private readonly Stopwatch _wall = Stopwatch.StartNew();
    private TimeSpan _cpu = Process.GetCurrentProcess().TotalProcessorTime;

    public void Lap(string what)
    {
        using var self = Process.GetCurrentProcess();
        var now = self.TotalProcessorTime;
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture,
            $"{what,-28} {_wall.Elapsed.TotalMilliseconds,9:F0} ms wall {(now - _cpu).TotalMilliseconds,8:F0} ms cpu  ws {self.WorkingSet64 / 1048576.0,6:F0} MiB peak {self.PeakWorkingSet64 / 1048576.0,6:F0} MiB"));
        _cpu = now;
        _wall.Restart();
    }
}
