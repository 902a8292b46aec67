using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using CoefGen.Core.Study;

namespace CoefGen.Cli.Output;

/// <summary>The sweep and search answers as JSON (schema coefgen.sweep/1); doubles in shortest round-trip form.</summary>
internal static class SweepJson
{
    public const string Schema = "coefgen.sweep/1";

    public static string Render(SweepResult? sweep, TargetNoiseResult? target, SplitResult? split, ReadCountTargetResult? readTarget = null)
    {
        using var stream = new MemoryStream();
        var options = new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping, NewLine = "\n" };
        using (var w = new Utf8JsonWriter(stream, options))
        {
            w.WriteStartObject();
            w.WriteString("schema", Schema);
            if (sweep is not null)
            {
                w.WriteStartArray("axes");
                foreach (var a in sweep.Axes)
                {
                    w.WriteStartObject();
                    w.WriteString("key", a.Key);
                    DesignJson.Numbers(w, "values", a.Values);
                    w.WriteEndObject();
                }

                w.WriteEndArray();
                w.WriteStartArray("points");
                foreach (var p in sweep.Points)
                {
                    w.WriteStartObject();
                    w.WriteNumber("index", p.Index);
                    DesignJson.Numbers(w, "values", p.Values);
                    Outcome(w, p.Outcome);
                    w.WriteEndObject();
                }

                w.WriteEndArray();
            }

            if (target is not null)
            {
                w.WriteStartObject("target_noise");
                TargetHead(w, target.TargetElectrons, target.Scheme, null, "window_count", target.WindowCount, target.Monotone, target.Note);
                Trials(w, "trials", target.Trials);
                w.WriteEndObject();
            }

            if (readTarget is not null)
            {
                ReadCountTarget(w, readTarget);
            }

            if (split is not null)
            {
                w.WriteStartObject("split_pixel_time");
                w.WriteString("scheme", DesignText.SchemeWord(split.Scheme));
                w.WriteNumber("pixel_samples", split.PixelSamples);
                if (split.ReadPeriodSamples is int period)
                {
                    // A general cycle: the split fills one read period, and every read takes it.
                    w.WriteNumber("read_period_samples", period);
                    w.WriteNumber("read_count", split.ReadCount);
                }

                w.WriteNumber("trial_count", split.TrialCount);
                w.WriteString("note", split.Note);
                Trials(w, "best", split.Best is null ? [] : [split.Best]);
                Trials(w, "neighbours", split.Neighbours);
                w.WriteEndObject();
            }

            w.WriteEndObject();
        }

        return Encoding.UTF8.GetString(stream.ToArray()) + "\n";
    }

    /// <summary>The target search of a general cycle, over the read count: the shape of the two-window "target_noise" with N in reads.</summary>
    private static void ReadCountTarget(Utf8JsonWriter w, ReadCountTargetResult r)
    {
        w.WriteStartObject("target_noise");
        TargetHead(w, r.TargetElectrons, r.Scheme, r.Axis.Key, "read_count", r.Reads, r.Monotone, r.Note);
        w.WriteStartArray("trials");
        foreach (var t in r.Trials)
        {
            w.WriteStartObject();
            w.WriteNumber("read_count", t.Reads);
            w.WriteNumber("cycle_pixel_samples", t.PixelSamples);
            Outcome(w, t.Outcome);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        w.WriteEndObject();
    }

    /// <summary>The members of "target_noise" before its trials; <paramref name="varies"/> only for a general cycle.</summary>
    private static void TargetHead(Utf8JsonWriter w, double targetElectrons, CoefGen.Core.Readout.WeightScheme scheme, string? varies, string countName, int? count, bool monotone, string note)
    {
        w.WriteNumber("target_e_rms", targetElectrons);
        w.WriteString("scheme", DesignText.SchemeWord(scheme));
        if (varies is not null)
        {
            w.WriteString("varies", varies);
        }

        if (count is int n)
        {
            w.WriteNumber(countName, n);
        }
        else
        {
            w.WriteNull(countName);
        }

        w.WriteBoolean("monotone", monotone);
        w.WriteString("note", note);
    }

    private static void Trials(Utf8JsonWriter w, string name, IEnumerable<WindowTrial> trials)
    {
        w.WriteStartArray(name);
        foreach (var t in trials)
        {
            w.WriteStartObject();
            w.WriteNumber("reset_start", t.Layout.LeadSamples);
            w.WriteNumber("reset_count", t.Layout.ResetCount);
            w.WriteNumber("transfer_sample", t.Layout.TransferSample);
            w.WriteNumber("dead_samples", t.Layout.DeadSamples);
            w.WriteNumber("signal_start", t.Layout.SignalStart);
            w.WriteNumber("signal_count", t.Layout.SignalCount);
            Outcome(w, t.Outcome);
            w.WriteEndObject();
        }

        w.WriteEndArray();
    }

    private static void Outcome(Utf8JsonWriter w, PointOutcome o)
    {
        w.WriteBoolean("valid", o.Valid);
        if (o.Valid)
        {
            w.WriteStartArray("schemes");
            foreach (var s in o.Schemes)
            {
                w.WriteStartObject();
                w.WriteString("scheme", DesignText.SchemeWord(s.Scheme));
                w.WriteString("label", s.Label);
                w.WriteNumber("noise_e_rms", s.NoiseElectrons);
                w.WriteNumber("noise_adu_rms", s.NoiseAdu);
                if (s.WorstRegret is double regret)
                {
                    w.WriteNumber("worst_regret", regret);
                }
                w.WriteEndObject();
            }

            w.WriteEndArray();
            w.WriteString("chosen", DesignText.SchemeWord(o.Chosen));
            w.WriteBoolean("safe", o.Safe);
            w.WriteNumber("gain_error_ppm", o.GainErrorPpm);
            w.WriteNumber("noise_penalty_percent", o.NoisePenaltyPercent);
            w.WriteNumber("pixel_samples", o.PixelSamples);
            w.WriteNumber("pixel_time_s", o.PixelTimeS);
        }

        w.WriteStartArray("diagnostics");
        foreach (var d in o.Diagnostics)
        {
            w.WriteStringValue(d.ToString());
        }

        w.WriteEndArray();
    }
}
