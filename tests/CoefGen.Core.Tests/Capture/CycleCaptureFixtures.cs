using CoefGen.Core.Capture;
using CoefGen.Core.Readout;
using CoefGen.Core.Tests.Emit;

namespace CoefGen.Core.Tests.Capture;

/// <summary>The repeated-reads example (examples/cycles/skipper_capture.toml) and the synthesis of its idle capture.</summary>
internal static class CycleCaptureFixtures
{
    public const int ExampleCycles = 1024;

    public const int ExampleSeed = 2026;

    public static string ExamplePath => Path.Combine(RepoPaths.Root, "examples", "cycles", "skipper_capture.toml");

    public static string ExampleCapturePath => Path.Combine(RepoPaths.Root, "examples", "cycles", "skipper_capture_idle.i16");

    public static ReadoutDescription Skipper { get; } = Load(ExamplePath);

    /// <summary>The generator's truth: white 40 nV/rtHz, 1/f corner 50 kHz, pole 1.5 MHz at 5 MS/s, ADC noise 0.5 LSB, 16 bits over 2 V.</summary>
    public static SyntheticCapture.Model Truth { get; } = new(Math.Pow(40e-9, 2), 50e3, 1.5e6, 5e6, 0.5, 2.0 / 65536);

    public static long[] ExampleCodes() => new SyntheticCapture(ExampleSeed).CycleCodes(Truth, ExampleCycles, Waveform(Skipper));

    public static SampleCapture Pixels(ReadoutDescription d, long[] codes) => new("synthetic.i16", CaptureLayout.PixelSynchronous, d.Timing.PixelSamples, codes);

    /// <summary>
    /// The fixed part of every cycle, in codes: 100 at rest, 900 for the reset feedthrough (samples 0..2), and 40 more
    /// from each transfer to the end of its charge window (the same small charge in every cycle: the mean waveform
    /// removes it, which is why an idle capture may hold it).
    /// </summary>
    public static double[] Waveform(ReadoutDescription d)
    {
        var w = new double[d.Timing.PixelSamples];
        Array.Fill(w, 100.0);
        w[0] = w[1] = w[2] = 900.0;
        foreach (var window in d.Timing.Cycle!.Windows.Where(x => x.Sees == ChargeSight.Transfer))
        {
            var transfer = (int)Math.Round(window.ChargeTimeS * d.Adc.RateHz);
            for (var p = transfer; p < window.Samples.End; p++)
            {
                w[p] += 40.0;
            }
        }

        return w;
    }

    /// <summary>A readout file of the example with some text replaced (parsed from memory; the capture key is left as written).</summary>
    public static ReadoutDescription Edited(params (string From, string To)[] edits)
    {
        var text = File.ReadAllText(ExamplePath);
        foreach (var (from, to) in edits)
        {
            Assert.Contains(from, text, StringComparison.Ordinal);
            text = text.Replace(from, to, StringComparison.Ordinal);
        }

        var dir = Path.GetDirectoryName(ExamplePath)!;
        var load = ReadoutLoader.Load(System.Text.Encoding.UTF8.GetBytes(text), "skipper_capture.toml", rel => File.ReadAllBytes(Path.Combine(dir, rel)));
        return load.Description ?? throw new InvalidOperationException(string.Join("\n", load.Diagnostics));
    }

    private static ReadoutDescription Load(string path)
    {
        var dir = Path.GetDirectoryName(path)!;
        var load = ReadoutLoader.Load(File.ReadAllBytes(path), Path.GetFileName(path), rel => File.ReadAllBytes(Path.Combine(dir, rel)));
        return load.Description ?? throw new InvalidOperationException(string.Join("\n", load.Diagnostics));
    }
}
