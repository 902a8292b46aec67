using System.Text;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Prediction;
using CoefGen.Core.Readout;

namespace CoefGen.Cli.Output;

/// <summary>The terminal text of a general cycle: its windows and, for ramps, the noise against the signal level.</summary>
internal static class CycleText
{
    /// <summary>Windows listed one per line up to this many; longer cycles show the first and last few.</summary>
    private const int ListedEach = 4;

    public static void AppendWindows(StringBuilder sb, ReadoutDescription d, CycleSpec cycle)
    {
        var a = d.Adc;
        var reads = cycle.RepeatCount > 1 ? $", {cycle.RepeatCount} repeated reads" : "";
        sb.Append($"  cycle     {d.Timing.PixelSamples} samples ({Eng.SiShort(d.Timing.PixelSamples / a.RateHz, "s")}), {cycle.Windows.Count} windows in {cycle.GroupCount} reset group{(cycle.GroupCount == 1 ? "" : "s")}{reads}, step {(d.Timing.Step == StepModel.Pole ? "pole" : "ideal")}\n");
        var windows = cycle.Windows;
        for (var i = 0; i < windows.Count; i++)
        {
            if (windows.Count > 2 * ListedEach && i >= ListedEach && i < windows.Count - ListedEach)
            {
                if (i == ListedEach)
                {
                    sb.Append($"  window    ... {windows.Count - (2 * ListedEach)} more ...\n");
                }

                continue;
            }

            var w = windows[i];
            var sees = w.Sees switch
            {
                ChargeSight.None => "no charge",
                ChargeSight.Transfer => $"charge after the transfer at {Eng.SiShort(w.ChargeTimeS, "s")}",
                _ => $"ramp integrating from {Eng.SiShort(w.ChargeTimeS, "s")}",
            };
            sb.Append($"  window    {w.Name}: samples {w.Samples.Start}..{w.Samples.End - 1} ({w.Samples.Count}), {sees}, reset group {w.ResetGroup}\n");
        }

        if (cycle.ReferenceTimeS is double reference)
        {
            sb.Append($"  estimate  charge collected in {Eng.SiShort(reference, "s")} (ramp reference time)\n");
        }

        if (cycle.ShotNoise is { } shot)
        {
            sb.Append($"  shot      photon flux {Eng.NumShort(shot.PhotonFluxEPerS)} e-/s + dark current {Eng.NumShort(shot.DarkCurrentEPerS)} e-/s (weights designed at this level; optimal solver dense: shot noise is not stationary)\n");
        }
    }

    public static void AppendSignalLevels(StringBuilder sb, DesignResult r)
    {
        var rows = r.CaptureCovariance is { } measured
            ? CoefGen.Core.Capture.CaptureSignalLevels.Compute(r.Grid, measured, r.Description, r.Chosen.H, r.Description.Weights.RejectDrift)
            : SignalLevelTable.Compute(r.Grid, r.Covariance, r.Description, r.Chosen.H, r.Description.Weights.RejectDrift);
        if (rows.Count < 2)
        {
            return;
        }

        var table = new TextTable("photon flux e-/s", "designed e- rms", "optimal here e- rms", "penalty");
        foreach (var row in rows)
        {
            table.Add(Eng.Num(row.PhotonFluxEPerS) + (row.IsDesignLevel ? " *" : ""), Eng.Num(row.DesignedSigmaE), Eng.Num(row.OptimalSigmaE), "x" + Eng.Num(row.DesignedSigmaE / row.OptimalSigmaE, 5));
        }

        sb.Append($"Noise against signal level of {r.Chosen.Label} (* = design level; electrons collected in the reference time)\n");
        sb.Append(table.Render());
        sb.Append('\n');
    }

    /// <summary>Repeated identical reads: the two-stage form (per-read table x per-read weights) and its penalty.</summary>
    public static void AppendTwoStage(StringBuilder sb, DesignResult r)
    {
        if (r.TwoStage is not { Real: var two, Quantised: var integer })
        {
            if (r.CaptureCovariance is not null && CoefGen.Core.Weights.TwoStage.ReadLayout.Of(r.Grid) is not null)
            {
                sb.Append("Two-stage form: not designed on a capture (its solver takes the model's per-read blocks); drop noise.capture to see it\n\n");
            }

            return;
        }

        var perElectron = r.Description.Sensor.VoltsAtAdcPerElectron;
        var sigma = Math.Sqrt(two.VarianceV2) / perElectron;
        // By scheme, not position: a file with [scenarios] puts the robust scheme last.
        var optimal = r.Predictions.First(p => p.Scheme == CoefGen.Core.Readout.WeightScheme.Optimal).SigmaElectrons;
        var average = r.Predictions[0].SigmaElectrons;
        sb.Append($"Two-stage form (one table of {two.PerReadTable.Length} weights per read x {two.ReadWeights.Length} read weights, designed jointly in {two.Iterations} alternating steps)\n");
        sb.Append($"  {Eng.Num(sigma)} e- rms: x{Eng.Num(sigma / optimal, 6)} of the full optimum ({Eng.Num(optimal)} e-), x{Eng.Num(sigma / average, 6)} of the plain average ({Eng.Num(average)} e-); {Role(r)}\n");
        TwoStageOutput.AppendInteger(sb, integer);
        sb.Append('\n');
    }

    private static string Role(DesignResult r) => r.IsTwoStage
        ? "the datapath (form = \"two-stage\"): quantised, proved below and emitted; the full table is not quantised"
        : "quantised and proved below, not emitted (the tables above are the full cycle's)";
}
