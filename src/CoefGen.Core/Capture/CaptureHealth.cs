using System.Globalization;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Capture;

/// <summary>
/// Plausibility of a capture before anything is estimated from it. A live ADC input moving by more than a code
/// carries at least the quantisation noise, 1/sqrt(12) = 0.29 LSB rms (PHYSICS.md §6); a record far quieter
/// than that is a stuck converter or a disconnected input, and every prediction made on it is meaningless.
/// </summary>
public static class CaptureHealth
{
    /// <summary>Residual noise below this many LSB rms is flagged (under half the quantisation noise of a live input).</summary>
    public const double StuckBelowLsb = 0.15;

    public static IReadOnlyList<Diagnostic> Check(SampleCapture capture, AdcSpec adc)
    {
        ArgumentNullException.ThrowIfNull(capture);
        ArgumentNullException.ThrowIfNull(adc);
        var rmsLsb = ResidualRmsLsb(capture);
        if (rmsLsb >= StuckBelowLsb)
        {
            return [];
        }

        var distinct = capture.Codes.Distinct().Take(3).Count();
        var codes = distinct > 2 ? "more than 2 distinct codes" : $"{distinct.ToString(CultureInfo.InvariantCulture)} distinct code(s)";
        return [Diagnostic.Warning(CaptureCodes.StuckAdc, SourceLocation.FileOnly(capture.SourcePath),
            $"the capture's noise is {rmsLsb.ToString("0.###", CultureInfo.InvariantCulture)} LSB rms ({codes}), below the {StuckBelowLsb.ToString(CultureInfo.InvariantCulture)} LSB a live input shows: the ADC looks stuck or its input disconnected, so noise estimated from it is meaningless")];
    }

    /// <summary>rms of the residual record (mean waveform removed), in LSB.</summary>
    public static double ResidualRmsLsb(SampleCapture capture)
    {
        ArgumentNullException.ThrowIfNull(capture);
        if (capture.Rows < 2)
        {
            return 0;
        }

        var x = CaptureSamples.ResidualStream(capture, 1.0);
        return Math.Sqrt(x.Sum(v => v * v) / x.Length);
    }
}
