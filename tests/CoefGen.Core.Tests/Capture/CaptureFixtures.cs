using CoefGen.Core.Capture;
using CoefGen.Core.Readout;
using CoefGen.Core.Tests.Emit;

namespace CoefGen.Core.Tests.Capture;

/// <summary>The bench example readout and captures built on it.</summary>
internal static class CaptureFixtures
{
    public static string ExamplePath => Path.Combine(RepoPaths.Root, "examples", "capture_bench.toml");

    public static string ExampleCapturePath => Path.Combine(RepoPaths.Root, "examples", "capture_bench_idle.i16");

    public static ReadoutDescription Bench { get; } = Load();

    /// <summary>The example capture's recipe: 2048 cycles of 40 samples, seed 2024, 100 uV tone.</summary>
    public static long[] ExampleCodes() => new SyntheticCapture(2024).PixelCodes(SyntheticCapture.Bench(100e-6), 2048, 40);

    public static SampleCapture Pixels(long[] codes) => new("synthetic.i16", CaptureLayout.PixelSynchronous, 40, codes);

    private static ReadoutDescription Load()
    {
        var dir = Path.GetDirectoryName(ExamplePath)!;
        var load = ReadoutLoader.Load(File.ReadAllBytes(ExamplePath), "capture_bench.toml", rel => File.ReadAllBytes(Path.Combine(dir, rel)));
        return load.Description ?? throw new InvalidOperationException(string.Join("\n", load.Diagnostics));
    }
}
