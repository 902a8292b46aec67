using System.Globalization;
using System.Text;

namespace CoefGen.Core.Readout;

/// <summary>
/// Writes a canonical readout file (all timing in samples, every default spelled out) that
/// <see cref="ReadoutLoader"/> loads back to an equal description. A measured spectrum is named by its
/// <see cref="PsdTable.Name"/>; <see cref="ToPsdCsv"/> writes the matching CSV (referred to the ADC).
/// </summary>
public static partial class ReadoutWriter
{
    public static string ToToml(ReadoutDescription description)
    {
        ArgumentNullException.ThrowIfNull(description);
        var w = new StringBuilder();
        Line(w, "name", Str(description.Name));
        WriteAdc(w, description.Adc, description.Sensor);
        WriteTiming(w, description.Timing, description.Adc.RateHz);
        WriteNoise(w, description.Noise);
        WriteWeights(w, description.Weights);
        WriteScenarios(w, description.Scenarios);
        WriteFixedPoint(w, description.FixedPoint);
        foreach (var emit in description.Emit)
        {
            w.Append("\n[[emit]]\n");
            Line(w, "template", Str(emit.Template));
            Line(w, "path", Str(emit.Path));
        }

        return w.ToString();
    }

    /// <summary>The CSV for a table: amplitude densities in nV/sqrt(Hz) at the ADC input (use psd_at = "adc").</summary>
    public static string ToPsdCsv(PsdTable table)
    {
        ArgumentNullException.ThrowIfNull(table);
        var w = new StringBuilder("frequency_hz, density_nv_per_rthz\n");
        for (var i = 0; i < table.FrequencyHz.Count; i++)
        {
            w.Append(Num(table.FrequencyHz[i])).Append(", ").Append(Num(Math.Sqrt(table.DensityV2PerHz[i]) * 1e9)).Append('\n');
        }

        return w.ToString();
    }

    private static void WriteAdc(StringBuilder w, AdcSpec adc, SensorSpec sensor)
    {
        w.Append("\n[adc]\n");
        Line(w, "rate_hz", Num(adc.RateHz));
        Line(w, "bits", adc.Bits.ToString(CultureInfo.InvariantCulture));
        Line(w, "full_scale_v", Num(adc.FullScaleV));
        Line(w, "coding", Str(adc.Coding == AdcCoding.TwosComplement ? "twos-complement" : "offset-binary"));
        Line(w, "noise_lsb", Num(adc.NoiseLsb));
        w.Append("\n[sensor]\n");
        Line(w, "conversion_gain_uv_per_e", Num(sensor.ConversionGainUvPerE));
        Line(w, "gain", Num(sensor.Gain));
    }

    private static void WriteTiming(StringBuilder w, TimingSpec timing, double rateHz)
    {
        if (timing.Cycle.AsTwoWindow() is not { } classic)
        {
            WriteCycle(w, timing, timing.Cycle, rateHz);
            return;
        }

        w.Append("\n[timing]\n");
        Line(w, "pixel_samples", Int(timing.PixelSamples));
        Line(w, "transfer_sample", Num(TransferSample(timing.TransferTimeS, rateHz)));
        Line(w, "step", Str(timing.Step == StepModel.Pole ? "pole" : "ideal"));
        foreach (var (name, window) in new[] { ("reset", classic.Reset), ("signal", classic.Signal) })
        {
            w.Append("\n[timing.").Append(name).Append("]\n");
            Line(w, "start", Int(window.Start));
            Line(w, "count", Int(window.Count));
        }
    }

    private static void WriteNoise(StringBuilder w, NoiseSpec noise)
    {
        w.Append("\n[noise]\n");
        if (noise.FrontEndPoleHz is { } pole)
        {
            Line(w, "front_end_pole_hz", Num(pole));
        }

        if (noise.BandwidthHz is { } bandwidth)
        {
            Line(w, "bandwidth_hz", Num(bandwidth));
        }

        if (noise.Table is not null)
        {
            Line(w, "psd_table", Str(noise.Table.Name));
            Line(w, "psd_at", Str("adc"));
        }

        if (noise.CapturePath is not null)
        {
            Line(w, "capture", Str(noise.CapturePath));
        }

        foreach (var source in noise.Sources)
        {
            w.Append("\n[[noise.source]]\n");
            Line(w, "name", Str(source.Name));
            Line(w, "at", Str(source.At == NoiseReference.Sensor ? "sensor" : "adc"));
            Line(w, "white_nv_per_rthz", Num(source.WhiteNvPerRtHz));
            Line(w, "flicker_corner_hz", Num(source.FlickerCornerHz));
            Line(w, "low_cutoff_hz", Num(source.LowCutoffHz));
        }
    }

    private static void WriteWeights(StringBuilder w, WeightsSpec weights)
    {
        w.Append("\n[weights]\n");
        Line(w, "scheme", Str(weights.Scheme.ToString().ToLowerInvariant()));
        Line(w, "window", Str(weights.Window.ToString().ToLowerInvariant()));
        if (weights.RampSamples > 0)
        {
            Line(w, "ramp_samples", Int(weights.RampSamples));
        }

        if (weights.ExplicitReset is not null)
        {
            Line(w, "reset", Array(weights.ExplicitReset));
        }

        if (weights.ExplicitSignal is not null)
        {
            Line(w, "signal", Array(weights.ExplicitSignal));
        }

        Line(w, "reject_drift", weights.RejectDrift ? "true" : "false");
        if (weights.Form == WeightsForm.TwoStage)
        {
            Line(w, "form", Str("two-stage"));
        }
    }

    /// <summary>Every scenario as an explicit case (ranges expanded, the nominal one written as a case without overrides).</summary>
    private static void WriteScenarios(StringBuilder w, ScenarioSpec? scenarios)
    {
        if (scenarios is null)
        {
            return;
        }

        w.Append("\n[scenarios]\n");
        Line(w, "objective", Str(scenarios.Objective switch { RobustObjective.Mean => "mean", RobustObjective.Regret => "regret", _ => "worst-case" }));
        Line(w, "include_nominal", "false");
        foreach (var scenario in scenarios.Cases)
        {
            w.Append("\n[[scenarios.case]]\n");
            Line(w, "name", Str(scenario.Name));
            foreach (var o in scenario.Overrides)
            {
                Line(w, Str(o.Key), Num(o.Value));
            }
        }
    }

    private static void WriteFixedPoint(StringBuilder w, FixedPointSpec fp)
    {
        w.Append("\n[fixed_point]\n");
        Optional(w, "target", fp.Target is null ? null : Str(fp.Target));
        Optional(w, "coef_bits", fp.CoefBits?.ToString(CultureInfo.InvariantCulture));
        Optional(w, "sample_bits", fp.SampleBits?.ToString(CultureInfo.InvariantCulture));
        Optional(w, "acc_bits", fp.AccBits?.ToString(CultureInfo.InvariantCulture));
        Optional(w, "output_bits", fp.OutputBits?.ToString(CultureInfo.InvariantCulture));
        Optional(w, "output_frac_bits", fp.OutputFracBits?.ToString(CultureInfo.InvariantCulture));
        Optional(w, "normalize", fp.Normalize is null ? null : Str(fp.Normalize));
        Optional(w, "rounding", fp.Rounding is null ? null : Str(fp.Rounding));
        Optional(w, "accumulator", fp.Accumulator is null ? null : Str(fp.Accumulator));
    }

    /// <summary>
    /// The sample position whose quotient by the rate is exactly the stored transfer time (the loader
    /// computes transfer_sample / rate): the shortest such number among t * rate, its neighbours a few
    /// ulps away and its decimal roundings; t * rate itself when none divides back exactly.
    /// </summary>
    private static double TransferSample(double transferTimeS, double rateHz)
    {
        var guess = transferTimeS * rateHz;
        var candidates = new List<double> { guess };
        var up = guess;
        var down = guess;
        for (var i = 0; i < 8; i++)
        {
            up = Math.BitIncrement(up);
            down = Math.BitDecrement(down);
            candidates.Add(up);
            candidates.Add(down);
        }

        for (var digits = 0; digits <= 15; digits++)
        {
            candidates.Add(Math.Round(guess, digits, MidpointRounding.AwayFromZero));
        }

        return candidates
            .Where(c => c >= 0 && c / rateHz == transferTimeS)
            .OrderBy(c => Num(c).Length)
            .ThenBy(c => Math.Abs(c - guess))
            .DefaultIfEmpty(guess)
            .First();
    }

    private static void Optional(StringBuilder w, string key, string? value)
    {
        if (value is not null)
        {
            Line(w, key, value);
        }
    }

    private static void Line(StringBuilder w, string key, string value) => w.Append(key).Append(" = ").Append(value).Append('\n');

    private static string Int(int value) => value.ToString(CultureInfo.InvariantCulture);

    /// <summary>Round-trip formatting; "R" never writes NaN or infinity for a valid description.</summary>
    private static string Num(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    private static string Array(IReadOnlyList<double> values) => "[" + string.Join(", ", values.Select(Num)) + "]";

    /// <summary>A TOML basic string with the escapes TOML requires.</summary>
    private static string Str(string value)
    {
        var w = new StringBuilder("\"");
        foreach (var c in value)
        {
            _ = c switch
            {
                '"' => w.Append("\\\""),
                '\\' => w.Append("\\\\"),
                '\n' => w.Append("\\n"),
                '\r' => w.Append("\\r"),
                '\t' => w.Append("\\t"),
                _ when char.IsControl(c) => w.Append("\\u").Append(((int)c).ToString("X4", CultureInfo.InvariantCulture)),
                _ => w.Append(c),
            };
        }

        return w.Append('"').ToString();
    }
}
