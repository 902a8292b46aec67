using System.Globalization;
using System.Text;

namespace CoefGen.Core.Capture;

/// <summary>
/// The confidence region of a spectrum fit as noise scenarios: a [scenarios.range] over the fitted parameters
/// (white density, 1/f corner, and the pole when it was fitted), each at its estimate times exp(±k σ) with σ
/// the fit's standard error of its logarithm. A box of per-parameter intervals (correlations ignored, so it is
/// larger than the joint region); it goes with the <see cref="FittedNoiseSection"/>, whose one source is
/// source[0]. Numbers carry 4 significant digits like that section.
/// </summary>
public static class FittedScenarioRange
{
    /// <summary>Half-width of each interval in standard errors (about 95 % per parameter).</summary>
    public const double Sigmas = 2;

    public static string ToToml(CaptureAnalysisResult analysis)
    {
        ArgumentNullException.ThrowIfNull(analysis);
        var fit = analysis.Fit;
        var w = new StringBuilder("[scenarios]\nobjective = \"regret\"\n\n[scenarios.range]\n");
        Interval(w, "noise.source[0].white_nv_per_rthz", fit.WhiteNvPerRtHz, fit.WhiteLogSigma / 2);
        // Only resolved terms get an interval: a term the fit left out has no estimate to vary.
        if (fit.Model.FlickerCornerHz > 0 && fit.FlickerLogSigma is double flicker)
        {
            Interval(w, "noise.source[0].flicker_corner_hz", fit.Model.FlickerCornerHz, flicker);
        }

        if (fit.PoleLogSigma is double pole && fit.Model.PoleHz is double poleHz)
        {
            Interval(w, "noise.front_end_pole_hz", poleHz, pole);
        }

        return w.ToString();
    }

    private static void Interval(StringBuilder w, string key, double estimate, double logSigma)
    {
        var half = Sigmas * (double.IsFinite(logSigma) && logSigma > 0 ? logSigma : 0);
        w.Append('"').Append(key).Append("\" = [").Append(Value(key, estimate * Math.Exp(-half))).Append(", ").Append(Value(key, estimate * Math.Exp(half))).Append("]\n");
    }

    /// <summary>Frequencies as SI strings in the readout style ("39.88 kHz", read back by the loader), other values as numbers.</summary>
    private static string Value(string key, double v) =>
        key.EndsWith("_hz", StringComparison.Ordinal) ? "\"" + Formatting.Human.SiShort(v, "Hz") + "\"" : Num(v);

    private static string Num(double v)
    {
        var s = v.ToString("G4", CultureInfo.InvariantCulture);
        return s.Contains('E', StringComparison.Ordinal) || s.Contains('.', StringComparison.Ordinal) ? s : s + ".0";
    }
}
