using System.Globalization;

namespace CoefGen.Cli.Io;

/// <summary>A one-line progress counter on a terminal's stderr ("\r" rewrites it; only used when stderr is a terminal).</summary>
internal sealed class PixelProgress(TextWriter error, int total) : IProgress<int>
{
    public void Report(int value) => error.Write(string.Create(CultureInfo.InvariantCulture, $"\rvectors: {value}/{total} pixels ({100.0 * value / total:F0} %)"));

    public void Done() => error.WriteLine();
}
