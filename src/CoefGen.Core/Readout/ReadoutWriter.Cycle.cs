using System.Globalization;
using System.Text;

namespace CoefGen.Core.Readout;

/// <summary>The general cycle in canonical form: every window spelled out in samples (a repetition is written expanded).</summary>
public static partial class ReadoutWriter
{
    private static void WriteCycle(StringBuilder w, TimingSpec timing, CycleSpec cycle, double rateHz)
    {
        w.Append("\n[timing]\n");
        Line(w, "pixel_samples", Int(timing.PixelSamples));
        Line(w, "step", Str(timing.Step == StepModel.Pole ? "pole" : "ideal"));
        foreach (var window in cycle.Windows)
        {
            w.Append("\n[[timing.window]]\n");
            Line(w, "name", Str(window.Name));
            Line(w, "start", Int(window.Samples.Start));
            Line(w, "count", Int(window.Samples.Count));
            Line(w, "sees", Str(ChargeSightWords.Word(window.Sees)));
            if (window.Sees == ChargeSight.Transfer)
            {
                Line(w, "transfer_sample", Num(TransferSample(window.ChargeTimeS, rateHz)));
            }

            Line(w, "group", Int(window.ResetGroup));
        }

        if (cycle.ReferenceTimeS is not double reference)
        {
            return;
        }

        w.Append("\n[integration]\n");
        var ramp = cycle.Windows.First(x => x.Sees == ChargeSight.Ramp);
        Line(w, "start_sample", Num(TransferSample(ramp.ChargeTimeS, rateHz)));
        Line(w, "reference_samples", Num(TransferSample(reference, rateHz)));
        if (cycle.ShotNoise is { } shot)
        {
            Line(w, "photon_flux_e_per_s", Num(shot.PhotonFluxEPerS));
            Line(w, "dark_current_e_per_s", Num(shot.DarkCurrentEPerS));
            if (shot.LevelsEPerS.Count > 0)
            {
                Line(w, "levels_e_per_s", Array(shot.LevelsEPerS));
            }
        }
    }
}
