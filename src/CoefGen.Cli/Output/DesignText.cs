using System.Text;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;

namespace CoefGen.Cli.Output;

/// <summary>The terminal summary of a design: what was understood, noise side by side, budget, integer design.</summary>
internal static class DesignText
{
    public static string Render(DesignResult r, bool allWeights)
    {
        var d = r.Description;
        var sb = new StringBuilder();
        sb.Append($"{d.Name}  ({d.SourcePath}, sha256 {d.ContentSha256[..12]})\n\n");
        DescribeReadout(sb, d, r);
        NoiseTable(sb, r);
        RegretText.Append(sb, r);
        Budget(sb, r);
        CycleText.AppendSignalLevels(sb, r);
        CycleText.AppendTwoStage(sb, r);
        if (r.IsTwoStage)
        {
            TwoStageOutput.AppendTables(sb, r, allWeights);
        }
        else
        {
            FixedPointText.Append(sb, r);
            WeightsText.Append(sb, r, allWeights);
        }

        return sb.ToString();
    }

    private static void DescribeReadout(StringBuilder sb, ReadoutDescription d, DesignResult r)
    {
        var a = d.Adc;
        var t = d.Timing;
        sb.Append("Readout\n");
        sb.Append($"  ADC       {a.Bits} bits at {Eng.SiShort(a.RateHz, "S/s")}, {Eng.NumShort(a.FullScaleV)} V span (LSB {Eng.SiShort(a.LsbV, "V")}), {CodingWord(a.Coding)}, own noise {Eng.NumShort(a.NoiseLsb)} LSB rms\n");
        sb.Append($"  sensor    {Eng.NumShort(d.Sensor.ConversionGainUvPerE)} uV/e- x gain {Eng.NumShort(d.Sensor.Gain)} = {Eng.SiShort(d.Sensor.VoltsAtAdcPerElectron, "V")}/e- at the ADC\n");
        if (t.Cycle.AsTwoWindow() is not { } classic)
        {
            CycleText.AppendWindows(sb, d, t.Cycle);
        }
        else
        {
            sb.Append($"  cycle     {t.PixelSamples} samples ({Eng.SiShort(t.PixelSamples / a.RateHz, "s")}), transfer at {Eng.SiShort(t.TransferTimeS, "s")}, step {StepWord(d)}\n");
            sb.Append($"  reset     samples {classic.Reset.Start}..{classic.Reset.End - 1} ({classic.Reset.Count}, {Eng.SiShort(classic.Reset.Count / a.RateHz, "s")})\n");
            sb.Append($"  signal    samples {classic.Signal.Start}..{classic.Signal.End - 1} ({classic.Signal.Count}, {Eng.SiShort(classic.Signal.Count / a.RateHz, "s")})\n");
        }

        foreach (var line in t.Rounding)
        {
            sb.Append($"  rounding  {line}\n");
        }

        var n = d.Noise;
        foreach (var s in n.Sources)
        {
            var flicker = s.FlickerCornerHz > 0 ? $", 1/f corner {Eng.SiShort(s.FlickerCornerHz, "Hz")} above {Eng.SiShort(s.LowCutoffHz, "Hz")}" : "";
            sb.Append($"  noise     {s.Name} at the {(s.At == NoiseReference.Sensor ? "sensor" : "ADC")}: {Eng.NumShort(s.WhiteNvPerRtHz)} nV/rtHz{flicker}\n");
        }

        if (r.CaptureSource is not null)
        {
            sb.Append($"  noise     {r.CaptureSource}; every prediction below uses this covariance\n");
        }

        if (n.Table is not null)
        {
            sb.Append($"  noise     measured spectrum {n.Table.Name}: {n.Table.FrequencyHz.Count} points, {Eng.SiShort(n.Table.FrequencyHz[0], "Hz")} to {Eng.SiShort(n.Table.FrequencyHz[^1], "Hz")} (flat below, f^-2 above)\n");
        }

        var shaping = new List<string>();
        if (n.FrontEndPoleHz is double fp)
        {
            shaping.Add($"front-end pole {Eng.SiShort(fp, "Hz")}");
        }

        if (n.BandwidthHz is double fb)
        {
            shaping.Add($"brick-wall bandwidth {Eng.SiShort(fb, "Hz")}");
        }

        if (shaping.Count > 0)
        {
            sb.Append($"  shaping   {string.Join(", ", shaping)}\n");
        }

        sb.Append($"  weights   scheme {SchemeWord(d.Weights.Scheme)} goes to fixed point; drift rejection {(d.Weights.RejectDrift ? "on" : "off")}; optimal solver: {r.OptimalSolver}\n\n");
    }

    private static void NoiseTable(StringBuilder sb, DesignResult r)
    {
        var optimal = r.Predictions.First(p => p.Scheme == WeightScheme.Optimal).SigmaV;
        var table = new TextTable("scheme", "V rms", "ADU rms", "e- rms", "vs optimal", "time vs freq");
        for (var i = 0; i < r.Predictions.Count; i++)
        {
            var p = r.Predictions[i];
            var mark = i == r.ChosenIndex ? " *" : "";
            var agreement = p.FrequencyDomainRelativeDifference is double a ? Eng.Num(a, 2) : "skipped";
            table.Add(p.Label + mark, Eng.Si(p.SigmaV, "V"), Eng.Num(p.SigmaAdu), Eng.Num(p.SigmaElectrons), "x" + Eng.Num(p.SigmaV / optimal, 5), agreement);
        }

        sb.Append("Read noise (* = chosen; time vs freq = relative difference of h'Rh and the frequency-domain integral)\n");
        sb.Append(table.Render());
        sb.Append('\n');
    }

    private static void Budget(StringBuilder sb, DesignResult r)
    {
        var p = r.ChosenPrediction;
        var table = new TextTable("source", "share", "e- rms alone");
        foreach (var b in p.Budget)
        {
            var alone = Math.Sqrt(Math.Max(0, b.VarianceV2)) / r.Description.Sensor.VoltsAtAdcPerElectron;
            table.Add(b.Source, Eng.Percent(b.Share), Eng.Num(alone));
        }

        sb.Append($"Noise budget of {p.Label} (variance shares)\n");
        sb.Append(table.Render());
        sb.Append('\n');
    }

    internal static string CodingWord(AdcCoding c) => c == AdcCoding.TwosComplement ? "twos-complement" : "offset-binary";

    internal static string SchemeWord(WeightScheme s) => s switch
    {
        WeightScheme.Boxcar => "boxcar",
        WeightScheme.Weighted => "weighted",
        WeightScheme.Robust => "robust",
        _ => "optimal",
    };

    private static string StepWord(ReadoutDescription d) =>
        d.Timing.Step == StepModel.Pole && d.Noise.FrontEndPoleHz is double fp ? $"settles through the {Eng.SiShort(fp, "Hz")} pole" : "ideal";

    internal static string RoundingWord(RoundingMode m) => m switch
    {
        RoundingMode.HalfUp => "half-up",
        RoundingMode.HalfEven => "half-even",
        _ => "truncate",
    };
}
