using System.CommandLine;
using System.Globalization;
using System.Text;
using CoefGen.Cli.Diagnostics;
using CoefGen.Cli.Io;
using CoefGen.Cli.Output;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout;
using CoefGen.Core.Study;

namespace CoefGen.Cli.Commands;

/// <summary>`coefgen sweep FILE --vary KEY=VALUES ... | --target-noise-e X | --split-pixel-time`: trade studies.</summary>
internal static class SweepCommand
{
    public static Command Create(TextWriter output, TextWriter error)
    {
        var file = new Argument<FileInfo>("readout") { Description = "The readout file (TOML) the study starts from, or an instrument file: then --vary runs over every table (in parallel), printed and written per table." };
        var vary = new Option<string[]>("--vary")
        {
            Description = "KEY=LIST (a,b,c), KEY=START:STOP:STEP or KEY=START:STOP:xFACTOR; KEY is a dotted path such as adc.rate_hz, " +
                          "timing.signal.count or noise.source[0].flicker_corner_hz. Numbers may end in an SI prefix (20M). Repeat for a grid.",
        };
        var csv = new Option<FileInfo?>("--csv") { Description = "Also write the sweep as CSV to this path." };
        var plot = new Option<FileInfo?>("--plot") { Description = "Also write an SVG plot of read noise against the first varied key." };
        var json = new Option<bool>("--json") { Description = "Print JSON (schema coefgen.sweep/1) instead of tables." };
        var target = new Option<double?>("--target-noise-e") { Description = "Find the smallest equal reset/signal window count (in samples) whose read noise meets this many e- rms; for a cycle with repeated reads or Fowler-N groups, the smallest read count." };
        var split = new Option<bool>("--split-pixel-time") { Description = "For the file's pixel cycle, find the split between reset window, dead time and signal window with the lowest read noise; for repeated reads, the split of one read period, taken by every read." };
        var scheme = new Option<string?>("--scheme") { Description = "Scheme the searches optimise: boxcar, weighted, optimal or robust (default: the file's weights.scheme)." };
        var cmd = new Command(
            "sweep",
            "Design the readout at many points: vary numeric keys over a grid and tabulate the read noise of every scheme and the " +
            "integer design's status, or answer 'how short can the windows be for a target noise' and 'how should a fixed pixel time " +
            "be split'. Every point is the readout file with the varied keys rewritten, validated like a user file; an invalid point " +
            "shows its diagnostic in its row. Exit 2 on bad options or a bad readout file.")
        {
            file, vary, csv, plot, json, target, split, scheme,
        };
        cmd.SetAction(parse => Run(
            parse.GetRequiredValue(file).ToString(), parse.GetValue(vary) ?? [], parse.GetValue(csv)?.ToString(), parse.GetValue(plot)?.ToString(),
            parse.GetValue(json), parse.GetValue(target), parse.GetValue(split), parse.GetValue(scheme), output, error));
        return cmd;
    }

    private static int Run(string path, string[] vary, string? csvPath, string? plotPath, bool json, double? target, bool split, string? schemeWord, TextWriter output, TextWriter error)
    {
        if (vary.Length == 0 && target is null && !split)
        {
            return DiagnosticPrinter.Fail(error, CliCodes.BadOption, "sweep", "give --vary KEY=VALUES, --target-noise-e X or --split-pixel-time (see coefgen sweep --help)");
        }

        var axes = new List<SweepAxis>();
        foreach (var spec in vary)
        {
            var axis = SweepAxis.TryParse(spec, out var problem);
            if (axis is null)
            {
                return DiagnosticPrinter.Fail(error, CliCodes.BadOption, "--vary", SafeText.Excerpt(problem ?? "cannot read the spec", 300));
            }

            if (axes.Any(a => a.Key == axis.Key))
            {
                return DiagnosticPrinter.Fail(error, CliCodes.SweepDuplicateKey, "--vary",
                    $"'{SafeText.Excerpt(axis.Key)}' is varied twice; give all its values in one --vary (a,b,c or START:STOP:STEP)");
            }

            axes.Add(axis);
        }

        if (axes.Aggregate(1L, (n, a) => n * a.Values.Count) > Sweep.MaxPoints)
        {
            return DiagnosticPrinter.Fail(error, CliCodes.BadOption, "--vary", $"the grid has more than {Sweep.MaxPoints.ToString(CultureInfo.InvariantCulture)} points; use fewer values");
        }

        if ((csvPath is not null || plotPath is not null) && axes.Count == 0)
        {
            return DiagnosticPrinter.Fail(error, CliCodes.BadOption, csvPath is not null ? "--csv" : "--plot", "--csv and --plot need at least one --vary");
        }

        if (InstrumentRunner.IsInstrument(path))
        {
            if (target is not null || split || plotPath is not null || schemeWord is not null)
            {
                var option = target is not null ? "--target-noise-e" : split ? "--split-pixel-time" : plotPath is not null ? "--plot" : "--scheme";
                return DiagnosticPrinter.Fail(error, CliCodes.BadOption, option, "an instrument file takes --vary (with --csv, --json); for searches and plots sweep one table's readout file");
            }

            return InstrumentSweepCommand.Run(path, axes, csvPath, json, output, error);
        }

        if (InputFiles.ReadReadoutBytes(path, out var unreadable) is not { } bytes)
        {
            return DiagnosticPrinter.PrintFailure(error, [unreadable!]);
        }

        var text = new UTF8Encoding(false).GetString(bytes);
        var point = PointFor(path);
        if (InputFiles.LoadReadout(path).Description is { Noise.CapturePath: not null } withCapture)
        {
            error.WriteLine($"{withCapture.LocationOf("noise.capture")}: note: sweeps use the parametric noise model at every point; noise.capture is applied by design, emit and vectors");
        }

        ReadoutDescription? baseline = null;
        WeightScheme? chosen = null;
        ReadCountAxis? readAxis = null;
        if (target is not null || split)
        {
            var baseResult = DesignRunner.TryRun(path, error);
            if (baseResult is null)
            {
                return ExitCodes.BadInput;
            }

            baseline = baseResult.Description;
            // A general cycle: the target search varies the read count, the split divides one read (Study/ReadCountSearch, ReadSplitSearch).
            if (!baseline.Timing.Cycle.IsClassic)
            {
                if (target is not null && (readAxis = ReadCountAxis.Of(text, baseline, out var noAxis)) is null && ReadSplitSearch.Refusal(text, baseline) is { } noRead)
                {
                    return CycleRefusal.RefuseWith(baseline, $"--target-noise-e on a general cycle searches the read count, or the window length of a read written once; {noAxis}, and {noRead}. Sweep its keys with --vary (e.g. timing.window[0].count)", error);
                }

                if (split && ReadSplitSearch.Refusal(text, baseline) is { } noSplit)
                {
                    return CycleRefusal.RefuseWith(baseline, $"--split-pixel-time on a general cycle splits one read; {noSplit}; vary its windows with --vary timing.window[i].count", error);
                }
            }

            chosen = schemeWord is null ? baseline.Weights.Scheme : ParseScheme(schemeWord);
            if (chosen is null)
            {
                return DiagnosticPrinter.Fail(error, CliCodes.BadOption, "--scheme", $"'{SafeText.Excerpt(schemeWord ?? "")}': expected boxcar, weighted, optimal or robust");
            }

            if (target is double t && !(t > 0 && double.IsFinite(t)))
            {
                return DiagnosticPrinter.Fail(error, CliCodes.BadOption, "--target-noise-e", "must be a positive number of electrons");
            }
        }

        if (SweepChecks.UnknownKey(text, path, axes) is { } unknown)
        {
            return DiagnosticPrinter.PrintFailure(error, [unknown]);
        }

        SweepResult? sweep = null;
        if (axes.Count > 0)
        {
            var total = (int)axes.Aggregate(1L, (n, a) => n * a.Values.Count);
            var bar = ReferenceEquals(error, Console.Error) && !Console.IsErrorRedirected ? new SweepProgress(error, total) : null;
            sweep = Sweep.Run(text, point, axes, progress: bar is null ? null : bar.Report);
            bar?.Finish();
            if (sweep.Points.All(p => !p.Outcome.Valid))
            {
                return DiagnosticPrinter.PrintFailure(error, SweepChecks.AllInvalid(sweep));
            }
        }

        var cycle = baseline is not null && !baseline.Timing.Cycle.IsClassic;
        var targetResult = target is not double x ? null
            : !cycle ? TargetNoiseSearch.Run(text, baseline!, point, x, chosen!.Value)
            : readAxis is null ? ReadSplitSearch.EqualWindowTarget(text, baseline!, point, x, chosen!.Value) : null;
        var readTarget = target is double y && readAxis is not null ? ReadCountSearch.Run(text, baseline!, readAxis, point, y, chosen!.Value) : null;
        var splitResult = !split ? null : cycle ? ReadSplitSearch.Run(text, baseline!, point, chosen!.Value) : PixelSplitSearch.Run(text, baseline!, point, chosen!.Value);
        var wrote = new List<string>();
        if (sweep is not null && (csvPath is not null || plotPath is not null))
        {
            using var batch = new OutputBatch();
            if (csvPath is not null)
            {
                AddFile(batch, csvPath, "--csv", SweepCsv.Render(sweep));
                wrote.Add($"wrote {csvPath} ({sweep.Points.Count.ToString(CultureInfo.InvariantCulture)} points, one row each)");
            }

            if (plotPath is not null)
            {
                AddFile(batch, plotPath, "--plot", SweepPlot.Render(sweep));
                wrote.Add($"wrote {plotPath} (read noise against {sweep.Axes[0].Key})");
            }

            if (batch.Commit(error) is null)
            {
                return ExitCodes.BadInput;
            }
        }

        // With --json stdout is one document, so the file notes go to stderr.
        foreach (var line in wrote)
        {
            (json ? error : output).WriteLine(line);
        }

        if (json)
        {
            output.Write(SweepJson.Render(sweep, targetResult, splitResult, readTarget));
            return ExitCodes.Ok;
        }

        var parts = new List<string>();
        if (sweep is not null)
        {
            parts.Add(SweepText.Render(sweep));
        }

        if (targetResult is not null)
        {
            parts.Add(SweepSearchText.Target(targetResult, baseline!.Adc.RateHz));
        }

        if (readTarget is not null)
        {
            parts.Add(ReadCountSearchText.Target(readTarget, baseline!.Adc.RateHz));
        }

        if (splitResult is not null)
        {
            parts.Add(SweepSearchText.Split(splitResult, baseline!.Adc.RateHz));
        }

        output.Write(string.Join("\n", parts));
        return ExitCodes.Ok;
    }

    private static void AddFile(OutputBatch batch, string path, string option, string text)
    {
        var full = Path.GetFullPath(path);
        batch.Add(Path.GetDirectoryName(full)!, option, Path.GetFileName(full), Utf8Text.Encode(text), option);
    }

    private static WeightScheme? ParseScheme(string word) => word switch
    {
        "boxcar" => WeightScheme.Boxcar,
        "weighted" => WeightScheme.Weighted,
        "optimal" => WeightScheme.Optimal,
        "robust" => WeightScheme.Robust,
        _ => null,
    };

    internal static DesignPoint PointFor(string readoutPath)
    {
        var baseDir = Path.GetDirectoryName(Path.GetFullPath(readoutPath)) ?? ".";
        return new DesignPoint(readoutPath, relative => InputFiles.ReadRelative(baseDir, relative, out _), InputFiles.LoadTargets());
    }
}
