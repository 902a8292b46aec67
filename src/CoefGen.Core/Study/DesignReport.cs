using System.Globalization;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// The design report's content, built from one <see cref="DesignResult"/> only. Every number cell names the path of
/// the same value in the `design --json` document (schema coefgen.design/1).
/// </summary>
public static class DesignReport
{
    private static readonly string[] SchemeWords = ["boxcar", "weighted", "optimal", "robust"];

    public static IReadOnlyList<ReportSection> Build(DesignResult r, IReadOnlyList<EmittedFile> emitted)
    {
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(emitted);
        return [Description(r), Noise(r), .. RegretReportSection.For(r), Weights(r), Spectra(r), Budget(r), Proof(r), Emitted(emitted)];
    }

    private static ReportCell N(string path, double v) => ReportCell.Number(path, v);

    private static ReportCell T(string text) => ReportCell.Of(text);

    private static string I(long v) => v.ToString(CultureInfo.InvariantCulture);

    private static ReportSection Description(DesignResult r)
    {
        var d = r.Description;
        var t = d.Timing;
        var rows = new List<IReadOnlyList<ReportCell>>
        {
            new[] { T("quantity"), T("value"), T("unit") },
            new[] { T("ADC sample rate"), N("readout.adc.rate_hz", d.Adc.RateHz), T("Hz") },
            new[] { T("ADC resolution"), N("readout.adc.bits", d.Adc.Bits), T("bits") },
            new[] { T("ADC full scale"), N("readout.adc.full_scale_v", d.Adc.FullScaleV), T("V") },
            new[] { T("ADC LSB"), N("readout.adc.lsb_v", d.Adc.LsbV), T("V") },
            new[] { T("ADC own noise"), N("readout.adc.noise_lsb", d.Adc.NoiseLsb), T("LSB rms") },
            new[] { T("conversion gain"), N("readout.sensor.conversion_gain_uv_per_e", d.Sensor.ConversionGainUvPerE), T("uV/e-") },
            new[] { T("gain to the ADC"), N("readout.sensor.gain", d.Sensor.Gain), T("V/V") },
            new[] { T("volts at the ADC per electron"), N("readout.sensor.v_at_adc_per_e", d.Sensor.VoltsAtAdcPerElectron), T("V/e-") },
            new[] { T("pixel cycle"), N("readout.timing.pixel_samples", t.PixelSamples), T("samples") },
        };
        if (t.Cycle is not null)
        {
            rows.AddRange(CycleReportRows.Rows(t.Cycle));
        }
        else
        {
            rows.AddRange(
            [
                new[] { T("charge transfer"), N("readout.timing.transfer_time_s", t.TransferTimeS), T("s") },
                new[] { T("reset window start"), N("readout.timing.reset.start", t.Reset.Start), T("sample") },
                new[] { T("reset window length"), N("readout.timing.reset.count", t.Reset.Count), T("samples") },
                new[] { T("signal window start"), N("readout.timing.signal.start", t.Signal.Start), T("sample") },
                new[] { T("signal window length"), N("readout.timing.signal.count", t.Signal.Count), T("samples") },
            ]);
        }

        if (d.Noise.FrontEndPoleHz is double pole)
        {
            rows.Add([T("front-end pole"), N("readout.noise.front_end_pole_hz", pole), T("Hz")]);
        }

        if (d.Noise.BandwidthHz is double bw)
        {
            rows.Add([T("bandwidth limit"), N("readout.noise.bandwidth_hz", bw), T("Hz")]);
        }

        rows.Add([T("digital variance per sample"), N("readout.noise.digital_variance_v2", r.Covariance.DigitalVarianceV2), T("V^2")]);
        var blocks = new List<ReportBlock>
        {
            new() { Paragraph = $"Readout '{d.Name}' from {Path.GetFileName(d.SourcePath)} (SHA-256 {d.ContentSha256}); step model {(t.Step == StepModel.Pole ? "pole" : "ideal")}; scheme {SchemeWords[(int)d.Weights.Scheme]} goes to fixed point." },
            new() { Table = rows },
            new() { Paragraph = "Noise components at the ADC input: " + string.Join(", ", r.Covariance.Components.Select(c => c.Name)) + "." },
        };
        blocks.Add(t.Rounding.Count > 0
            ? new ReportBlock { Paragraph = "Nanosecond timing as turned into samples:", Lines = t.Rounding }
            : new ReportBlock { Paragraph = "The timing is given in samples; nothing was rounded." });
        return new ReportSection("The description as understood", blocks);
    }

    private static ReportSection Noise(DesignResult r)
    {
        var rows = new List<IReadOnlyList<ReportCell>> { new[] { T("scheme"), T("V rms"), T("ADU rms"), T("e- rms"), T("vs optimal"), T("chosen") } };
        var optimal = r.Predictions.First(p => p.Scheme == WeightScheme.Optimal).SigmaV;
        for (var i = 0; i < r.Predictions.Count; i++)
        {
            var p = r.Predictions[i];
            var at = $"schemes[{I(i)}]";
            rows.Add([T(p.Label), N(at + ".noise_v_rms", p.SigmaV), N(at + ".noise_adu_rms", p.SigmaAdu), N(at + ".noise_e_rms", p.SigmaElectrons),
                N(at + ".noise_relative_to_optimal", p.SigmaV / optimal), T(i == r.ChosenIndex ? "yes" : "")]);
        }

        return new ReportSection("Read noise", [new ReportBlock { Table = rows }]);
    }

    private static ReportSection Weights(DesignResult r)
    {
        // NaN between the windows breaks each line at the gap (the weights are zero there, not interpolated).
        var micro = CycleReportRows.WithBreaks(r.Grid, r.Grid.TimeS.Select(x => x * 1e6).ToArray());
        var chart = new SvgLineChart
        {
            Title = "Weights over the pixel cycle",
            XLabel = "time from the start of the pixel cycle (us)",
            YLabel = "weight h (ADU per ADU)",
            Series = [.. r.Weights.Select(w => new ChartSeries(w.Label, micro, CycleReportRows.WithBreaks(r.Grid, w.H)))],
        }.Render();
        return new ReportSection("Weights against time", [new ReportBlock
        {
            Svg = chart,
            Caption = $"Weights of the three schemes at the {I(r.Grid.Count)} weighted samples (design --json: samples.time_s, schemes[i].weights).",
        }]);
    }

    private static ReportSection Spectra(DesignResult r)
    {
        var rate = r.Grid.RateHz;
        var pixelTime = r.Description.Timing.PixelSamples / rate;
        var f = LogSpace(0.02 / pixelTime, rate / 2, 240);
        var psd = new List<ChartSeries>();
        var total = new double[f.Length];
        foreach (var c in r.Noise.Components)
        {
            var s = f.Select(c.Psd).ToArray();
            for (var i = 0; i < f.Length; i++)
            {
                total[i] += s[i];
            }

            psd.Add(new ChartSeries(c.Name, f, s));
        }

        var digital = 2 * r.Noise.DigitalVarianceV2 / rate;
        psd.Insert(0, new ChartSeries("analog total", f, total));
        psd.Add(new ChartSeries("digital (quantisation + ADC), white to Nyquist", f, [.. f.Select(_ => digital)]));
        var psdChart = new SvgLineChart
        {
            Title = "Noise PSD at the ADC input",
            XLabel = "frequency (Hz)",
            YLabel = "one-sided PSD (V^2/Hz)",
            XLog = true,
            YLog = true,
            Series = psd,
        }.Render();
        var transfer = new SvgLineChart
        {
            Title = "|H(f)|^2 of each scheme",
            XLabel = "frequency (Hz)",
            YLabel = "|H(f)|^2 (ADU^2 per ADU^2)",
            XLog = true,
            YLog = true,
            Series = [.. r.Weights.Select(w => new ChartSeries(w.Label, f, [.. f.Select(x => PowerResponse(w.H, r.Grid.TimeS, x))]))],
        }.Render();
        return new ReportSection("Transfer functions over the noise PSD", [
            new ReportBlock { Svg = psdChart, Caption = "Noise PSD of every component (log-log)." },
            new ReportBlock { Svg = transfer, Caption = "|H(f)|^2 = |sum_k h_k exp(-j 2 pi f t_k)|^2 of each scheme over the same frequencies; the read noise variance is the integral of |H|^2 S over f plus the digital part." },
        ]);
    }

    private static ReportSection Budget(DesignResult r)
    {
        var c = r.ChosenIndex;
        var p = r.Predictions[c];
        var bars = p.Budget.Select(b => (b.Source, b.VarianceV2, $"{(100 * b.Share).ToString("0.0", CultureInfo.InvariantCulture)} %")).ToList();
        var chart = new SvgBarChart { Title = $"Noise budget of the {p.Label} weights (variance at the ADC input)", Bars = bars }.Render();
        var rows = new List<IReadOnlyList<ReportCell>> { new[] { T("source"), T("variance (V^2)"), T("share") } };
        for (var j = 0; j < p.Budget.Count; j++)
        {
            var at = $"schemes[{I(c)}].budget[{I(j)}]";
            rows.Add([T(p.Budget[j].Source), N(at + ".variance_v2", p.Budget[j].VarianceV2), N(at + ".share", p.Budget[j].Share)]);
        }

        return new ReportSection("Noise budget", [new ReportBlock { Svg = chart, Caption = "Share of each source in the chosen scheme's variance." }, new ReportBlock { Table = rows }]);
    }

    private static ReportSection Proof(DesignResult r)
    {
        var i = r.Datapath;
        var settings = new List<IReadOnlyList<ReportCell>>
        {
            new[] { T("setting"), T("value") },
            new[] { T("target"), T(r.FixedPointSettings.TargetName) },
            new[] { T("coefficient bits"), N("fixed_point.coef_bits", i.CoefBits) },
            new[] { T("sample bits"), N("fixed_point.sample_bits", i.SampleBits) },
            new[] { T("product bits"), N("fixed_point.product_bits", i.ProductBits) },
            new[] { T("accumulator bits"), N("fixed_point.acc_bits", i.AccBits) },
            new[] { T("output bits"), N("fixed_point.output_bits", i.OutputBits) },
            new[] { T("output fraction bits"), N("fixed_point.output_frac_bits", i.OutputFracBits) },
            new[] { T("coefficient scale P"), N("fixed_point.p", i.P) },
            new[] { T("shift"), N("fixed_point.shift", i.Shift) },
            new[] { T("post-multiplier"), N("fixed_point.post_multiplier", i.PostMultiplier) },
            new[] { T("gain error (ppm)"), N("fixed_point.gain_error_ppm", i.GainErrorPpm) },
            new[] { T("noise penalty (%)"), N("fixed_point.noise_penalty_percent", i.NoisePenaltyPercent) },
            new[] { T("predicted noise (output LSB)"), N("fixed_point.predicted_noise_output_lsb", i.PredictedNoiseOutputLsb) },
        };
        var checks = new List<IReadOnlyList<ReportCell>> { new[] { T("check"), T("min"), T("max"), T("required bits"), T("available bits"), T("margin bits"), T("fits"), T("decides safety") } };
        for (var k = 0; k < i.Proof.Checks.Count; k++)
        {
            var c = i.Proof.Checks[k];
            var at = $"fixed_point.proof.checks[{I(k)}]";
            checks.Add([T(c.Name), new ReportCell(c.MinValue.ToString(CultureInfo.InvariantCulture), at + ".min"), new ReportCell(c.MaxValue.ToString(CultureInfo.InvariantCulture), at + ".max"),
                N(at + ".required_bits", c.RequiredBits), N(at + ".available_bits", c.AvailableBits), N(at + ".margin_bits", c.MarginBits),
                T(c.Fits ? "yes" : "NO"), T(c.Required ? "yes" : "no")]);
        }

        var blocks = new List<ReportBlock>
        {
            new() { Paragraph = $"The integer datapath of the {SchemeWords[(int)r.Chosen.Scheme]} weights is {(i.Proof.Safe ? "proven safe" : "NOT safe")} for every ADC input." },
            new() { Table = settings },
            new() { Table = checks },
        };
        if (i.Proof.Advice.Count > 0)
        {
            blocks.Add(new ReportBlock { Paragraph = "What to change:", Lines = i.Proof.Advice });
        }

        return new ReportSection("Fixed-point proof", blocks);
    }

    private static ReportSection Emitted(IReadOnlyList<EmittedFile> files)
    {
        if (files.Count == 0)
        {
            return new ReportSection("Emitted files", [new ReportBlock { Paragraph = "The readout file has no [[emit]] entries." }]);
        }

        var rows = new List<IReadOnlyList<ReportCell>> { new[] { T("file"), T("template"), T("bytes"), T("SHA-256") } };
        rows.AddRange(files.Select(f => (IReadOnlyList<ReportCell>)[T(f.RelativePath), T(f.Template), T(I(f.Bytes)), T(f.Sha256)]));
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

    private static double[] LogSpace(double lo, double hi, int n)
    {
        var a = Math.Log10(lo);
        var b = Math.Log10(hi);
        return [.. Enumerable.Range(0, n).Select(i => Math.Pow(10, a + ((b - a) * i / (n - 1))))];
    }
}
