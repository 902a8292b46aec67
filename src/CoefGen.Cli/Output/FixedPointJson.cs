using System.Globalization;
using System.Text.Json;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Pipeline;

namespace CoefGen.Cli.Output;

/// <summary>The "fixed_point" object of the design JSON: settings, integer coefficients, proof.</summary>
internal static class FixedPointJson
{
    public static void Write(Utf8JsonWriter w, DesignResult r)
    {
        if (r.IsTwoStage)
        {
            TwoStageSettings(w, r);
            return;
        }

        var i = r.Datapath;
        w.WriteStartObject("fixed_point");
        w.WriteString("target", r.FixedPointSettings.TargetName);
        w.WriteString("scheme", DesignText.SchemeWord(r.Chosen.Scheme));
        w.WriteNumber("coef_bits", i.CoefBits);
        w.WriteNumber("sample_bits", i.SampleBits);
        w.WriteNumber("product_bits", i.ProductBits);
        w.WriteNumber("acc_bits", i.AccBits);
        w.WriteString("accumulator", i.Accumulator == AccumulatorMode.Wrap ? "wrap" : "saturate");
        w.WriteNumber("output_bits", i.OutputBits);
        w.WriteNumber("output_frac_bits", i.OutputFracBits);
        w.WriteString("rounding", DesignText.RoundingWord(i.Rounding));
        w.WriteString("normalize", i.Normalize == NormalizeMode.Shift ? "shift" : "exact");
        w.WriteNumber("p", i.P);
        w.WriteNumber("shift", i.Shift);
        w.WriteNumber("post_multiplier", i.PostMultiplier);
        w.WriteNumber("post_multiplier_bits", i.PostMultiplierBits);
        w.WriteString("rounding_constant", i.RoundingConstant.ToString(CultureInfo.InvariantCulture));
        w.WriteNumber("gain_error_ppm", i.GainErrorPpm);
        w.WriteNumber("noise_penalty_percent", i.NoisePenaltyPercent);
        w.WriteNumber("predicted_noise_output_lsb", i.PredictedNoiseOutputLsb);
        w.WriteStartArray("coefficients");
        foreach (var c in i.Coefficients)
        {
            w.WriteNumberValue(c);
        }

        w.WriteEndArray();
        Proof(w, i.Proof, withCodes: true);
        w.WriteEndObject();
    }

    /// <summary>With form = "two-stage" the settings only: the tables, shifts and proof are under "two_stage.integer".</summary>
    private static void TwoStageSettings(Utf8JsonWriter w, DesignResult r)
    {
        var s = r.FixedPointSettings;
        w.WriteStartObject("fixed_point");
        w.WriteString("target", s.TargetName);
        w.WriteString("scheme", DesignText.SchemeWord(r.Chosen.Scheme));
        w.WriteString("form", "two-stage");
        w.WriteNumber("coef_bits", s.CoefBits);
        w.WriteNumber("sample_bits", s.SampleBits);
        w.WriteNumber("acc_bits", s.AccBits);
        w.WriteString("accumulator", s.Accumulator == AccumulatorMode.Wrap ? "wrap" : "saturate");
        w.WriteNumber("output_bits", s.OutputBits);
        w.WriteString("rounding", DesignText.RoundingWord(s.Rounding));
        w.WriteBoolean("safe", r.Proof.Safe);
        w.WriteEndObject();
    }

    /// <summary>The "proof" object: safe, checks (with the worst-case codes when asked) and advice.</summary>
    public static void Proof(Utf8JsonWriter w, WidthProof proof, bool withCodes)
    {
        w.WriteStartObject("proof");
        w.WriteBoolean("safe", proof.Safe);
        w.WriteStartArray("checks");
        foreach (var c in proof.Checks)
        {
            w.WriteStartObject();
            w.WriteString("name", c.Name);
            w.WriteString("min", c.MinValue.ToString(CultureInfo.InvariantCulture));
            w.WriteString("max", c.MaxValue.ToString(CultureInfo.InvariantCulture));
            w.WriteNumber("required_bits", c.RequiredBits);
            w.WriteNumber("available_bits", c.AvailableBits);
            w.WriteNumber("margin_bits", c.MarginBits);
            w.WriteBoolean("fits", c.Fits);
            w.WriteBoolean("decides_safety", c.Required);
            if (withCodes && c.WorstCaseCodes is { } codes)
            {
                w.WriteStartArray("worst_case_codes");
                foreach (var code in codes)
                {
                    w.WriteNumberValue(code);
                }

                w.WriteEndArray();
            }

            w.WriteEndObject();
        }

        w.WriteEndArray();
        w.WriteStartArray("advice");
        foreach (var a in proof.Advice)
        {
            w.WriteStringValue(a);
        }

        w.WriteEndArray();
        w.WriteEndObject();
    }
}
