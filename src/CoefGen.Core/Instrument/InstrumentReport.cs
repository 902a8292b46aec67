using CoefGen.Core.FixedPoint;
using CoefGen.Core.Formatting;
using CoefGen.Core.Study;

namespace CoefGen.Core.Instrument;

/// <summary>
/// The instrument's summary page of `report`: every mode x channel table (linked to its own design report), the shared
/// datapath and its proof. Every number cell names its path in the `design --json` document of the instrument
/// (schema coefgen.instrument/1).
/// </summary>
public static class InstrumentReport
{
    /// <summary>Folder of one table's page, relative to the summary page: MODE_CHANNEL (as `vectors` names its folders).</summary>
    public static string TableFolder(InstrumentTable t)
    {
        ArgumentNullException.ThrowIfNull(t);
        return $"{t.Mode}_{t.Channel}";
    }

    /// <param name="design">The designed instrument.</param>
    /// <param name="toolVersion">Shown in the summary.</param>
    /// <param name="pageName">The file name of each table's page inside its folder (report.html or report.md).</param>
    public static IReadOnlyList<ReportSection> Build(InstrumentDesign design, string toolVersion, string pageName)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(toolVersion);
        ArgumentNullException.ThrowIfNull(pageName);
        return [Status(design, toolVersion), Tables(design, pageName), Datapath(design)];
    }

    private static ReportCell T(string text) => ReportCell.Of(text);

    /// <summary>A count or a number of bits: the whole number, keyed like any other number cell.</summary>
    private static ReportCell Int(string jsonPath, long v) => new(Human.Whole(v), jsonPath, v);

    private static ReportSection Status(InstrumentDesign d, string toolVersion)
    {
        var unsafeTables = d.Tables.Where(t => !t.Result.Datapath.Proof.Safe).Select(t => t.Label).ToArray();
        var banner = unsafeTables.Length == 0
            ? new ReportBlock { Banner = $"Proven safe: on the one shared datapath, none of the {Human.Whole(d.Tables.Count)} tables can overflow for any input inside the ADC range." }
            : new ReportBlock
            {
                Banner = $"NOT SAFE: the shared datapath can overflow in {string.Join(", ", unsafeTables)}. `coefgen emit` refuses to write the files; open the table's page for what to change.",
                Alarm = true,
            };
        var rows = new List<IReadOnlyList<ReportCell>>
        {
            new[] { T("item"), T("value") },
            new[] { T("instrument"), T($"'{d.Spec.Name}' from {Path.GetFileName(d.Spec.SourcePath)}") },
            new[] { T("instrument SHA-256"), ReportCell.Verbatim(d.Spec.ContentSha256, "sha256") },
            new[] { T("base readout"), T(Path.GetFileName(d.BasePath)) },
            new[] { T("base SHA-256"), ReportCell.Verbatim(d.BaseSha256, "base_sha256") },
            new[] { T("tables"), T($"{Human.Whole(d.Tables.Count)} of {Human.Whole(d.Spec.Modes.Count)} modes x {Human.Whole(d.Spec.Channels.Count)} channels") },
            new[] { T("written by"), ReportCell.Verbatim("coefgen " + toolVersion, "tool_version") },
        };
        return new ReportSection("Summary", [banner, new ReportBlock { Table = rows }]);
    }

    private static ReportSection Tables(InstrumentDesign d, string pageName)
    {
        var summaries = TableSummary.Of(d);
        var schemes = summaries[0].Noise.Select(n => n.Scheme).ToArray();
        var header = new List<ReportCell> { T("table"), T("pixel time"), T("samples"), T("windows (samples)") };
        header.AddRange(schemes.Select(s => T($"{s} (e- rms)")));
        header.AddRange([T("chosen"), T("integer penalty"), T("proof margin (bits)"), T("coefficients"), T("P"), T("shift")]);
        var rows = new List<IReadOnlyList<ReportCell>> { header };
        for (var i = 0; i < summaries.Count; i++)
        {
            var s = summaries[i];
            var at = $"tables[{Human.Whole(i)}]";
            var row = new List<ReportCell>
            {
                new(s.Label, Href: $"{TableFolder(d.Tables[i])}/{pageName}"),
                ReportCell.Si(at + ".pixel_time_s", s.PixelTimeS, "s"),
                Int(at + ".pixel_samples", s.PixelSamples),
                T(string.Join(", ", s.Windows.Select(w => $"{Human.Whole(w.First)}..{Human.Whole(w.Last)}"))),
            };
            row.AddRange(s.Noise.Select(n => ReportCell.Number($"{at}.read_noise_e.{n.Scheme}", n.Electrons)));
            row.AddRange([
                T(s.ChosenScheme.Split(' ')[0]),
                ReportCell.With(at + ".integer_penalty_percent", s.PenaltyPercent, "%"),
                Int(at + ".proof_margin_bits", s.MarginBits),
                Int(at + ".coef_count", s.Coefficients.Count),
                Int(at + ".p", s.P),
                Int(at + ".shift", s.Shift),
            ]);
            rows.Add(row);
        }

        return new ReportSection("Tables", [
            new ReportBlock { Paragraph = "One row per mode x channel table; the table name opens its design report. Read noise is at the sense node; the integer penalty is the chosen scheme's noise added by quantisation; the proof margin is the fewest spare bits of any check that decides safety (the coefficient aside: it uses its full width by construction)." },
            new ReportBlock { Table = rows },
        ]);
    }

    private static ReportSection Datapath(InstrumentDesign d)
    {
        var s = d.Settings;
        var settings = new List<IReadOnlyList<ReportCell>>
        {
            new[] { T("quantity"), T("value") },
            new[] { T("target"), T(s.TargetName) },
            new[] { T("coefficient bits"), Int("datapath.coef_bits", s.CoefBits) },
            new[] { T("sample bits"), Int("datapath.sample_bits", s.SampleBits) },
            new[] { T("accumulator bits"), Int("datapath.acc_bits", s.AccBits) },
            new[] { T("output bits"), Int("datapath.output_bits", s.OutputBits) },
            new[] { T("output fraction bits"), Int("datapath.output_frac_bits", d.OutputFracBits) },
            new[] { T("normalisation"), T(s.Normalize == NormalizeMode.Shift ? "shift per table" : "post-multiplier and shift per table") },
        };
        var checks = new List<IReadOnlyList<ReportCell>> { new[] { T("check"), T("needs (bits)"), T("has (bits)"), T("margin (bits)"), T("set by") } };
        for (var i = 0; i < d.Widths.Count; i++)
        {
            var x = d.Widths[i];
            var at = $"datapath.checks[{Human.Whole(i)}]";
            checks.Add([
                T(CheckLabel.Of(x.Name) + (x.Required ? "" : " (not needed)")),
                Int(at + ".required_bits", x.RequiredBits),
                Int(at + ".available_bits", x.AvailableBits),
                Int(at + ".margin_bits", x.MarginBits),
                T(x.ForcedByOneTable ? $"{x.WidestTable} (the least any table needs: {Human.Whole(x.NarrowestRequiredBits)})" : "all tables alike"),
            ]);
        }

        return new ReportSection("Shared datapath and proof", [
            new ReportBlock { Table = settings },
            new ReportBlock { Paragraph = "Every table is quantised for these widths; each check below is the widest need of any table, and the table that sets it." },
            new ReportBlock { Table = checks },
        ]);
    }
}
