using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using CoefGen.Core.Capture;
using CoefGen.Core.Readout;

namespace CoefGen.Cli.Output;

/// <summary>`coefgen fit --json`: schema coefgen.fit/1.</summary>
internal static class FitJson
{
    public static string Render(ReadoutDescription d, CaptureAnalysisResult a)
    {
        using var stream = new MemoryStream();
        var options = new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping, NewLine = "\n" };
        using (var w = new Utf8JsonWriter(stream, options))
        {
            var f = a.Fit;
            w.WriteStartObject();
            w.WriteString("schema", "coefgen.fit/1");
            w.WriteString("capture", a.Capture.SourcePath);
            w.WriteNumber("samples", a.Capture.SampleCount);
            w.WriteStartObject("spectrum");
            w.WriteNumber("segment_length", a.Spectrum.SegmentLength);
            w.WriteNumber("segments", a.Spectrum.Segments);
            w.WriteNumber("degrees_of_freedom", a.Spectrum.DegreesOfFreedom);
            w.WriteEndObject();
            w.WriteStartObject("fit");
            w.WriteNumber("white_nv_per_rthz", f.WhiteNvPerRtHz);
            w.WriteNumber("white_nv_per_rthz_sigma", f.WhiteNvPerRtHzSigma);
            w.WriteNumber("flicker_corner_hz", f.Model.FlickerCornerHz);
            NumberOrNull(w, "flicker_corner_hz_sigma", f.FlickerCornerSigmaHz);
            NumberOrNull(w, "pole_hz", f.Model.PoleHz);
            if (f.PoleSigmaHz is double ps)
            {
                w.WriteNumber("pole_hz_sigma", ps);
            }
            else
            {
                w.WriteNull("pole_hz_sigma");
            }

            if (f.Unresolved.Count > 0)
            {
                w.WriteStartArray("unresolved");
                foreach (var term in f.Unresolved)
                {
                    w.WriteStringValue(term);
                }

                w.WriteEndArray();
            }

            w.WriteNumber("residual_rms_ln", f.ResidualRms);
            w.WriteNumber("expected_residual_rms_ln", f.ExpectedResidualRms);
            w.WriteStartArray("lines");
            foreach (var l in f.Lines)
            {
                w.WriteStartObject();
                w.WriteNumber("frequency_hz", l.FrequencyHz);
                w.WriteNumber("rms_v", l.RmsV);
                w.WriteEndObject();
            }

            w.WriteEndArray();
            w.WriteEndObject();
            w.WriteString("noise_section", FittedNoiseSection.ToToml(d, a));
            w.WriteString("scenarios_section", FittedScenarioRange.ToToml(a));
            w.WriteStartArray("validation");
            foreach (var v in a.Validation)
            {
                w.WriteStartObject();
                w.WriteString("scheme", v.Label);
                w.WriteNumber("held_out_sigma_v", v.MeasuredSigmaV);
                w.WriteNumber("held_out_lower_v", v.LowerSigmaV);
                w.WriteNumber("held_out_upper_v", v.UpperSigmaV);
                w.WriteNumber("predicted_model_sigma_v", v.PredictedModelSigmaV);
                w.WriteNumber("predicted_design_half_sigma_v", v.PredictedCaptureSigmaV);
                w.WriteEndObject();
            }

            w.WriteEndArray();
            w.WriteEndObject();
        }

        return Encoding.UTF8.GetString(stream.ToArray()) + "\n";
    }

    private static void NumberOrNull(Utf8JsonWriter w, string name, double? value)
    {
        if (value is double v)
        {
            w.WriteNumber(name, v);
        }
        else
        {
            w.WriteNull(name);
        }
    }
}
