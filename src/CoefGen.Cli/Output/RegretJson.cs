using System.Text.Json;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;

namespace CoefGen.Cli.Output;

/// <summary>The "scenarios" object of `design --json` (written only when the readout names noise scenarios).</summary>
internal static class RegretJson
{
    public static void Write(Utf8JsonWriter w, DesignResult r)
    {
        if (r.Regret is not { } t)
        {
            return;
        }

        var robust = t.Robust;
        w.WriteStartObject("scenarios");
        w.WriteString("objective", robust.Objective switch { RobustObjective.Mean => "mean", RobustObjective.Regret => "regret", _ => "worst-case" });
        if (t.VariedKey is null)
        {
            w.WriteNull("varied_key");
        }
        else
        {
            w.WriteString("varied_key", t.VariedKey);
        }

        w.WriteStartArray("cases");
        for (var i = 0; i < t.Scenarios.Count; i++)
        {
            var s = t.Scenarios[i];
            w.WriteStartObject();
            w.WriteString("name", s.Name);
            w.WriteStartObject("overrides");
            foreach (var o in s.Overrides)
            {
                w.WriteNumber(o.Key, o.Value);
            }

            w.WriteEndObject();
            if (t.VariedValues is { } values)
            {
                w.WriteNumber("varied_value", values[i]);
            }

            w.WriteNumber("optimum_e_rms", t.OptimumElectrons[i]);
            w.WriteNumber("robust_lambda", robust.Lambda[i]);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        w.WriteStartObject("robust_solve");
        w.WriteNumber("optimal_solves", robust.Solves);
        w.WriteNumber("dual_bound", robust.DualBound);
        if (robust.RelativeGap is double gap)
        {
            w.WriteNumber("relative_duality_gap", gap);
        }
        else
        {
            w.WriteNull("relative_duality_gap");
        }

        w.WriteEndObject();
        w.WriteStartArray("regret");
        foreach (var row in t.Rows)
        {
            w.WriteStartObject();
            w.WriteString("scheme", DesignText.SchemeWord(row.Scheme));
            w.WriteString("label", row.Label);
            DesignJson.Numbers(w, "noise_e_rms", row.SigmaElectrons);
            DesignJson.Numbers(w, "ratio_to_optimum", row.Ratio);
            w.WriteNumber("worst_noise_e_rms", row.WorstElectrons);
            w.WriteNumber("mean_noise_e_rms", row.MeanElectrons);
            w.WriteNumber("worst_ratio", row.WorstRatio);
            w.WriteNumber("mean_ratio", row.MeanRatio);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        w.WriteEndObject();
    }
}
