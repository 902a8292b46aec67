using CoefGen.Core.FixedPoint;
using CoefGen.Core.Formatting;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Prediction;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// The design report's content, built from one <see cref="DesignResult"/> only. Every number cell names the path of
/// the same value in the `design --json` document (schema coefgen.design/1). The section list is <see cref="Sections"/>:
/// a new section is one more entry there.
/// </summary>
public static class DesignReport
{
    internal static readonly string[] SchemeWords = ["boxcar", "weighted", "optimal", "robust"];

    /// <summary>The report's sections in page order; an entry returning null is left out for this design.</summary>
    private static readonly Func<DesignResult, ReportContext, ReportSection?>[] Sections =
    [
        (r, c) => Status(r, c),
        (r, _) => Description(r),
        (r, _) => Sources(r),
        (r, _) => Noise(r),
        (r, _) => RegretReportSection.For(r) is [var regret] ? regret : null,
        (r, c) => ReadCountReportSection.For(r, c),
        (r, _) => ReportCharts.Weights(r),
        (r, _) => ReportCharts.Spectra(r),
        (r, _) => ReportCharts.Contribution(r),
        (r, _) => Budget(r),
        (r, _) => r.IsTwoStage ? null : Datapath(r),
        (r, _) => r.IsTwoStage ? null : Proof(r),
        (r, _) => TwoStageReportSection.For(r),
        (r, _) => CrossCheck(r),
        (r, _) => Warnings(r),
        (r, c) => Emitted(r, c.Emitted),
    ];

    public static IReadOnlyList<ReportSection> Build(DesignResult r, ReportContext context)
    {
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(context);
        return [.. Sections.Select(s => s(r, context)).OfType<ReportSection>()];
    }

    private static ReportCell T(string text) => ReportCell.Of(text);

    private static string I(long v) => Human.Whole(v);

    private static ReportSection Status(DesignResult r, ReportContext context)
    {
        var p = r.ChosenPrediction;
        var proof = r.Proof;
        var datapath = r.IsTwoStage ? "two-stage integer datapath" : "integer datapath";
        var banner = proof.Safe
            ? new ReportBlock { Banner = $"Proven safe: the {datapath} of the {SchemeWords[(int)r.Chosen.Scheme]} weights cannot overflow for any input inside the ADC range." }
            : new ReportBlock
            {
                Banner = "NOT SAFE: the integer datapath can overflow for inputs inside the ADC range (" +
                    string.Join("; ", proof.Checks.Where(c => c.Required && !c.Fits).Select(c => $"{CheckLabel.Of(c.Name)} needs {I(c.RequiredBits)} bits, has {I(c.AvailableBits)}")) +
                    $"). `coefgen emit` refuses to write its files; see \"{(r.IsTwoStage ? "Two-stage datapath" : "Fixed-point proof")}\" for what to change.",
                Alarm = true,
            };
        var rows = new List<IReadOnlyList<ReportCell>>
        {
            new[] { T("item"), T("value") },
            new[] { T("readout"), T($"'{r.Description.Name}' from {Path.GetFileName(r.Description.SourcePath)}") },
            new[] { T("readout SHA-256"), ReportCell.Verbatim(r.Description.ContentSha256, "readout.sha256") },
            new[] { T("chosen scheme"), T(p.Label) },
            new[] { T("predicted read noise"), ReportCell.With($"schemes[{I(r.ChosenIndex)}].noise_e_rms", p.SigmaElectrons, "e- rms") },
            new[] { T("noise model"), T(r.CaptureSource ?? "parametric (the readout's noise sources)") },
            new[] { T("written by"), ReportCell.Verbatim("coefgen " + context.ToolVersion, "tool_version") },
        };
        return new ReportSection("Summary", [banner, new ReportBlock { Table = rows }]);
    }

    private static ReportSection Description(DesignResult r)
    {
        var d = r.Description;
        var t = d.Timing;
        var rows = new List<IReadOnlyList<ReportCell>>
        {
            new[] { T("quantity"), T("value") },
            new[] { T("ADC sample rate"), ReportCell.Si("readout.adc.rate_hz", d.Adc.RateHz, "S/s") },
            new[] { T("ADC resolution"), ReportCell.With("readout.adc.bits", d.Adc.Bits, "bits") },
            new[] { T("ADC full scale"), ReportCell.Si("readout.adc.full_scale_v", d.Adc.FullScaleV, "V") },
            new[] { T("ADC LSB"), ReportCell.Si("readout.adc.lsb_v", d.Adc.LsbV, "V") },
            new[] { T("ADC coding"), T(d.Adc.Coding == AdcCoding.OffsetBinary ? "offset binary" : "two's complement") },
            new[] { T("ADC own noise"), ReportCell.With("readout.adc.noise_lsb", d.Adc.NoiseLsb, "LSB rms") },
            new[] { T("conversion gain"), ReportCell.With("readout.sensor.conversion_gain_uv_per_e", d.Sensor.ConversionGainUvPerE, "uV/e-") },
            new[] { T("gain to the ADC"), ReportCell.With("readout.sensor.gain", d.Sensor.Gain, "V/V") },
            new[] { T("volts at the ADC per electron"), ReportCell.Si("readout.sensor.v_at_adc_per_e", d.Sensor.VoltsAtAdcPerElectron, "V/e-") },
            new[] { T("pixel cycle"), ReportCell.With("readout.timing.pixel_samples", t.PixelSamples, $"samples ({Human.SiShort(t.PixelSamples / d.Adc.RateHz, "s")})") },
        };
        var step = new[] { T("step model"), T(t.Step == StepModel.Pole ? "pole (settles through the front-end pole)" : "ideal (instant)") };
        if (t.Cycle.AsTwoWindow() is not { } classic)
        {
            rows.Add(step);
            rows.AddRange(CycleReportRows.Rows(t.Cycle));
        }
        else
        {
            rows.AddRange(
            [
                new[] { T("charge transfer"), ReportCell.Si("readout.timing.transfer_time_s", t.TransferTimeS, "s") },
                step,
                new[] { T("reset window start"), ReportCell.With("readout.timing.reset.start", classic.Reset.Start, "(sample index)") },
                new[] { T("reset window length"), ReportCell.With("readout.timing.reset.count", classic.Reset.Count, "samples") },
                new[] { T("signal window start"), ReportCell.With("readout.timing.signal.start", classic.Signal.Start, "(sample index)") },
                new[] { T("signal window length"), ReportCell.With("readout.timing.signal.count", classic.Signal.Count, "samples") },
            ]);
        }

        rows.Add([T("digital variance per sample (quantisation + ADC noise)"), ReportCell.With("readout.noise.digital_variance_v2", r.Covariance.DigitalVarianceV2, "V^2")]);
        rows.Add([T("scheme that goes to fixed point"), T(SchemeWords[(int)d.Weights.Scheme])]);
        var blocks = new List<ReportBlock> { new() { Table = rows } };
        blocks.Add(t.Rounding.Count > 0
            ? new ReportBlock { Paragraph = "Nanosecond timing as turned into samples:", Lines = t.Rounding }
            : new ReportBlock { Paragraph = "The timing is given in samples; nothing was rounded." });
        return new ReportSection("The description as understood", blocks);
    }

    private static ReportSection Sources(DesignResult r)
    {
        var d = r.Description;
        var n = d.Noise;
        var gain = Math.Abs(d.Sensor.Gain);
        var rows = new List<IReadOnlyList<ReportCell>> { new[] { T("source"), T("referred to"), T("white level"), T("white level at the ADC"), T("1/f corner"), T("1/f low cutoff") } };
        for (var i = 0; i < n.Sources.Count; i++)
        {
            var s = n.Sources[i];
            var at = $"readout.noise.sources[{I(i)}]";
            var atAdc = s.WhiteNvPerRtHz * (s.At == NoiseReference.Sensor ? gain : 1);
            rows.Add([
                T(s.Name), T(s.At == NoiseReference.Sensor ? "sensor (x gain to the ADC)" : "ADC input"),
                ReportCell.With(at + ".white_nv_per_rthz", s.WhiteNvPerRtHz, "nV/rtHz"), T(Human.With(atAdc, "nV/rtHz")),
                s.FlickerCornerHz > 0 ? ReportCell.Si(at + ".flicker_corner_hz", s.FlickerCornerHz, "Hz") : T("none"),
                s.FlickerCornerHz > 0 ? ReportCell.Si(at + ".low_cutoff_hz", s.LowCutoffHz, "Hz") : T("-"),
            ]);
        }

        var blocks = new List<ReportBlock>();
        if (n.Sources.Count > 0)
        {
            blocks.Add(new ReportBlock { Table = rows });
        }

        var shaping = new List<IReadOnlyList<ReportCell>> { new[] { T("shaping and other parts"), T("value") } };
        shaping.Add(n.FrontEndPoleHz is double pole
            ? [T("front-end pole (every source, one pole)"), ReportCell.Si("readout.noise.front_end_pole_hz", pole, "Hz")]
            : [T("front-end pole"), T("none")]);
        shaping.Add(n.BandwidthHz is double bw
            ? [T("brick-wall bandwidth limit"), ReportCell.Si("readout.noise.bandwidth_hz", bw, "Hz")]
            : [T("bandwidth limit"), T("none")]);
        if (n.Table is { } table)
        {
            shaping.Add([T($"measured spectrum '{table.Name}'"), T($"{I(table.FrequencyHz.Count)} points, {Human.SiShort(table.FrequencyHz[0], "Hz")} to {Human.SiShort(table.FrequencyHz[^1], "Hz")}, at the ADC (flat below, f^-2 above)")]);
        }

        shaping.Add([T("quantisation + ADC own noise"), T($"{Human.With(Math.Sqrt(d.Adc.DigitalVarianceV2 / (d.Adc.LsbV * d.Adc.LsbV)), "LSB rms")} per sample, white to Nyquist")]);
        if (r.CaptureSource is not null)
        {
            shaping.Add([T("capture"), T(r.CaptureSource + "; every prediction uses this covariance, the sources above only shape the shrinkage target and the fixed-point refinement")]);
        }

        blocks.Add(new ReportBlock { Table = shaping });
        blocks.Add(new ReportBlock { Paragraph = "Noise components at the ADC input: " + string.Join(", ", r.Covariance.Components.Select(c => c.Name)) + "." });
        return new ReportSection("Noise sources", blocks);
    }

    private static ReportSection Noise(DesignResult r)
    {
        var rows = new List<IReadOnlyList<ReportCell>> { new[] { T("scheme"), T("at the ADC"), T("in ADU"), T("in electrons"), T("vs optimal"), T("chosen") } };
        var optimal = r.Predictions.First(p => p.Scheme == WeightScheme.Optimal).SigmaV;
        for (var i = 0; i < r.Predictions.Count; i++)
        {
            var p = r.Predictions[i];
            var at = $"schemes[{I(i)}]";
            rows.Add([T(p.Label), ReportCell.Si(at + ".noise_v_rms", p.SigmaV, "V rms"), ReportCell.With(at + ".noise_adu_rms", p.SigmaAdu, "ADU rms"),
                ReportCell.With(at + ".noise_e_rms", p.SigmaElectrons, "e- rms"), ReportCell.Number(at + ".noise_relative_to_optimal", p.SigmaV / optimal), T(i == r.ChosenIndex ? "yes" : "")]);
        }

        return new ReportSection("Read noise", [new ReportBlock { Table = rows }]);
    }

    private static ReportSection Budget(DesignResult r)
    {
        var c = r.ChosenIndex;
        var p = r.Predictions[c];
        var vpe2 = r.Description.Sensor.VoltsAtAdcPerElectron * r.Description.Sensor.VoltsAtAdcPerElectron;
        var blocks = new List<ReportBlock>();
        IReadOnlyList<NoiseBudgetEntry> entries = p.Budget;
        if (r.CaptureSource is not null)
        {
            // The capture is one measured sum: only the digital part (known from the ADC) can be split off exactly.
            var digital = r.Description.Adc.DigitalVarianceV2 * r.Chosen.H.Sum(x => x * x);
            var analog = Math.Max(0, p.VarianceV2 - digital);
            entries = [new NoiseBudgetEntry("measured analog noise (all sources together)", analog, analog / p.VarianceV2), new NoiseBudgetEntry("quantisation + ADC own noise", digital, digital / p.VarianceV2)];
            blocks.Add(new ReportBlock { Paragraph = "The capture measures all analog sources together, so its variance cannot be split by source; the digital part (quantisation and the ADC's own noise, sigma_d^2 sum h^2) is known and is split off. The data-sheet model's split of the same weights follows for comparison." });
        }

        var bars = entries.Select((b, j) => new ChartBar(b.Source, b.VarianceV2, $"{Human.Percent(b.Share)} ({Human.With(Math.Sqrt(b.VarianceV2 / vpe2), "e- rms")})", BudgetStyle(r, b.Source, j))).ToList();
        var chart = new SvgBarChart { Title = $"Noise budget of the {p.Label} weights", Bars = bars }.Render();
        blocks.Insert(0, new ReportBlock { Svg = chart, Caption = "Share of each source in the chosen scheme's variance, with the read noise each would give alone." });
        blocks.Add(new ReportBlock { Table = BudgetTable(entries, vpe2, r.CaptureSource is null ? $"schemes[{I(c)}].budget" : null) });
        if (r.CaptureSource is not null)
        {
            var model = NoisePredictor.Predict(r.Chosen, r.Covariance, r.Description.Adc, r.Description.Sensor, null);
            blocks.Add(new ReportBlock { Paragraph = $"Data-sheet model, same weights: {Human.With(model.SigmaElectrons, "e- rms")} (the capture says {Human.With(p.SigmaElectrons, "e- rms")})." });
            blocks.Add(new ReportBlock { Table = BudgetTable(model.Budget, vpe2, null) });
        }

        return new ReportSection("Noise budget", blocks);
    }

    private static List<IReadOnlyList<ReportCell>> BudgetTable(IReadOnlyList<NoiseBudgetEntry> entries, double vpe2, string? jsonPath)
    {
        var rows = new List<IReadOnlyList<ReportCell>> { new[] { T("source"), T("variance at the ADC"), T("alone gives"), T("share") } };
        for (var j = 0; j < entries.Count; j++)
        {
            var b = entries[j];
            var at = jsonPath is null ? null : $"{jsonPath}[{I(j)}]";
            rows.Add([
                T(b.Source),
                at is null ? T(Human.With(b.VarianceV2, "V^2")) : ReportCell.With(at + ".variance_v2", b.VarianceV2, "V^2"),
                T(Human.With(Math.Sqrt(b.VarianceV2 / vpe2), "e- rms")),
                at is null ? T(Human.Percent(b.Share)) : ReportCell.Percent(at + ".share", b.Share),
            ]);
        }

        return rows;
    }

    /// <summary>The style of a budget entry: its component's source style, or the digital one.</summary>
    internal static ChartStyle BudgetStyle(DesignResult r, string source, int position)
    {
        var k = r.Noise.Components.ToList().FindIndex(c => c.Name == source);
        return k >= 0 ? ChartPalette.Source(k)
            : source.Contains("quantisation", StringComparison.Ordinal) ? ChartPalette.Digital
            : source.Contains("ADC", StringComparison.Ordinal) ? ChartPalette.AdcNoise
            : position == 0 ? ChartPalette.Total : ChartPalette.Source(position);
    }

    private static ReportSection Datapath(DesignResult r)
    {
        var i = r.Datapath;
        var s = r.FixedPointSettings;
        var coding = i.Coding == AdcCoding.OffsetBinary ? $"ADC code - 2^{I(i.AdcBits - 1)} (offset binary)" : "ADC code (two's complement)";
        var rounding = i.Rounding switch
        {
            RoundingMode.HalfUp => i.Shift > 0 ? $"round half up: add 2^{I(i.Shift - 1)}, then shift right by {I(i.Shift)}" : "no shift",
            RoundingMode.HalfEven => $"round to nearest, ties to even, at 2^{I(i.Shift)}",
            _ => $"truncate: arithmetic shift right by {I(i.Shift)} (floor)",
        };
        var lines = new List<string>
        {
            $"x_k = {coding} of sample n_k, {I(i.SampleBits)}-bit signed; k = 0 .. {I(i.Coefficients.Count - 1)}",
            $"acc = sum_k c_k * x_k   with c_k = round(h_k * 2^P), P = {I(i.P)}, {I(i.CoefBits)}-bit coefficients, {I(i.ProductBits)}-bit products,",
            $"      {I(i.AccBits)}-bit accumulator that {(i.Accumulator == AccumulatorMode.Wrap ? "wraps" : "saturates every partial sum")}",
        };
        lines.Add(i.Normalize == NormalizeMode.Shift
            ? "m   = acc              (normalize = shift: no post-multiplier)"
            : $"m   = acc * M          with post-multiplier M = {I(i.PostMultiplier)} ({I(i.PostMultiplierBits)} bits)");
        lines.Add($"out = m / 2^S          with S = {I(i.Shift)}, {rounding};");
        lines.Add($"      saturated to {I(i.OutputBits)} bits with {I(i.OutputFracBits)} fractional bits (1 output LSB = 2^-{I(i.OutputFracBits)} ADU)");
        var settings = new List<IReadOnlyList<ReportCell>>
        {
            new[] { T("setting"), T("value") },
            new[] { T("target"), T(s.TargetName) },
            new[] { T("coefficient bits"), ReportCell.Number("fixed_point.coef_bits", i.CoefBits) },
            new[] { T("sample bits"), ReportCell.Number("fixed_point.sample_bits", i.SampleBits) },
            new[] { T("product bits"), ReportCell.Number("fixed_point.product_bits", i.ProductBits) },
            new[] { T("accumulator bits"), ReportCell.Number("fixed_point.acc_bits", i.AccBits) },
            new[] { T("output bits"), ReportCell.Number("fixed_point.output_bits", i.OutputBits) },
            new[] { T("output fraction bits"), ReportCell.Number("fixed_point.output_frac_bits", i.OutputFracBits) },
            new[] { T("coefficient scale P"), ReportCell.Number("fixed_point.p", i.P) },
            new[] { T("shift S"), ReportCell.Number("fixed_point.shift", i.Shift) },
            new[] { T("post-multiplier M"), new ReportCell(I(i.PostMultiplier), "fixed_point.post_multiplier", i.PostMultiplier, Raw: true) },
            new[] { T("gain error"), ReportCell.With("fixed_point.gain_error_ppm", i.GainErrorPpm, "ppm") },
            new[] { T("noise penalty of the integer coefficients"), ReportCell.With("fixed_point.noise_penalty_percent", i.NoisePenaltyPercent, "%") },
            new[] { T("predicted noise"), ReportCell.With("fixed_point.predicted_noise_output_lsb", i.PredictedNoiseOutputLsb, "output LSB rms") },
        };
        var coefficients = i.Coefficients.Select((c, k) => $"c[{I(k)}] = {I(c)}   (sample {I(i.SampleIndex[k])})").ToList();
        return new ReportSection("Integer datapath", [
            new ReportBlock { Paragraph = $"What the {SchemeWords[(int)r.Chosen.Scheme]} datapath computes for each pixel:", Lines = lines },
            new ReportBlock { Table = settings },
            new ReportBlock { Summary = $"The {I(i.Coefficients.Count)} integer coefficients (from {I(i.Coefficients.Min())} to {I(i.Coefficients.Max())})", Lines = coefficients, Raw = true },
        ]);
    }

    private static ReportSection Proof(DesignResult r)
    {
        var i = r.Datapath;
        var checks = new List<IReadOnlyList<ReportCell>> { new[] { T("check"), T("min"), T("max"), T("required bits"), T("available bits"), T("margin bits"), T("fits"), T("decides safety") } };
        for (var k = 0; k < i.Proof.Checks.Count; k++)
        {
            var c = i.Proof.Checks[k];
            var at = $"fixed_point.proof.checks[{I(k)}]";
            checks.Add([T(CheckLabel.Of(c.Name)), ReportCell.Verbatim(Human.Whole(c.MinValue), at + ".min"), ReportCell.Verbatim(Human.Whole(c.MaxValue), at + ".max"),
                ReportCell.Number(at + ".required_bits", c.RequiredBits), ReportCell.Number(at + ".available_bits", c.AvailableBits), ReportCell.Number(at + ".margin_bits", c.MarginBits),
                T(c.Fits ? "yes" : "NO"), T(c.Required ? "yes" : "no")]);
        }

        var blocks = new List<ReportBlock>
        {
            new() { Paragraph = $"The integer datapath of the {SchemeWords[(int)r.Chosen.Scheme]} weights is {(i.Proof.Safe ? "proven safe" : "NOT safe")} for every input inside the ADC range." },
            new() { Table = checks },
        };
        if (i.Proof.Advice.Count > 0)
        {
            blocks.Add(new ReportBlock { Paragraph = "What to change:", Lines = i.Proof.Advice });
        }

        return new ReportSection("Fixed-point proof", blocks);
    }

    private static ReportSection CrossCheck(DesignResult r)
    {
        var rows = new List<IReadOnlyList<ReportCell>> { new[] { T("scheme"), T("time domain h^T R h"), T("frequency domain"), T("relative difference") } };
        for (var i = 0; i < r.Predictions.Count; i++)
        {
            var p = r.Predictions[i];
            var at = $"schemes[{I(i)}]";
            rows.Add(p.FrequencyDomainVarianceV2 is double fd && p.FrequencyDomainRelativeDifference is double rel
                ? [T(p.Label), ReportCell.With(at + ".variance_v2", p.VarianceV2, "V^2"), ReportCell.With(at + ".frequency_domain_variance_v2", fd, "V^2"), ReportCell.Number(at + ".time_frequency_relative_difference", rel)]
                : [T(p.Label), ReportCell.With(at + ".variance_v2", p.VarianceV2, "V^2"), T("not computed"), T("-")]);
        }

        return new ReportSection("Time and frequency domain cross-check", [
            new ReportBlock { Paragraph = "Each scheme's variance computed twice on independent code paths: the quadratic form over the sampled covariance, and the integral of |H(f)|^2 S(f) plus the digital part." + (r.CaptureSource is null ? "" : " A capture covariance has no spectrum of its own, so the check is not made for capture designs.") },
            new ReportBlock { Table = rows },
        ]);
    }

    private static ReportSection Warnings(DesignResult r) =>
        new("Warnings", r.Warnings.Count == 0
            ? [new ReportBlock { Paragraph = "None." }]
            : [new ReportBlock { Lines = [.. r.Warnings.Select(w => w.ToString())] }]);

    private static ReportSection Emitted(DesignResult r, IReadOnlyList<EmittedFile> files)
    {
        if (files.Count == 0)
        {
            return new ReportSection("Emitted files", [new ReportBlock { Paragraph = "The readout file has no [[emit]] entries." }]);
        }

        if (!r.Proof.Safe)
        {
            return new ReportSection("Emitted files", [new ReportBlock
            {
                Paragraph = $"None: `coefgen emit` refuses to write the {I(files.Count)} files of the readout's [[emit]] entries for a design the proof rejects (CG2020; --allow-unsafe writes them anyway).",
            }]);
        }

        var rows = new List<IReadOnlyList<ReportCell>> { new[] { T("file"), T("template"), T("bytes"), T("SHA-256") } };
        rows.AddRange(files.Select(f => (IReadOnlyList<ReportCell>)[T(f.RelativePath), T(f.Template), T(I(f.Bytes)), ReportCell.Verbatim(f.Sha256)]));
        return new ReportSection("Emitted files", [
            new ReportBlock { Paragraph = "Rendered in memory from the readout's [[emit]] entries, as `coefgen emit` writes them." },
            new ReportBlock { Table = rows },
        ]);
    }

    /// <summary>|sum_k h_k exp(-j 2 pi f t_k)|^2.</summary>
    public static double PowerResponse(IReadOnlyList<double> h, IReadOnlyList<double> t, double f)
    {
        ArgumentNullException.ThrowIfNull(h);
        ArgumentNullException.ThrowIfNull(t);
        double re = 0, im = 0;
        for (var k = 0; k < h.Count; k++)
        {
            var phase = 2 * Math.PI * f * t[k];
            re += h[k] * Math.Cos(phase);
            im -= h[k] * Math.Sin(phase);
        }

        return (re * re) + (im * im);
    }
}
