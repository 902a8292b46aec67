using System.Text;
using System.Text.Json;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.FixedPoint.TwoStage;
using CoefGen.Core.Pipeline;

namespace CoefGen.Cli.Output;

/// <summary>The two-stage form of repeated reads, real and integer, for `design` text and --json.</summary>
internal static class TwoStageOutput
{
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

    /// <summary>With form = "two-stage": both tables, real and integer (first and last entries unless all are asked for).</summary>
    public static void AppendTables(StringBuilder sb, DesignResult r, bool all)
    {
        var (real, d, layout) = r.TwoStage!;
        var s = r.FixedPointSettings;
        sb.Append($"Two-stage tables ({r.ChosenPrediction.Label} on target {s.TargetName}; g ~ c / 2^{d.P1}, a ~ w / 2^{d.P2} up to the normalisation to unit gain)\n");
        var table = new TextTable("entry", "offset", "g", "c");
        Rows(table, d.Table.Count, all, p => table.Add(Eng.Int(p), Eng.Int(layout.Offsets[p]), Eng.Num(real.PerReadTable[p], 6), Eng.Int(d.Table[p])));
        sb.Append(table.Render());
        var reads = new TextTable("read", "first sample", "a", "w");
        Rows(reads, d.ReadWeights.Count, all, j => reads.Add(Eng.Int(j), Eng.Int(r.Grid.SampleIndex[0] + (j * layout.Period)), Eng.Num(real.ReadWeights[j], 6), Eng.Int(d.ReadWeights[j])));
        sb.Append(reads.Render());
        if (!all)
        {
            sb.Append("  (--weights lists every entry; --json carries all of them for scripts)\n");
        }
    }

    private static void Rows(TextTable table, int count, bool all, Action<int> row)
    {
        const int Each = 3;
        for (var k = 0; k < count; k++)
        {
            if (!all && count > 2 * Each && k >= Each && k < count - Each)
            {
                if (k == Each)
                {
                    table.Add("...", "", "", "");
                }

                continue;
            }

            row(k);
        }
    }

    public static void Write(Utf8JsonWriter w, DesignResult r)
    {
        if (r.TwoStage is not { Real: var real, Quantised: var d })
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
