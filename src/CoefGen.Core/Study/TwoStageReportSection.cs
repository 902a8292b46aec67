using CoefGen.Core.FixedPoint;
using CoefGen.Core.Formatting;
using CoefGen.Core.Pipeline;

namespace CoefGen.Core.Study;

/// <summary>
/// The report's two-stage section (form = "two-stage"): what the datapath computes, its noise against the full optimum
/// and the plain average, both integer tables and the proof of both stages. Every number cell names its path in
/// `design --json` ("two_stage", "schemes").
/// </summary>
public static class TwoStageReportSection
{
    /// <summary>The section, or null unless the two-stage form is the design's datapath.</summary>
    public static ReportSection? For(DesignResult r)
    {
        ArgumentNullException.ThrowIfNull(r);
        if (!r.IsTwoStage || r.TwoStage is not { } two)
        {
            return null;
        }

        var q = two.Quantised;
        var layout = two.Layout;
        var perElectron = r.Description.Sensor.VoltsAtAdcPerElectron;
        var sigma = Math.Sqrt(two.Real.VarianceV2) / perElectron;
        var optimalIndex = r.Weights.ToList().FindIndex(w => w.Scheme == Readout.WeightScheme.Optimal);
        var optimal = r.Predictions[optimalIndex].SigmaElectrons;
        var average = r.Predictions[0].SigmaElectrons;
        string I(long v) => Human.Whole(v);
        var rounding = q.Rounding switch
        {
            RoundingMode.HalfUp => "rounded half up",
            RoundingMode.HalfEven => "rounded to nearest, ties to even",
            _ => "truncated (floor)",
        };
        var lines = new List<string>
        {
            $"x_jp   = ADC code of entry p of read j at cycle sample {I(r.Grid.SampleIndex[0])} + {I(layout.Period)} j + o_p; j = 0 .. {I(layout.Reads - 1)}, p = 0 .. {I(layout.PerRead - 1)}",
            $"acc1_j = sum_p g_p * x_jp   with g_p = round(table_p * 2^P1), P1 = {I(q.P1)}, exact in {I(q.Stage1AccBits)} bits (sum g = 0 over each reset of the read)",
            $"r_j    = acc1_j / 2^s1      with s1 = {I(q.Stage1Shift)}, {rounding}",
            $"acc2   = sum_j w_j * r_j    with w_j = round(a_j * 2^P2), P2 = {I(q.P2)}, {I(q.AccBits)}-bit accumulator that {(r.FixedPointSettings.Accumulator == AccumulatorMode.Wrap ? "wraps" : "saturates every partial sum")}",
            $"out    = acc2 / 2^S         with S = P1 + P2 - s1 - F = {I(q.Shift)}, {rounding}; saturated to {I(q.OutputBits)} bits with F = {I(q.OutputFracBits)} fractional bits",
        };
        var noise = new List<IReadOnlyList<ReportCell>>
        {
            new[] { ReportCell.Of("weights"), ReportCell.Of("read noise"), ReportCell.Of("two-stage noise against it") },
            new[] { ReportCell.Of($"two-stage (table of {I(layout.PerRead)} x {I(layout.Reads)} read weights, {I(two.Real.Iterations)} alternating steps)"), ReportCell.With("two_stage.sigma_e", sigma, "e- rms"), ReportCell.Of("x1") },
            new[] { ReportCell.Of("full optimum (one weight per sample)"), ReportCell.With($"schemes[{I(optimalIndex)}].noise_e_rms", optimal, "e- rms"), ReportCell.Of("x" + Human.Num(sigma / optimal, 6)) },
            new[] { ReportCell.Of("plain average (" + r.Predictions[0].Label + ")"), ReportCell.With("schemes[0].noise_e_rms", average, "e- rms"), ReportCell.Of("x" + Human.Num(sigma / average, 6)) },
        };
        var settings = new List<IReadOnlyList<ReportCell>>
        {
            new[] { ReportCell.Of("setting"), ReportCell.Of("value") },
            new[] { ReportCell.Of("table scale P1"), ReportCell.Number("two_stage.integer.p1", q.P1) },
            new[] { ReportCell.Of("read-weight scale P2"), ReportCell.Number("two_stage.integer.p2", q.P2) },
            new[] { ReportCell.Of("read-sum shift s1"), ReportCell.Number("two_stage.integer.stage1_shift", q.Stage1Shift) },
            new[] { ReportCell.Of("output shift S"), ReportCell.Number("two_stage.integer.shift", q.Shift) },
            new[] { ReportCell.Of("output fraction bits F"), ReportCell.Number("two_stage.integer.output_frac_bits", q.OutputFracBits) },
            new[] { ReportCell.Of("read-sum accumulator bits"), ReportCell.Number("two_stage.integer.stage1_acc_bits", q.Stage1AccBits) },
            new[] { ReportCell.Of("gain error"), ReportCell.With("two_stage.integer.gain_error_ppm", q.GainErrorPpm, "ppm") },
            new[] { ReportCell.Of("noise penalty of the integer tables"), ReportCell.With("two_stage.integer.noise_penalty_percent", q.NoisePenaltyPercent, "%") },
        };
        var checks = new List<IReadOnlyList<ReportCell>> { new[] { ReportCell.Of("check"), ReportCell.Of("min"), ReportCell.Of("max"), ReportCell.Of("required bits"), ReportCell.Of("available bits"), ReportCell.Of("margin bits"), ReportCell.Of("fits"), ReportCell.Of("decides safety") } };
        for (var k = 0; k < q.Proof.Checks.Count; k++)
        {
            var c = q.Proof.Checks[k];
            var at = $"two_stage.integer.proof.checks[{I(k)}]";
            checks.Add([ReportCell.Of(CheckLabel.Of(c.Name)), ReportCell.Verbatim(Human.Whole(c.MinValue), at + ".min"), ReportCell.Verbatim(Human.Whole(c.MaxValue), at + ".max"),
                ReportCell.Number(at + ".required_bits", c.RequiredBits), ReportCell.Number(at + ".available_bits", c.AvailableBits), ReportCell.Number(at + ".margin_bits", c.MarginBits),
                ReportCell.Of(c.Fits ? "yes" : "NO"), ReportCell.Of(c.Required ? "yes" : "no")]);
        }

        var blocks = new List<ReportBlock>
        {
            new() { Paragraph = "What the two-stage datapath computes for each pixel (form = \"two-stage\": one table per read and one weight per read, h = a (x) g):", Lines = lines },
            new() { Table = noise },
            new() { Table = settings },
            new() { Paragraph = $"Both stages are {(q.Proof.Safe ? "proven safe" : "NOT safe")} for every input inside the ADC range:" },
            new() { Table = checks },
        };
        if (q.Proof.Advice.Count > 0)
        {
            blocks.Add(new ReportBlock { Paragraph = "What to change:", Lines = q.Proof.Advice });
        }

        blocks.Add(new ReportBlock { Summary = $"The {I(q.Table.Count)} per-read table entries (from {I(q.Table.Min())} to {I(q.Table.Max())})", Lines = [.. q.Table.Select((c, p) => $"g[{I(p)}] = {I(c)}   (offset {I(layout.Offsets[p])})")], Raw = true });
        blocks.Add(new ReportBlock { Summary = $"The {I(q.ReadWeights.Count)} read weights (from {I(q.ReadWeights.Min())} to {I(q.ReadWeights.Max())})", Lines = [.. q.ReadWeights.Select((w, j) => $"w[{I(j)}] = {I(w)}")], Raw = true });
        return new ReportSection("Two-stage datapath", blocks);
    }
}
