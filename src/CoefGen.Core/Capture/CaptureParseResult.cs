using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Capture;

/// <summary>The parsed capture when no error was found, and every diagnostic.</summary>
public sealed record CaptureParseResult(SampleCapture? Capture, IReadOnlyList<Diagnostic> Diagnostics)
{
    public bool Succeeded => Capture is not null;
}
