using System.Globalization;
using System.Text.Encodings.Web;
using System.Text.Json;
using CoefGen.Cli.Io;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;

namespace CoefGen.Cli.Output;

/// <summary>
/// The `design --json` document, schema "coefgen.design/1" (documented in the README). Keys carry units in
/// their names; doubles are written in shortest round-trip form; big integers (proof extremes) as strings.
/// </summary>
internal static class DesignJson
{
    public const string Schema = "coefgen.design/1";

    /// <summary>Pending bytes above which <see cref="Numbers"/> hands them to the stream.</summary>
    private const int FlushBytes = 1 << 16;

    /// <summary>Streams the document onto <paramref name="output"/> (the weight arrays are flushed as they are written).</summary>
    public static void Write(TextWriter output, DesignResult r)
    {
        var options = new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping, NewLine = "\n" };
        using var stream = new TextWriterStream(output);
        using (var w = new Utf8JsonWriter(stream, options))
        {
            w.WriteStartObject();
            w.WriteString("schema", Schema);
            w.WriteString("tool_version", ToolInfo.Version);
            Readout(w, r);
            Samples(w, r);
            Schemes(w, r);
            RegretJson.Write(w, r);
            FixedPointJson.Write(w, r);
            TwoStageOutput.Write(w, r);
            w.WriteStartArray("warnings");
            foreach (var d in r.Warnings)
            {
                w.WriteStringValue(d.ToString());
            }

            w.WriteEndArray();
            w.WriteEndObject();
        }

        output.Write("\n");
    }

    private static void Readout(Utf8JsonWriter w, DesignResult r)
    {
        var d = r.Description;
        w.WriteStartObject("readout");
        w.WriteString("name", d.Name);
        w.WriteString("path", d.SourcePath);
        w.WriteString("sha256", d.ContentSha256);
        w.WriteStartObject("adc");
        w.WriteNumber("rate_hz", d.Adc.RateHz);
        w.WriteNumber("bits", d.Adc.Bits);
        w.WriteNumber("full_scale_v", d.Adc.FullScaleV);
        w.WriteNumber("lsb_v", d.Adc.LsbV);
        w.WriteString("coding", DesignText.CodingWord(d.Adc.Coding));
        w.WriteNumber("noise_lsb", d.Adc.NoiseLsb);
        w.WriteEndObject();
        w.WriteStartObject("sensor");
        w.WriteNumber("conversion_gain_uv_per_e", d.Sensor.ConversionGainUvPerE);
        w.WriteNumber("gain", d.Sensor.Gain);
        w.WriteNumber("v_at_adc_per_e", d.Sensor.VoltsAtAdcPerElectron);
        w.WriteEndObject();
        var t = d.Timing;
        w.WriteStartObject("timing");
        w.WriteNumber("pixel_samples", t.PixelSamples);
        w.WriteNumber("transfer_time_s", t.TransferTimeS);
        w.WriteString("step", t.Step == StepModel.Pole ? "pole" : "ideal");
        if (t.Cycle.AsTwoWindow() is { } classic)
        {
            Window(w, "reset", classic.Reset);
            Window(w, "signal", classic.Signal);
        }

        w.WriteStartArray("rounding");
        foreach (var line in t.Rounding)
        {
            w.WriteStringValue(line);
        }

        w.WriteEndArray();
        if (!t.Cycle.IsClassic)
        {
            CycleJson.Write(w, t.Cycle);
        }

        w.WriteEndObject();
        w.WriteStartObject("noise");
        if (d.Noise.FrontEndPoleHz is double fp)
        {
            w.WriteNumber("front_end_pole_hz", fp);
        }

        if (d.Noise.BandwidthHz is double fb)
        {
            w.WriteNumber("bandwidth_hz", fb);
        }

        w.WriteNumber("digital_variance_v2", r.Covariance.DigitalVarianceV2);
        w.WriteStartArray("sources");
        foreach (var s in d.Noise.Sources)
        {
            w.WriteStartObject();
            w.WriteString("name", s.Name);
            w.WriteString("at", s.At == NoiseReference.Sensor ? "sensor" : "adc");
            w.WriteNumber("white_nv_per_rthz", s.WhiteNvPerRtHz);
            w.WriteNumber("flicker_corner_hz", s.FlickerCornerHz);
            w.WriteNumber("low_cutoff_hz", s.LowCutoffHz);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        if (r.CaptureSource is not null)
        {
            w.WriteString("capture", r.CaptureSource);
        }
        else
        {
            w.WriteNull("capture");
        }

        w.WriteStartArray("components");
        foreach (var c in r.Covariance.Components)
        {
            w.WriteStringValue(c.Name);
        }

        w.WriteEndArray();
        w.WriteEndObject();
        w.WriteEndObject();
    }

    private static void Window(Utf8JsonWriter w, string name, SampleWindow win)
    {
        w.WriteStartObject(name);
        w.WriteNumber("start", win.Start);
        w.WriteNumber("count", win.Count);
        w.WriteEndObject();
    }

    private static void Samples(Utf8JsonWriter w, DesignResult r)
    {
        var g = r.Grid;
        w.WriteStartObject("samples");
        if (g.TwoWindow is { } classic)
        {
            w.WriteNumber("reset_count", classic.Reset.Count);
            w.WriteNumber("signal_count", classic.Signal.Count);
        }

        Numbers(w, "index", g.SampleIndex.Select(i => (double)i), integers: true);
        Numbers(w, "time_s", g.TimeS);
        Numbers(w, "step", g.Step);
        if (g.TwoWindow is null)
        {
            Numbers(w, "group", g.Group.Select(x => (double)x), integers: true);
        }
        w.WriteEndObject();
    }

    private static void Schemes(Utf8JsonWriter w, DesignResult r)
    {
        var optimal = r.Predictions.First(p => p.Scheme == WeightScheme.Optimal).SigmaV;
        w.WriteString("optimal_solver", r.OptimalSolver);
        w.WriteStartArray("schemes");
        for (var i = 0; i < r.Predictions.Count; i++)
        {
            var p = r.Predictions[i];
            w.WriteStartObject();
            w.WriteString("scheme", DesignText.SchemeWord(p.Scheme));
            w.WriteString("label", p.Label);
            w.WriteBoolean("chosen", i == r.ChosenIndex);
            w.WriteNumber("variance_v2", p.VarianceV2);
            w.WriteNumber("noise_v_rms", p.SigmaV);
            w.WriteNumber("noise_adu_rms", p.SigmaAdu);
            w.WriteNumber("noise_e_rms", p.SigmaElectrons);
            w.WriteNumber("noise_relative_to_optimal", p.SigmaV / optimal);
            if (p.FrequencyDomainVarianceV2 is double fd && p.FrequencyDomainRelativeDifference is double rel)
            {
                w.WriteNumber("frequency_domain_variance_v2", fd);
                w.WriteNumber("time_frequency_relative_difference", rel);
            }
            else
            {
                w.WriteNull("frequency_domain_variance_v2");
                w.WriteNull("time_frequency_relative_difference");
            }

            w.WriteStartArray("budget");
            foreach (var b in p.Budget)
            {
                w.WriteStartObject();
                w.WriteString("source", b.Source);
                w.WriteNumber("variance_v2", b.VarianceV2);
                w.WriteNumber("share", b.Share);
                w.WriteEndObject();
            }

            w.WriteEndArray();
            Numbers(w, "weights", r.Weights[i].H);
            w.WriteEndObject();
        }

        w.WriteEndArray();
    }

    internal static void Numbers(Utf8JsonWriter w, string name, IEnumerable<double> values, bool integers = false)
    {
        w.WriteStartArray(name);
        foreach (var v in values)
        {
            if (w.BytesPending > FlushBytes)
            {
                w.Flush(); // into the output as it goes: no whole-document buffer for 128 000 weights
            }

            if (integers)
            {
                w.WriteNumberValue((long)v);
            }
            else
            {
                w.WriteNumberValue(v);
            }
        }

        w.WriteEndArray();
    }
}
