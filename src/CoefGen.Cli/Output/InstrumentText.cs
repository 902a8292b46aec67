using System.Text;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Instrument;

namespace CoefGen.Cli.Output;

/// <summary>The terminal summary of an instrument: one row per mode x channel table, then the shared datapath and its proof.</summary>
internal static class InstrumentText
{
    public static string Render(InstrumentDesign design)
    {
        var s = design.Settings;
        var sb = new StringBuilder();
        sb.Append($"{design.Spec.Name}  (instrument {design.Spec.SourcePath}, base {design.BasePath}, sha256 {design.BaseSha256[..12]})\n");
        sb.Append($"  {Eng.Int(design.Spec.Modes.Count)} modes x {Eng.Int(design.Spec.Channels.Count)} channels, {Eng.Int(design.Tables.Count)} tables for one datapath on {s.TargetName}\n\n");

        var rows = TableSummary.Of(design);
        var schemes = rows[0].Noise.Select(n => n.Scheme).ToArray();
        var t = new TextTable(["table", "pixel", "samples", "windows", .. schemes.Select(n => n + " e-"), "chosen", "penalty %", "coefs", "P", "shift", "margin"]);
        foreach (var r in rows)
        {
            t.Add([r.Label, Eng.SiShort(r.PixelTimeS, "s"), Eng.Int(r.PixelSamples), Windows(r),
                .. r.Noise.Select(n => Eng.Num(n.Electrons)), FirstWord(r.ChosenScheme), Eng.Num(r.PenaltyPercent, 3),
                Eng.Int(r.Coefficients.Count), Eng.Int(r.P), Eng.Int(r.Shift), Margin(r.MarginBits)]);
        }

        sb.Append("Tables (read noise in e- rms at the sense node; margin = fewest spare bits of any check that decides safety, the coefficient aside (it uses its full width by construction))\n");
        sb.Append(t.Render());
        sb.Append('\n');
        sb.Append($"Shared datapath: coefficients {s.CoefBits} bits, samples {s.SampleBits} bits, accumulator {s.AccBits} bits ({ModeNames.Name(s.Accumulator)}), ");
        sb.Append($"output {s.OutputBits} bits with {design.OutputFracBits} fractional bits, rounding {ModeNames.Name(s.Rounding)}; {(s.Normalize == NormalizeMode.Shift ? "shift" : "post-multiplier and shift")} per table\n");
        var w = new TextTable("check", "needs", "has", "margin", "widest table") { LeftAlignLast = true };
        foreach (var x in design.Widths)
        {
            var who = x.ForcedByOneTable ? $"{x.WidestTable} (the least any table needs: {Eng.Int(x.NarrowestRequiredBits)})" : "all tables alike";
            w.Add(CheckLabel.Of(x.Name), Eng.Int(x.RequiredBits), Eng.Int(x.AvailableBits), Margin(x.MarginBits) + (x.Required ? "" : " (not needed)"), who);
        }

        sb.Append(w.Render());
        var bad = design.Tables.Where(x => !x.Result.Datapath.Proof.Safe).Select(x => x.Label).ToArray();
        sb.Append(bad.Length == 0
            ? "  proof        SAFE for every input inside the ADC range, in every table\n"
            : $"  proof        NOT SAFE in {string.Join(", ", bad)}: run `coefgen design` on the table for the advice\n");
        return sb.ToString();
    }

    public static string Windows(TableSummary r) => string.Join(" ", r.Windows.Select(w => $"{Eng.Int(w.First)}..{Eng.Int(w.Last)}"));

    private static string Margin(int bits) => bits >= 0 ? "+" + Eng.Int(bits) : Eng.Int(bits);

    private static string FirstWord(string label) => label.Split(' ')[0];
}
