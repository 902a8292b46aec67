using System.Globalization;
using System.Text;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Capture;

/// <summary>
/// The fitted model as a [noise] section in the readout-file format (the keys <see cref="ReadoutWriter"/>
/// writes), ready to replace the file's own: one source at the ADC input, the fitted pole, and the
/// capture key kept when the file had one. Numbers carry 4 significant digits: the fit rarely
/// determines more.
/// </summary>
public static class FittedNoiseSection
{
    public static string ToToml(ReadoutDescription description, CaptureAnalysisResult analysis)
    {
        ArgumentNullException.ThrowIfNull(description);
        ArgumentNullException.ThrowIfNull(analysis);
        var fit = analysis.Fit;
        var w = new StringBuilder("[noise]\n");
        // No resolved pole: the fitted white part ends at Nyquist, which a brick-wall limit at rate / 2 reproduces.
        w.Append(fit.Model.PoleHz is double pole ? "front_end_pole_hz = " : "bandwidth_hz = ").Append(Hz(fit.Model.PoleHz ?? (fit.Model.RateHz / 2))).Append('\n');
        if (description.Noise.CapturePath is { } capture)
        {
            w.Append("capture = \"").Append(capture.Replace("\\", "\\\\", StringComparison.Ordinal).Replace("\"", "\\\"", StringComparison.Ordinal)).Append("\"\n");
        }

        w.Append("\n[[noise.source]]\n");
        w.Append("name = \"").Append(CaptureAnalysis.FittedSourceName).Append("\"\n");
        w.Append("at = \"adc\"\n");
        w.Append("white_nv_per_rthz = ").Append(Num(fit.WhiteNvPerRtHz)).Append('\n');
        if (fit.Model.FlickerCornerHz > 0)
        {
            w.Append("flicker_corner_hz = ").Append(Hz(fit.Model.FlickerCornerHz)).Append('\n');
            w.Append("low_cutoff_hz = ").Append(Hz(analysis.LowCutoffHz)).Append('\n');
        }
        return w.ToString();
    }

    /// <summary>A frequency in the readout style, an SI string such as "1.51 MHz" (the loader reads it back).</summary>
    private static string Hz(double v) => "\"" + Formatting.Human.SiShort(v, "Hz") + "\"";

    private static string Num(double v)
    {
        var s = v.ToString("G4", CultureInfo.InvariantCulture);
        return s.Contains('E', StringComparison.Ordinal) || s.Contains('.', StringComparison.Ordinal) ? s : s + ".0";
    }
}
