namespace CoefGen.Core.Tests.Toolchain;

/// <summary>What one tool run did.</summary>
public sealed record ToolResult(string Command, int ExitCode, string StdOut, string StdErr, TimeSpan Elapsed)
{
    public string Describe() => $"{Command}\nexit {ExitCode} after {Elapsed.TotalSeconds:F2} s\nstdout:\n{StdOut}\nstderr:\n{StdErr}";
}
