using System.Globalization;
using System.Text;
using CoefGen.Core.Capture;

namespace CoefGen.Cli.Output;

/// <summary>The measured and fitted spectra as CSV and as a deterministic SVG plot with log axes.</summary>
internal static class FitFiles
{
    public static string SpectrumCsv(CaptureAnalysisResult a)
    {
        var s = a.Spectrum;
        var w = new StringBuilder("frequency_hz, measured_v2_per_hz, lower_v2_per_hz, upper_v2_per_hz, model_v2_per_hz, used_in_fit\n");
        for (var k = 0; k < s.FrequencyHz.Count; k++)
        {
            w.Append(R(s.FrequencyHz[k])).Append(", ").Append(R(s.PsdV2PerHz[k])).Append(", ").Append(R(s.LowerV2PerHz[k])).Append(", ")
                .Append(R(s.UpperV2PerHz[k])).Append(", ").Append(R(a.Fit.ModelPsd[k])).Append(", ").Append(a.Fit.UsedBins[k] ? "1" : "0").Append('\n');
        }

        return w.ToString();
    }

    public static string WeightsCsv(CaptureAnalysisResult a)
    {
        var w = new StringBuilder("sample_index, " + string.Join(", ", a.Validation.Select(v => v.Label.Replace(",", ";", StringComparison.Ordinal))) + "\n");
        for (var i = 0; i < a.Grid.Count; i++)
        {
            w.Append(a.Grid.SampleIndex[i].ToString(CultureInfo.InvariantCulture));
            foreach (var v in a.Validation)
            {
                w.Append(", ").Append(R(v.H[i]));
            }

            w.Append('\n');
        }

        return w.ToString();
    }

    /// <summary>Amplitude density (nV/rtHz) against frequency, both log; measured in grey, band light, model red.</summary>
    public static string SpectrumSvg(CaptureAnalysisResult a)
    {
        const double width = 720, height = 440, left = 70, right = 20, top = 20, bottom = 50;
        var s = a.Spectrum;
        var f = s.FrequencyHz;
        var amp = (double v) => Math.Sqrt(v) * 1e9;
        var fMin = Math.Log10(f[0]);
        var fMax = Math.Log10(f[^1]);
        var all = s.LowerV2PerHz.Concat(s.UpperV2PerHz).Concat(a.Fit.ModelPsd).Select(amp).ToArray();
        var yMin = Math.Floor(Math.Log10(all.Min()));
        var yMax = Math.Ceiling(Math.Log10(all.Max()));
        double X(double hz) => left + ((Math.Log10(hz) - fMin) / (fMax - fMin) * (width - left - right));
        double Y(double nv) => top + ((yMax - Math.Log10(nv)) / (yMax - yMin) * (height - top - bottom));
        var w = new StringBuilder();
        w.Append($"<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{N(width)}\" height=\"{N(height)}\" viewBox=\"0 0 {N(width)} {N(height)}\" font-family=\"sans-serif\" font-size=\"12\">\n");
        w.Append($"<rect x=\"{N(left)}\" y=\"{N(top)}\" width=\"{N(width - left - right)}\" height=\"{N(height - top - bottom)}\" fill=\"none\" stroke=\"black\"/>\n");
        for (var d = (int)Math.Ceiling(fMin); d <= (int)Math.Floor(fMax); d++)
        {
            var x = X(Math.Pow(10, d));
            w.Append($"<line x1=\"{N(x)}\" y1=\"{N(top)}\" x2=\"{N(x)}\" y2=\"{N(height - bottom)}\" stroke=\"#ddd\"/><text x=\"{N(x)}\" y=\"{N(height - bottom + 16)}\" text-anchor=\"middle\">1e{d.ToString(CultureInfo.InvariantCulture)}</text>\n");
        }

        for (var d = (int)yMin; d <= (int)yMax; d++)
        {
            var y = Y(Math.Pow(10, d));
            w.Append($"<line x1=\"{N(left)}\" y1=\"{N(y)}\" x2=\"{N(width - right)}\" y2=\"{N(y)}\" stroke=\"#ddd\"/><text x=\"{N(left - 6)}\" y=\"{N(y + 4)}\" text-anchor=\"end\">1e{d.ToString(CultureInfo.InvariantCulture)}</text>\n");
        }

        w.Append($"<text x=\"{N((left + width - right) / 2)}\" y=\"{N(height - 10)}\" text-anchor=\"middle\">frequency (Hz)</text>\n");
        w.Append($"<text x=\"16\" y=\"{N((top + height - bottom) / 2)}\" text-anchor=\"middle\" transform=\"rotate(-90 16 {N((top + height - bottom) / 2)})\">noise density at the ADC (nV/rtHz)</text>\n");
        Polyline(w, f, s.UpperV2PerHz.Select(amp), X, Y, "#c8d8f0");
        Polyline(w, f, s.LowerV2PerHz.Select(amp), X, Y, "#c8d8f0");
        Polyline(w, f, s.PsdV2PerHz.Select(amp), X, Y, "#555");
        Polyline(w, f, a.Fit.ModelPsd.Select(amp), X, Y, "#d02020");
        w.Append($"<text x=\"{N(width - right - 8)}\" y=\"{N(top + 16)}\" text-anchor=\"end\" fill=\"#555\">measured (Welch) with {N(s.Confidence * 100)} % band</text>\n");
        w.Append($"<text x=\"{N(width - right - 8)}\" y=\"{N(top + 32)}\" text-anchor=\"end\" fill=\"#d02020\">fitted white + 1/f + pole</text>\n");
        return w.Append("</svg>\n").ToString();
    }

    private static void Polyline(StringBuilder w, IReadOnlyList<double> f, IEnumerable<double> v, Func<double, double> x, Func<double, double> y, string colour)
    {
        var points = string.Join(" ", f.Zip(v).Select(p => $"{N(x(p.First))},{N(y(p.Second))}"));
        w.Append($"<polyline fill=\"none\" stroke=\"{colour}\" stroke-width=\"1\" points=\"{points}\"/>\n");
    }

    private static string N(double v) => v.ToString("0.##", CultureInfo.InvariantCulture);

    private static string R(double v) => v.ToString("R", CultureInfo.InvariantCulture);
}
