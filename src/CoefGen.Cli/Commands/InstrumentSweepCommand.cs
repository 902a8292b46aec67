using System.Globalization;
using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using CoefGen.Cli.Diagnostics;
using CoefGen.Cli.Io;
using CoefGen.Cli.Output;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.Instrument;
using CoefGen.Core.Study;

namespace CoefGen.Cli.Commands;

/// <summary>`sweep INSTRUMENT --vary KEY=VALUES [--csv F] [--json]`: the grid over every table, one result per table in table order.</summary>
internal static class InstrumentSweepCommand
{
    public const string Schema = "coefgen.instrument-sweep/1";

    public static int Run(string path, IReadOnlyList<SweepAxis> axes, string? csvPath, bool json, TextWriter output, TextWriter error)
    {
        var design = InstrumentRunner.TryRun(path, error);
        if (design is null)
        {
            return ExitCodes.BadInput;
        }

        var basePath = design.BasePath;
        if (InputFiles.ReadReadoutBytes(basePath, out var unreadable) is not { } baseBytes)
        {
            return DiagnosticPrinter.PrintFailure(error, [unreadable!]);
        }

        if (SweepChecks.UnknownKey(new UTF8Encoding(false).GetString(baseBytes), basePath, axes) is { } unknown)
        {
            return DiagnosticPrinter.PrintFailure(error, [unknown]);
        }

        var baseDir = Path.GetDirectoryName(Path.GetFullPath(basePath)) ?? ".";
        var point = new DesignPoint(basePath, relative => InputFiles.ReadRelative(baseDir, relative, out _), InputFiles.LoadTargets());
        var sweeps = InstrumentSweep.Run(design, point, axes);
        for (var i = 0; i < sweeps.Count; i++)
        {
            if (sweeps[i].Points.All(p => !p.Outcome.Valid))
            {
                error.WriteLine($"table {design.Tables[i].Label}:");
                return DiagnosticPrinter.PrintFailure(error, SweepChecks.AllInvalid(sweeps[i]));
            }
        }

        if (csvPath is not null)
        {
            if (Csv(design, sweeps) is not { } csv)
            {
                return DiagnosticPrinter.Fail(error, CliCodes.BadOption, "--csv", "the tables' sweeps have different columns (their schemes differ); sweep the tables' readout files one at a time");
            }

            var full = Path.GetFullPath(csvPath);
            using var batch = new OutputBatch();
            batch.Add(Path.GetDirectoryName(full)!, "--csv", Path.GetFileName(full), Utf8Text.Encode(csv), "--csv");
            if (batch.Commit(error) is null)
            {
                return ExitCodes.BadInput;
            }

            var rows = sweeps.Sum(s => s.Points.Count).ToString(CultureInfo.InvariantCulture);
            (json ? error : output).WriteLine($"wrote {csvPath} ({rows} rows: {design.Tables.Count.ToString(CultureInfo.InvariantCulture)} tables x {sweeps[0].Points.Count.ToString(CultureInfo.InvariantCulture)} points)");
        }

        if (json)
        {
            output.Write(Json(design, sweeps));
            return ExitCodes.Ok;
        }

        var sb = new StringBuilder();
        for (var i = 0; i < sweeps.Count; i++)
        {
            sb.Append(i == 0 ? "" : "\n").Append($"table {design.Tables[i].Label}\n").Append(SweepText.Render(sweeps[i]));
        }

        output.Write(sb.ToString());
        return ExitCodes.Ok;
    }

    /// <summary>One CSV: a leading table column, then the single-file sweep's columns; null when the tables' columns differ.</summary>
    private static string? Csv(InstrumentDesign design, IReadOnlyList<SweepResult> sweeps)
    {
        var sb = new StringBuilder();
        string? header = null;
        for (var i = 0; i < sweeps.Count; i++)
        {
            var lines = SweepCsv.Render(sweeps[i]).Split('\n', StringSplitOptions.RemoveEmptyEntries);
            if (header is null)
            {
                header = lines[0];
                sb.Append("table,").Append(header).Append('\n');
            }
            else if (lines[0] != header)
            {
                return null;
            }

            foreach (var line in lines.Skip(1))
            {
                sb.Append(design.Tables[i].Label).Append(',').Append(line).Append('\n');
            }
        }

        return sb.ToString();
    }

    /// <summary>Schema coefgen.instrument-sweep/1: the instrument and per table its label, mode, channel and the coefgen.sweep/1 document.</summary>
    private static string Json(InstrumentDesign design, IReadOnlyList<SweepResult> sweeps)
    {
        using var stream = new MemoryStream();
        var options = new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping, NewLine = "\n" };
        using (var w = new Utf8JsonWriter(stream, options))
        {
            w.WriteStartObject();
            w.WriteString("schema", Schema);
            w.WriteString("name", design.Spec.Name);
            w.WriteString("path", design.Spec.SourcePath);
            w.WriteString("sha256", design.Spec.ContentSha256);
            w.WriteStartArray("tables");
            for (var i = 0; i < sweeps.Count; i++)
            {
                var t = design.Tables[i];
                w.WriteStartObject();
                w.WriteString("table", t.Label);
                w.WriteString("mode", t.Mode);
                w.WriteString("channel", t.Channel);
                w.WritePropertyName("sweep");
                using var doc = JsonDocument.Parse(SweepJson.Render(sweeps[i], null, null));
                doc.RootElement.WriteTo(w);
                w.WriteEndObject();
            }

            w.WriteEndArray();
            w.WriteEndObject();
        }

        return Encoding.UTF8.GetString(stream.ToArray()) + "\n";
    }
}
