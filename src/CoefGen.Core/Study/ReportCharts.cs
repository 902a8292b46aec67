using CoefGen.Core.Formatting;
using CoefGen.Core.Pipeline;

namespace CoefGen.Core.Study;

/// <summary>The chart sections of the design report: weights and step response, spectra, |H|^2, where the noise comes from.</summary>
internal static class ReportCharts
{
    /// <summary>Dynamic range shown on |H|^2 and |H|^2 S charts: 60 dB below the largest value.</summary>
    private const double Floor = 1e-6;

    public static ReportSection Weights(DesignResult r)
    {
        var g = r.Grid;
        var t = r.Description.Timing;
        var rate = g.RateHz;
        var time = CycleReportRows.WithBreaks(g, g.TimeS); // NaN between the windows breaks each line at the gap (the weights are zero there)
        var bands = WindowBands(r);
        ChartMarker[] markers = !t.Cycle.IsClassic ? [] : [new ChartMarker(t.TransferTimeS, $"charge transfer {Human.SiShort(t.TransferTimeS, "s")}")];
        var cycle = t.PixelSamples / rate;

        // Both charts share the pixel-cycle time axis, the shaded windows and the transfer marker.
        SvgLineChart OverCycle(string title, string description, string yLabel, IReadOnlyList<ChartSeries> series, double? yMin = null, double? yMax = null, double height = 400) => new()
        {
            Title = title,
            Description = description,
            XLabel = "time from the start of the pixel cycle",
            XUnit = "s",
            YLabel = yLabel,
            XMin = 0,
            XMax = cycle,
            YMin = yMin,
            YMax = yMax,
            Height = height,
            Series = series,
            Bands = bands,
            Markers = markers,
        };

        var weights = OverCycle(
            "Weights over the pixel cycle",
            "Weight of each scheme at every weighted sample against time in the pixel cycle; the reset and signal windows are shaded, the charge transfer is a dashed line.",
            "weight h (ADU per ADU)",
            [.. r.Weights.Select(w => new ChartSeries(w.Label, time, CycleReportRows.WithBreaks(g, w.H), Style: ChartPalette.Scheme(w.Scheme)))]).Render();
        var step = OverCycle(
            "Step response seen by the weighted samples",
            "Fraction of the charge step that each weighted sample sees (0 before the transfer), against time in the pixel cycle.",
            "step response",
            [new ChartSeries($"step response as a fraction of the final value ({(t.Step == Readout.StepModel.Pole ? "through the front-end pole" : "ideal step")})", time, CycleReportRows.WithBreaks(g, g.Step), Style: ChartPalette.Total)],
            -0.05,
            1.2,
            280).Render();
        return new ReportSection("Weights against time", [
            new ReportBlock { Svg = weights, Caption = $"Weights of the three schemes at the {Human.Whole(g.Count)} weighted samples (design --json: samples.time_s, schemes[i].weights)." },
            new ReportBlock { Svg = step, Caption = "The step response at the same samples (design --json: samples.step); the weights make the signal window's weighted step equal to one." },
        ]);
    }

    public static ReportSection Spectra(DesignResult r)
    {
        var nyquist = r.Grid.RateHz / 2;
        var f = LogGrid(r);
        var series = new List<ChartSeries>();
        var total = new double[f.Length];
        for (var k = 0; k < r.Noise.Components.Count; k++)
        {
            var s = f.Select(r.Noise.Components[k].Psd).ToArray();
            for (var i = 0; i < f.Length; i++)
            {
                total[i] += s[i];
            }

            series.Add(new ChartSeries(r.Noise.Components[k].Name, f, Nv(s), Style: ChartPalette.Source(k)));
        }

        var digital = 2 * r.Noise.DigitalVarianceV2 / r.Grid.RateHz;
        series.Insert(0, new ChartSeries(r.CaptureSource is null ? "analog total" : "analog total of the data-sheet model", f, Nv(total), Style: ChartPalette.Total));
        series.Add(new ChartSeries("quantisation + ADC own noise (white to Nyquist)", f, Nv([.. f.Select(_ => digital)]), Style: ChartPalette.Digital));
        var gain = Math.Abs(r.Description.Sensor.Gain);
        var blocks = new List<ReportBlock>
        {
            new()
            {
                Svg = Spectrum(r.CaptureSource is null ? "Noise spectrum at the ADC input" : "Noise spectrum of the data-sheet model at the ADC input", series, nyquist, gain, FloorOf(series.SelectMany(s => s.Y), 1e-2)),
                Caption = "One-sided amplitude density sqrt(S) of every noise component up to Nyquist" +
                    (gain != 1 && gain > 0 ? $"; the right axis divides by the gain to the ADC ({Human.NumShort(gain)}) to refer it to the sensor." : "; the gain to the ADC is 1, so the sensor sees the same density."),
            },
        };
        if (r.CaptureSpectrum is { } welch)
        {
            var model = welch.FrequencyHz.Select(x => r.Noise.Components.Sum(c => c.Psd(x)) + digital).ToArray();
            blocks.Add(new ReportBlock
            {
                Svg = Spectrum("Measured spectrum of the capture at the ADC input", [
                    new ChartSeries($"capture (Welch, {Human.Whole(welch.Segments)} segments of {Human.Whole(welch.SegmentLength)})", welch.FrequencyHz, Nv(welch.PsdV2PerHz), Style: ChartPalette.Total),
                    new ChartSeries("data-sheet model incl. quantisation + ADC noise", welch.FrequencyHz, Nv(model), Style: ChartPalette.Model),
                ], nyquist, gain, null),
                Caption = "The spectrum the predictions rest on: the capture's residual stream (mean waveform removed) against the readout's data-sheet model.",
            });
        }

        var peak = r.Weights.Max(w => f.Max(x => DesignReport.PowerResponse(w.H, r.Grid.TimeS, x)));
        blocks.Add(new ReportBlock
        {
            Svg = Frequency("|H(f)|² of each scheme", "|H(f)|² (ADU² per ADU²)", [.. r.Weights.Select(w => new ChartSeries(w.Label, f, [.. f.Select(x => DesignReport.PowerResponse(w.H, r.Grid.TimeS, x))], Style: ChartPalette.Scheme(w.Scheme)))],
                nyquist, Math.Pow(10, Math.Floor(Math.Log10(peak * Floor)))).Render(),
            Caption = "|H(f)|² = |sum_k h_k exp(-j 2 pi f t_k)|² over the same frequencies, shown down to 60 dB below its peak; the read noise variance is the integral of |H|² S over f plus the digital part.",
        });
        return new ReportSection("Spectra and transfer functions", blocks);
    }

    public static ReportSection Contribution(DesignResult r)
    {
        var rate = r.Grid.RateHz;
        var vpe = r.Description.Sensor.VoltsAtAdcPerElectron;
        var digital = 2 * r.Noise.DigitalVarianceV2 / rate;
        Func<double, double> psd = r.CaptureSpectrum is { } welch ? Interpolated(welch) : x => r.Noise.Components.Sum(c => c.Psd(x)) + digital;
        var index = r.Grid.SampleIndex;
        var parts = r.Weights.Select(w => NoiseContribution.Compute(w.H, index, rate, psd)).ToList();
        var f = LogGrid(r);
        var pick = Picks(parts[0].FrequencyHz, f);
        var density = new List<ChartSeries>();
        var cumulative = new List<ChartSeries>();
        for (var i = 0; i < parts.Count; i++)
        {
            var p = parts[i];
            var style = ChartPalette.Scheme(r.Weights[i].Scheme);
            var xs = pick.Select(j => p.FrequencyHz[j]).ToArray();
            density.Add(new ChartSeries(r.Weights[i].Label, xs, [.. pick.Select(j => p.Density[j] / (vpe * vpe))], Style: style));
            var total = r.Predictions[i].VarianceV2;
            cumulative.Add(new ChartSeries($"{r.Weights[i].Label}: {Human.Percent(p.BelowNyquist / total)} of its variance below Nyquist", xs, [.. pick.Select(j => 100 * p.Cumulative[j] / total)], Style: style));
        }

        var peak = density.Max(s => s.Y.Max());
        var source = r.CaptureSpectrum is null ? "the model spectrum (analog components + quantisation and ADC noise)" : "the capture's measured spectrum";
        return new ReportSection("Where the noise comes from", [
            new ReportBlock
            {
                Svg = Frequency("Noise density at the output: |H(f)|² S(f)", "output noise density (e-²/Hz)", density, rate / 2, Math.Pow(10, Math.Floor(Math.Log10(peak * Floor)))).Render(),
                Caption = $"|H(f)|² times {source}, in electrons at the sensor; the area under each curve is that scheme's read noise variance.",
            },
            new ReportBlock
            {
                Svg = Frequency("Cumulative read noise variance against frequency", "variance collected below f (% of the predicted total)", cumulative, rate / 2, 0, yLog: false).Render(),
                Caption = "The running integral of |H|² S from 0 to f over each scheme's predicted variance: steep parts are the frequencies its noise comes from. " +
                    "What is missing at Nyquist lies above it (aliased analog noise) or is the difference between the spectrum and the sampled covariance.",
            },
        ]);
    }

    /// <summary>A log-frequency chart ending at Nyquist, SI ticks on the frequency axis.</summary>
    private static SvgLineChart Frequency(string title, string yLabel, IReadOnlyList<ChartSeries> series, double nyquist, double? yMin, bool yLog = true, double? y2Factor = null, string? y2Label = null) => new()
    {
        Title = title,
        XLabel = "frequency",
        XUnit = "Hz",
        YLabel = yLabel,
        XLog = true,
        YLog = yLog,
        XMax = nyquist,
        YMin = yMin,
        Y2Factor = y2Factor,
        Y2Label = y2Label,
        Series = series,
    };

    /// <summary>An amplitude-density chart at the ADC, with the sensor-referred scale on the right when the gain is not 1.</summary>
    private static string Spectrum(string title, IReadOnlyList<ChartSeries> series, double nyquist, double gain, double? yMin)
    {
        var refer = gain != 1 && gain > 0;
        return Frequency(title, "amplitude density at the ADC (nV/√Hz)", series, nyquist, yMin, y2Factor: refer ? 1 / gain : null, y2Label: refer ? "referred to the sensor (nV/√Hz)" : null).Render();
    }

    private static IReadOnlyList<ChartBand> WindowBands(DesignResult r)
    {
        var g = r.Grid;
        var half = 0.5 / g.RateHz;
        if (g.TwoWindow is not { } classic)
        {
            // A general cycle: one band over all its windows (a band per window would bury the chart for many reads).
            return [new ChartBand(g.TimeS[0] - half, g.TimeS[^1] + half, $"{Human.Whole(g.Windows.Count)} windows, {Human.Whole(g.Count)} weighted samples", "#3b6fb6")];
        }

        var resetCount = classic.Reset.Count;
        var reset = (g.TimeS[0] - half, g.TimeS[resetCount - 1] + half);
        var signal = (g.TimeS[resetCount] - half, g.TimeS[^1] + half);
        return
        [
            new ChartBand(reset.Item1, reset.Item2, $"reset window ({Human.Whole(resetCount)})", "#3b6fb6"),
            new ChartBand(signal.Item1, signal.Item2, $"signal window ({Human.Whole(classic.Signal.Count)})", "#c77d1a"),
        ];
    }

    /// <summary>Log-spaced frequencies from a decade below 1 / (100 pixel cycles) to Nyquist.</summary>
    private static double[] LogGrid(DesignResult r)
    {
        var rate = r.Grid.RateHz;
        var cycle = r.Description.Timing.PixelSamples / rate;
        var lo = Math.Pow(10, Math.Floor(Math.Log10(0.01 / cycle)));
        var a = Math.Log10(lo);
        var b = Math.Log10(rate / 2);
        const int n = 300;
        return [.. Enumerable.Range(0, n).Select(i => i == n - 1 ? rate / 2 : Math.Pow(10, a + ((b - a) * i / (n - 1))))];
    }

    /// <summary>Indices of the evenly spaced grid nearest to each log-spaced frequency (no repeats, DC left out).</summary>
    private static int[] Picks(IReadOnlyList<double> grid, double[] targets)
    {
        var df = grid[1] - grid[0];
        return [.. targets.Select(x => (int)Math.Clamp(Math.Round(x / df), 1, grid.Count - 1)).Distinct()];
    }

    private static double[] Nv(IReadOnlyList<double> psd) => [.. psd.Select(s => Math.Sqrt(Math.Max(0, s)) * 1e9)];

    private static double FloorOf(IEnumerable<double> values, double fraction)
    {
        var max = values.Where(double.IsFinite).DefaultIfEmpty(1).Max();
        return Math.Pow(10, Math.Floor(Math.Log10(max * fraction)));
    }

    /// <summary>The Welch estimate as a function: linear between bins, the end bins held outside.</summary>
    private static Func<double, double> Interpolated(Capture.WelchSpectrum w) => x =>
    {
        var fs = w.FrequencyHz;
        if (x <= fs[0])
        {
            return w.PsdV2PerHz[0];
        }

        if (x >= fs[^1])
        {
            return w.PsdV2PerHz[^1];
        }

        var step = fs[1] - fs[0];
        var j = Math.Min((int)((x - fs[0]) / step), fs.Count - 2);
        var u = (x - fs[j]) / step;
        return ((1 - u) * w.PsdV2PerHz[j]) + (u * w.PsdV2PerHz[j + 1]);
    };
}
