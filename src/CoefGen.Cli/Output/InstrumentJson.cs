using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Instrument;

namespace CoefGen.Cli.Output;

/// <summary>The `design --json` document of an instrument file, schema "coefgen.instrument/1" (README).</summary>
internal static class InstrumentJson
{
    public const string Schema = "coefgen.instrument/1";

    public static string Render(InstrumentDesign design)
    {
        using var stream = new MemoryStream();
        var options = new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping, NewLine = "\n" };
        using (var w = new Utf8JsonWriter(stream, options))
        {
            var s = design.Settings;
            w.WriteStartObject();
            w.WriteString("schema", Schema);
            w.WriteString("tool_version", ToolInfo.Version);
            w.WriteString("name", design.Spec.Name);
            w.WriteString("path", design.Spec.SourcePath);
            w.WriteString("sha256", design.Spec.ContentSha256);
            w.WriteString("base_path", design.BasePath);
            w.WriteString("base_sha256", design.BaseSha256);
            w.WriteStartObject("datapath");
            w.WriteString("target", s.TargetName);
            w.WriteNumber("coef_bits", s.CoefBits);
            w.WriteNumber("sample_bits", s.SampleBits);
            w.WriteNumber("acc_bits", s.AccBits);
            w.WriteNumber("output_bits", s.OutputBits);
            w.WriteNumber("output_frac_bits", design.OutputFracBits);
            w.WriteString("accumulator", ModeNames.Name(s.Accumulator));
            w.WriteString("rounding", ModeNames.Name(s.Rounding));
            w.WriteString("normalize", ModeNames.Name(s.Normalize));
            w.WriteBoolean("safe", design.Safe);
            w.WriteStartArray("checks");
            foreach (var x in design.Widths)
            {
                w.WriteStartObject();
                w.WriteString("name", x.Name);
                w.WriteNumber("required_bits", x.RequiredBits);
                w.WriteNumber("available_bits", x.AvailableBits);
                w.WriteNumber("margin_bits", x.MarginBits);
                w.WriteBoolean("required", x.Required);
                w.WriteString("widest_table", x.WidestTable);
                w.WriteNumber("narrowest_required_bits", x.NarrowestRequiredBits);
                w.WriteEndObject();
            }

            w.WriteEndArray();
            w.WriteEndObject();
            w.WriteStartArray("tables");
            foreach (var (t, r) in design.Tables.Zip(TableSummary.Of(design)))
            {
                w.WriteStartObject();
                w.WriteNumber("index", t.Index);
                w.WriteString("mode", t.Mode);
                w.WriteString("channel", t.Channel);
                w.WriteString("name", t.Result.Datapath.Name);
                WriteSummary(w, r);
                w.WriteEndObject();
            }

            w.WriteEndArray();
            w.WriteStartArray("warnings");
            foreach (var d in design.Warnings)
            {
                w.WriteStringValue(d.ToString());
            }

            w.WriteEndArray();
            w.WriteEndObject();
        }

        return Encoding.UTF8.GetString(stream.ToArray()) + "\n";
    }

    /// <summary>The summary fields of one table (also used by `diff --json`).</summary>
    public static void WriteSummary(Utf8JsonWriter w, TableSummary r)
    {
        w.WriteNumber("pixel_time_s", r.PixelTimeS);
        w.WriteNumber("pixel_samples", r.PixelSamples);
        w.WriteStartArray("windows");
        foreach (var (first, last) in r.Windows)
        {
            w.WriteStartObject();
            w.WriteNumber("first_sample", first);
            w.WriteNumber("last_sample", last);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        w.WriteStartObject("read_noise_e");
        foreach (var (scheme, e) in r.Noise)
        {
            w.WriteNumber(scheme, e);
        }

        w.WriteEndObject();
        w.WriteString("chosen_scheme", r.ChosenScheme);
        w.WriteNumber("integer_penalty_percent", r.PenaltyPercent);
        w.WriteNumber("proof_margin_bits", r.MarginBits);
        w.WriteBoolean("safe", r.Safe);
        w.WriteNumber("coef_count", r.Coefficients.Count);
        w.WriteNumber("p", r.P);
        w.WriteNumber("shift", r.Shift);
        w.WriteNumber("post_multiplier", r.PostMultiplier);
        w.WriteNumber("output_frac_bits", r.OutputFracBits);
    }
}
