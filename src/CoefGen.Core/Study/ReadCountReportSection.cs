using CoefGen.Core.Formatting;
using CoefGen.Core.Pipeline;

namespace CoefGen.Core.Study;

/// <summary>
/// The report's "Read noise against read count" section for a cycle with a read count (<see cref="ReadCountStudy"/>):
/// a table and a log-log chart of every scheme's noise, the two-stage form's and the white-noise law of the plain
/// average. The points other than the file's N are designs of edited readout texts, not values of this design's
/// `design --json`, so the cells carry no JSON path.
/// </summary>
internal static class ReadCountReportSection
{
    public static ReportSection? For(DesignResult r, ReportContext context)
    {
        if (context.ReadCounts is not { } curve)
        {
            return null;
        }

        var axis = curve.Axis;
        var valid = curve.Points.Where(p => p.Valid).ToList();
        var schemes = r.Weights.Select(w => (w.Scheme, w.Label)).ToList();
        var hasTwoStage = valid.Any(p => p.TwoStageElectrons is not null);
        var header = new List<ReportCell> { T(axis.Kind == ReadCountKind.Repeat ? "reads N" : "reads per group N"), T("pixel cycle (samples)") };
        header.AddRange(schemes.Select(s => T($"{s.Label} (e- rms)")));
        if (hasTwoStage)
        {
            header.Add(T("two-stage form (e- rms)"));
        }

        header.Add(T($"{LawName(curve.Law)} (e- rms)"));
        var rows = new List<IReadOnlyList<ReportCell>> { header };
        foreach (var p in curve.Points)
        {
            var cells = new List<ReportCell> { T(Human.Whole(p.Reads) + (p.Reads == axis.FileCount ? " (this file)" : "")), T(Human.Whole(p.PixelSamples)) };
            if (!p.Valid)
            {
                cells.Add(T($"not a valid design: {p.Problem!.Code} {p.Problem.Message}"));
                cells.AddRange(Enumerable.Range(0, header.Count - 3).Select(_ => T("")));
                rows.Add(cells);
                continue;
            }

            cells.AddRange(schemes.Select(s => T(Human.NumShort(p.Schemes.First(x => x.Scheme == s.Scheme).NoiseElectrons))));
            if (hasTwoStage)
            {
                cells.Add(T(p.TwoStageElectrons is double t ? Human.NumShort(t) : "-"));
            }

            cells.Add(T(curve.Reference(p.Reads) is double law ? Human.NumShort(law) : "-"));
            rows.Add(cells);
        }

        var blocks = new List<ReportBlock>
        {
            new() { Paragraph = How(curve) },
            new() { Table = rows },
        };
        if (valid.Count >= 2)
        {
            blocks.Add(new ReportBlock { Svg = Chart(curve, schemes, hasTwoStage), Caption = Caption(curve) });
        }

        return new ReportSection("Read noise against read count", blocks);
    }

    private static ReportCell T(string text) => ReportCell.Of(text);

    private static string Chart(ReadCountCurve curve, IReadOnlyList<(Readout.WeightScheme Scheme, string Label)> schemes, bool hasTwoStage)
    {
        var valid = curve.Points.Where(p => p.Valid).ToList();
        double[] x = [.. valid.Select(p => (double)p.Reads)];
        var series = schemes.Select(s => new ChartSeries(s.Label, x, [.. valid.Select(p => p.Schemes.First(q => q.Scheme == s.Scheme).NoiseElectrons)], Style: ChartPalette.Scheme(s.Scheme))).ToList();
        if (hasTwoStage)
        {
            series.Add(new ChartSeries("two-stage form (one per-read table x read weights)", x, [.. valid.Select(p => p.TwoStageElectrons ?? double.NaN)], Style: ChartPalette.TwoStage));
        }

        series.Add(new ChartSeries(LawName(curve.Law) + " through the plain average's first point", x, [.. valid.Select(p => curve.Reference(p.Reads) ?? double.NaN)], Style: ChartPalette.Reference));
        var log = x[^1] >= 8 * x[0];
        return new SvgLineChart
        {
            Title = "Read noise against read count",
            Description = $"Predicted read noise in electrons of every scheme against the number of {curve.Axis.Noun}, each point a design of the cycle with that many, beside the white-noise law of the plain average.",
            XLabel = $"number of {curve.Axis.Noun}",
            YLabel = "read noise (e- rms)",
            XLog = log,
            YLog = log,
            XMin = x[0],
            XMax = x[^1],
            Series = series,
        }.Render();
    }

    private static string LawName(ReadCountLaw law) => law == ReadCountLaw.RampFit ? "read-noise-limited fit" : "white-noise law σ1/√N";

    private static string How(ReadCountCurve curve)
    {
        var axis = curve.Axis;
        var edit = axis.Kind == ReadCountKind.Repeat
            ? $"Each row is this readout designed again with timing.repeat.times = N, every read {Human.Whole(axis.PeriodSamples)} samples after the previous one as in the file; the pixel cycle changes by that read period per read (the time after the last read stays as written)."
            : "Each row is this readout designed again with every ramp window N samples long, each keeping its start (so the groups' separation, the integration time of the difference, stays as written).";
        var law = curve.Law switch
        {
            ReadCountLaw.RampFit => "The reference is the read-noise-limited unweighted slope of n equally spaced reads, variance 12σ²/(n(n²−1)Δt²) (PHYSICS.md §4b), through the plain average (boxcar) at its first valid n; shot noise of the integrating charge and correlated noise lift the points above it.",
            _ when axis.Kind == ReadCountKind.GroupSize => "The reference is the read-noise-limited Fowler-N law, variance 2σ²/N for independent samples (Fowler & Gatley 1990), i.e. σ1/√N through the plain average (difference of group means) at N = 1; shot noise and correlated noise lift the points above it.",
            _ => "The reference is the white-noise law of N independent reads averaged, σN = σ1/√N (Tiffenberg et al. 2017), through the plain average at N = 1: where a scheme's noise stays above it, noise correlated across the reads (1/f) makes more reads pay less.",
        };
        return $"{edit} The row of the file's N is this report's design. {law}";
    }

    private static string Caption(ReadCountCurve curve) =>
        $"Read noise against the number of {curve.Axis.Noun}; the grey line is the {LawName(curve.Law)}.";
}
