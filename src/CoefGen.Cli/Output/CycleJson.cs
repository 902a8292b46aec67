using System.Text.Json;
using CoefGen.Core.Readout;

namespace CoefGen.Cli.Output;

/// <summary>readout.timing.cycle in `design --json`: the windows of a general cycle (absent for a two-window file).</summary>
internal static class CycleJson
{
    public static void Write(Utf8JsonWriter w, CycleSpec cycle)
    {
        w.WriteStartObject("cycle");
        w.WriteNumber("group_count", cycle.GroupCount);
        w.WriteNumber("repeat_count", cycle.RepeatCount);
        if (cycle.ReferenceTimeS is double reference)
        {
            w.WriteNumber("reference_time_s", reference);
        }

        if (cycle.ShotNoise is { } shot)
        {
            w.WriteNumber("photon_flux_e_per_s", shot.PhotonFluxEPerS);
            w.WriteNumber("dark_current_e_per_s", shot.DarkCurrentEPerS);
        }

        w.WriteStartArray("windows");
        foreach (var window in cycle.Windows)
        {
            w.WriteStartObject();
            w.WriteString("name", window.Name);
            w.WriteNumber("start", window.Samples.Start);
            w.WriteNumber("count", window.Samples.Count);
            w.WriteString("sees", ChargeSightWords.Word(window.Sees));
            w.WriteNumber("charge_time_s", window.ChargeTimeS);
            w.WriteNumber("group", window.ResetGroup);
            w.WriteNumber("read", window.Read);
            w.WriteEndObject();
        }

        w.WriteEndArray();
        w.WriteEndObject();
    }
}
