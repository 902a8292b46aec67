using System.Text;
using CoefGen.Core.Capture;
using CoefGen.Core.Readout;

namespace CoefGen.Cli.Output;

/// <summary>Terminal summary of `coefgen fit`.</summary>
internal static class FitText
{
    private static readonly string[] Header = ["scheme", "held-out e- rms", "95 % interval", "fitted model e-", "design-half e-"];

    public static string Render(ReadoutDescription d, CaptureAnalysisResult a)
    {
        var w = new StringBuilder();
        var s = a.Spectrum;
        var f = a.Fit;
        var layout = a.Capture.Layout == CaptureLayout.Stream ? "stream" : $"{a.Capture.Rows} pixel cycles of {a.Capture.CycleLength}";
        w.Append($"capture   {a.Capture.SourcePath}: {a.Capture.SampleCount} samples ({layout})\n");
        w.Append($"spectrum  Welch, Hann, 50 % overlap: {s.Segments} segments of {s.SegmentLength} ({Eng.Si(s.ResolutionHz, "Hz")} bins), {Eng.Num(s.DegreesOfFreedom)} degrees of freedom, {Eng.Num(s.Confidence * 100, 3)} % band x{Eng.Num(s.LowerV2PerHz[0] / s.PsdV2PerHz[0])}..x{Eng.Num(s.UpperV2PerHz[0] / s.PsdV2PerHz[0])}\n\n");
        w.Append("Fitted at the ADC input (1 sigma; digital floor fixed from [adc])\n");
        w.Append($"  white        {Eng.Num(f.WhiteNvPerRtHz)} +- {Eng.Num(f.WhiteNvPerRtHzSigma, 2)} nV/rtHz\n");
        w.Append(f.FlickerCornerSigmaHz is double fs
            ? $"  1/f corner   {Eng.Si(f.Model.FlickerCornerHz, "Hz")} +- {Eng.Si(fs, "Hz", 2)}\n"
            : "  1/f corner   not resolved by the spectrum (left out)\n");
        w.Append((f.Model.PoleHz, f.PoleSigmaHz) switch
        {
            (double p, double ps) => $"  pole         {Eng.Si(p, "Hz")} +- {Eng.Si(ps, "Hz", 2)}\n",
            (double p, null) => $"  pole         {Eng.Si(p, "Hz")} (held at noise.front_end_pole_hz)\n",
            _ => "  pole         not resolved by the spectrum (left out: white up to Nyquist)\n",
        });
        w.Append($"  floor        {Eng.Num(Math.Sqrt(f.Model.DigitalFloorV2PerHz) * 1e9)} nV/rtHz (quantisation + ADC noise)\n");
        w.Append($"  residual     {Eng.Num(f.ResidualRms)} rms in ln S (chi-square alone: {Eng.Num(f.ExpectedResidualRms)})\n");
        foreach (var line in f.Lines)
        {
            w.Append($"  line         {Eng.Si(line.FrequencyHz, "Hz")}: {Eng.Si(line.RmsV, "V")} rms, left out of the fit ({line.Bins} bins)\n");
        }

        w.Append("\nReady to paste into the readout file (replaces its [noise] section):\n\n");
        w.Append(FittedNoiseSection.ToToml(d, a));
        w.Append($"\nFor weights that stay good over the fit's uncertainty (each parameter ±{Eng.NumShort(FittedScenarioRange.Sigmas)} sigma; with weights.scheme = \"robust\"):\n\n");
        w.Append(FittedScenarioRange.ToToml(a));
        if (a.Validation.Count > 0)
        {
            var perE = d.Sensor.VoltsAtAdcPerElectron;
            w.Append($"\nHeld-out validation: designed on cycles 0..{a.DesignRows.Count - 1}, measured on {a.HeldOutRows.Count} held-out cycles; capture covariance shrinkage {Eng.Num(a.Covariance!.Shrinkage, 3)}\n");
            var table = new List<string[]> { Header };
            foreach (var v in a.Validation)
            {
                table.Add([v.Label, Eng.Num(v.MeasuredSigmaV / perE), $"{Eng.Num(v.LowerSigmaV / perE)}..{Eng.Num(v.UpperSigmaV / perE)}", Eng.Num(v.PredictedModelSigmaV / perE), Eng.Num(v.PredictedCaptureSigmaV / perE)]);
            }

            // 28 columns hold the classic labels (kept as they were, byte for byte); a cycle's longer labels widen the column.
            var longest = table.Max(r => r[0].Length);
            var labelWidth = !d.Timing.Cycle.IsClassic && longest > 28 ? longest + 1 : 28;
            foreach (var row in table)
            {
                w.Append("  ").Append(row[0].PadRight(labelWidth));
                for (var c = 1; c < row.Length; c++)
                {
                    w.Append(row[c].PadLeft(17));
                }

                w.Append('\n');
            }

            var lines = f.Lines.Count == 0 ? "" :
                $"; it leaves out the interference line{(f.Lines.Count > 1 ? "s" : "")} masked from the fit ({string.Join(", ", f.Lines.Select(l => $"{Eng.SiShort(l.FrequencyHz, "Hz")}, {Eng.SiShort(l.RmsV, "V")} rms"))}), which the held-out cycles contain";
            w.Append($"  fitted model e-: predicted from the fitted white + 1/f + pole model alone{lines}\n");
            w.Append("  design-half e-: predicted from the capture covariance of the design cycles, the one `design` uses with noise.capture\n");
        }

        return w.ToString();
    }
}
