using System.Text;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;

namespace CoefGen.Cli.Output;

/// <summary>The integer design and its width proof, as a table with margins.</summary>
internal static class FixedPointText
{
    public static void Append(StringBuilder sb, DesignResult r)
    {
        var i = r.Datapath;
        var s = r.FixedPointSettings;
        sb.Append($"Fixed point ({r.ChosenPrediction.Label} on target {s.TargetName})\n");
        sb.Append($"  coefficients {i.Coefficients.Count} x {i.CoefBits} bits, scale P = {i.P}; samples {i.SampleBits} bits ({DesignText.CodingWord(i.Coding)}); products {i.ProductBits} bits; accumulator {i.AccBits} bits, {(i.Accumulator == AccumulatorMode.Wrap ? "wrap-around" : "saturating")}\n");
        var post = i.Normalize == NormalizeMode.Shift ? "" : $" x {i.PostMultiplier} ({i.PostMultiplierBits} bits)";
        sb.Append($"  output       acc{post} >> {i.Shift}, rounding {DesignText.RoundingWord(i.Rounding)}, saturated to {i.OutputBits} bits with {i.OutputFracBits} fractional bits (1 output LSB = 2^-{i.OutputFracBits} ADU)\n");
        sb.Append($"  gain error   {Eng.Num(i.GainErrorPpm, 4)} ppm;  integer noise penalty {Eng.Num(i.NoisePenaltyPercent, 3)} %;  predicted output noise {Eng.Num(i.PredictedNoiseOutputLsb)} output LSB rms\n");
        var g = r.Grid;
        if (g.Windows.Any(w => w.Sees == ChargeSight.Ramp) && i.Normalize == NormalizeMode.Shift && Math.Abs(i.GainErrorPpm) >= 1)
        {
            sb.Append("  note         ramp windows: the gain sum c s = sum c (t - t0) / T_ref is not a sum of pinned integer counts (only sum c = 0 per reset group is), so the gain error is that of rounding; " +
                "normalize = \"exact\" corrects it with a post-multiplier\n");
        }
        else if (i.Normalize == NormalizeMode.Shift && Math.Abs(i.GainErrorPpm) >= 1)
        {
            var least = Enumerable.Range(0, g.Count).Where(k => g.SightOf(k) == ChargeSight.Transfer).Min(k => g.Step[k]);
            sb.Append($"  note         the gain error comes from partial settling (smallest signal-window step response {Eng.Num(least, 6)}); " +
                "normalize = \"exact\" corrects it with a post-multiplier, a later signal window removes it\n");
        }

        var table = new TextTable("check", "min", "max", "needs", "has", "margin", "");
        foreach (var c in i.Proof.Checks)
        {
            if (c.Name == "post_multiply" && i.PostMultiplier == 1)
            {
                continue; // no post-multiplier is built in shift mode
            }

            var verdict = c.Fits ? "ok" : c.Required ? "DOES NOT FIT" : "exceeds (not needed for this accumulator)";
            table.Add(CheckLabel.Of(c.Name), Eng.Int(c.MinValue), Eng.Int(c.MaxValue), Eng.Int(c.RequiredBits), Eng.Int(c.AvailableBits), (c.MarginBits >= 0 ? "+" : "") + Eng.Int(c.MarginBits), verdict);
        }

        sb.Append(table.Render());
        sb.Append(i.Proof.Safe
            ? "  proof        SAFE for every input inside the ADC range\n"
            : "  proof        NOT SAFE: the datapath can overflow for some inputs inside the ADC range\n");
        foreach (var advice in i.Proof.Advice)
        {
            sb.Append($"  change       {advice}\n");
        }

        sb.Append('\n');
    }
}
