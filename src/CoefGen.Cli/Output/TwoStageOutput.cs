using System.Text;
using System.Text.Json;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.FixedPoint.TwoStage;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Weights.TwoStage;

namespace CoefGen.Cli.Output;

/// <summary>The two-stage form of repeated reads, real and integer, for `design` text and --json.</summary>
internal static class TwoStageOutput
{
    /// <summary>
    /// Null when the cycle has no two-stage form, and for a design on a capture (noise.capture): the two-stage solver
    /// works on the model's Toeplitz blocks, not on a measured matrix, and its noise would not compare with the capture's.
    /// </summary>
    public static (TwoStageResult Real, TwoStageIntegerDesign Integer)? Of(DesignResult r)
    {
        if (r.CaptureCovariance is not null)
        {
            return null;
        }

        var two = TwoStageWeights.Design(r.Grid, r.Covariance, r.Description.Weights.RejectDrift);
        return two is null ? null : (two, TwoStageIntegerDesigner.Design(r.Grid, r.Covariance, two, r.Description.Adc, r.FixedPointSettings));
    }

    public static void AppendInteger(StringBuilder sb, TwoStageIntegerDesign d)
    {
        sb.Append($"  integer form: table of {d.Table.Count} coefficients at 2^{d.P1} (sum {Eng.Int(d.Table.Sum())}), {d.ReadWeights.Count} read weights at 2^{d.P2}; r_j = round(acc1_j / 2^{d.Stage1Shift}); out = round(acc2 / 2^{d.Shift}), {d.OutputFracBits} fraction bits\n");
        sb.Append($"  gain error {Eng.Num(d.GainErrorPpm)} ppm, noise penalty against the real two-stage weights {Eng.Num(d.NoisePenaltyPercent, 4)} %\n");
        var table = new TextTable("check", "min", "max", "needs", "has", "margin", "");
        foreach (var c in d.Proof.Checks)
        {
            var verdict = c.Fits ? "ok" : c.Required ? "DOES NOT FIT" : "exceeds (not needed for this accumulator)";
            table.Add(CheckLabel.Of(c.Name), Eng.Int(c.MinValue), Eng.Int(c.MaxValue), Eng.Int(c.RequiredBits), Eng.Int(c.AvailableBits), (c.MarginBits >= 0 ? "+" : "") + Eng.Int(c.MarginBits), verdict);
        }

        sb.Append(table.Render());
        sb.Append(d.Proof.Safe
            ? "  two-stage proof SAFE for every input inside the ADC range\n"
            : "  two-stage proof NOT SAFE: the datapath can overflow for some inputs inside the ADC range\n");
        foreach (var advice in d.Proof.Advice)
        {
            sb.Append($"  change       {advice}\n");
        }
    }

    public static void Write(Utf8JsonWriter w, DesignResult r)
    {
        if (Of(r) is not var (real, d))
        {
            return;
        }

        w.WriteStartObject("two_stage");
        w.WriteNumber("iterations", real.Iterations);
        w.WriteNumber("sigma_e", Math.Sqrt(real.VarianceV2) / r.Description.Sensor.VoltsAtAdcPerElectron);
        Numbers(w, "per_read_table", real.PerReadTable);
        Numbers(w, "read_weights", real.ReadWeights);
        w.WriteStartObject("integer");
        w.WriteNumber("p1", d.P1);
        w.WriteNumber("p2", d.P2);
        w.WriteNumber("stage1_shift", d.Stage1Shift);
        w.WriteNumber("shift", d.Shift);
        w.WriteNumber("output_frac_bits", d.OutputFracBits);
        w.WriteNumber("stage1_acc_bits", d.Stage1AccBits);
        w.WriteNumber("gain_error_ppm", d.GainErrorPpm);
        w.WriteNumber("noise_penalty_percent", d.NoisePenaltyPercent);
        Integers(w, "per_read_table", d.Table);
        Integers(w, "read_weights", d.ReadWeights);
        // The worst-case codes (one whole cycle per check) are left out of the JSON; the proof carries them.
        FixedPointJson.Proof(w, d.Proof, withCodes: false);
        w.WriteEndObject();
        w.WriteEndObject();
    }

    private static void Numbers(Utf8JsonWriter w, string name, IEnumerable<double> values)
    {
        w.WriteStartArray(name);
        foreach (var v in values)
        {
            w.WriteNumberValue(v);
        }

        w.WriteEndArray();
    }

    private static void Integers(Utf8JsonWriter w, string name, IEnumerable<long> values)
    {
        w.WriteStartArray(name);
        foreach (var v in values)
        {
            w.WriteNumberValue(v);
        }

        w.WriteEndArray();
    }
}
