using System.Diagnostics;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>
/// Runs a tool with stdin closed, stdout/stderr read concurrently, a timeout that kills the whole process
/// tree, in the test's own directory. Every run's time is written to the test output.
/// </summary>
public static class ToolRunner
{
    private static readonly object LogLock = new();

    public static ToolResult Run(string exe, string workDir, TimeSpan timeout, params string[] args)
    {
        var psi = new ProcessStartInfo(exe)
        {
            UseShellExecute = false,
            RedirectStandardInput = true,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            WorkingDirectory = workDir,
        };
        foreach (var a in args)
        {
            psi.ArgumentList.Add(a);
        }

        var command = Path.GetFileName(exe) + " " + string.Join(' ', args);
        var sw = Stopwatch.StartNew();
        using var p = Process.Start(psi) ?? throw new InvalidOperationException("cannot start " + exe);
        p.StandardInput.Close();
        var stdout = p.StandardOutput.ReadToEndAsync();
        var stderr = p.StandardError.ReadToEndAsync();
        if (!p.WaitForExit(timeout))
        {
            p.Kill(entireProcessTree: true);
            p.WaitForExit();
            Assert.Fail($"{command} timed out after {timeout.TotalSeconds} s");
        }

        p.WaitForExit();
        sw.Stop();
        var result = new ToolResult(command, p.ExitCode, stdout.Result, stderr.Result, sw.Elapsed);
        var line = $"[{sw.Elapsed.TotalSeconds:F3} s] {command} -> {p.ExitCode}";
        TestContext.Current.TestOutputHelper?.WriteLine(line);

        // Optional timing log for measurements (COEFGEN_TOOL_TIMINGS=file).
        var log = Environment.GetEnvironmentVariable("COEFGEN_TOOL_TIMINGS");
        if (!string.IsNullOrEmpty(log))
        {
            lock (LogLock)
            {
                File.AppendAllText(log, line + "\n");
            }
        }
        return result;
    }

    /// <summary>Runs and asserts exit code 0.</summary>
    public static ToolResult RunOk(string exe, string workDir, TimeSpan timeout, params string[] args)
    {
        var r = Run(exe, workDir, timeout, args);
        Assert.True(r.ExitCode == 0, r.Describe());
        return r;
    }

    /// <summary>Runs and asserts exit code 0 and a line that is exactly "PASS" (or starts with "PASS ").</summary>
    public static ToolResult RunPass(string exe, string workDir, TimeSpan timeout, params string[] args)
    {
        var r = RunOk(exe, workDir, timeout, args);
        var lines = (r.StdOut + "\n" + r.StdErr).Split('\n').Select(l => l.Trim());
        Assert.True(lines.Any(l => l == "PASS" || l.StartsWith("PASS ", StringComparison.Ordinal) || l.EndsWith(" PASS", StringComparison.Ordinal)), "no PASS line\n" + r.Describe());
        return r;
    }
}
