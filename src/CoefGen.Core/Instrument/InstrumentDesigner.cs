using System.Security.Cryptography;
using System.Text;
using CoefGen.Core.Diagnostics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Instrument;

/// <summary>
/// Designs every table of an instrument for one datapath. Each table's readout text (base + overrides) is loaded and
/// designed like a user file; then all tables are designed again on one shared set of settings: the widest coefficient,
/// sample, accumulator and output widths and the largest output fraction any table has or recommends (the shift or
/// post-multiplier stays per table). Problems are located in the instrument file (an override) or the base file.
/// </summary>
public static class InstrumentDesigner
{
    /// <param name="spec">A loaded instrument file.</param>
    /// <param name="baseContent">The base readout file's bytes.</param>
    /// <param name="basePath">The base file's path as read, used in messages.</param>
    /// <param name="readRelative">Reads a file the base names (psd_table), relative to the base; null when unreadable.</param>
    /// <param name="catalog">Target profiles.</param>
    /// <param name="frequencyCheck">As in <see cref="DesignPipeline.Run"/>.</param>
    public static InstrumentDesign Design(InstrumentSpec spec, byte[] baseContent, string basePath, Func<string, byte[]?> readRelative, TargetCatalog catalog, bool frequencyCheck = true)
    {
        ArgumentNullException.ThrowIfNull(spec);
        ArgumentNullException.ThrowIfNull(baseContent);
        ArgumentNullException.ThrowIfNull(basePath);
        ArgumentNullException.ThrowIfNull(readRelative);
        ArgumentNullException.ThrowIfNull(catalog);

        var baseLoad = ReadoutLoader.Load(baseContent, basePath, readRelative);
        if (baseLoad.Description is null || baseLoad.Diagnostics.Any(d => d.Severity == Severity.Error))
        {
            throw new InputException(baseLoad.Diagnostics);
        }

        var baseText = Encoding.UTF8.GetString(baseContent).TrimStart('\uFEFF');
        var bag = new DiagnosticBag();
        var problems = new List<(string Label, Diagnostic Diagnostic)>();
        var found = new List<(InstrumentTable Table, IReadOnlyList<Diagnostic> Diagnostics)>();
        var first = new List<InstrumentTable>();
        foreach (var (m, c) in spec.Tables)
        {
            var mode = spec.Modes[m];
            var channel = spec.Channels[c];
            var label = $"{mode.Name}/{channel.Name}";
            var text = InstrumentTableText.Compose(baseText, spec, mode, channel, bag);
            if (text is null)
            {
                continue;
            }

            var relocate = new DiagnosticRelocation(baseLoad.Description, baseText, text, mode.Overrides.Concat(channel.Overrides).ToArray());
            var load = ReadoutLoader.Load(Encoding.UTF8.GetBytes(text), basePath, readRelative);
            var loadProblems = load.Diagnostics.Select(relocate.Apply).ToArray();
            if (load.Description is null || loadProblems.Any(d => d.Severity == Severity.Error))
            {
                problems.AddRange(loadProblems.Select(d => (label, d)));
                continue;
            }

            try
            {
                var result = DesignPipeline.Run(load.Description, catalog, frequencyCheck);
                if (result.IsTwoStage)
                {
                    throw new InputException(Diagnostic.Error(TwoStageCodes.FullTableOnly, load.Description.LocationOf("weights.form"),
                        "an instrument shares one full-table datapath across its tables, so it takes form = \"full\" only; remove form = \"two-stage\"", "weights.form"));
                }

                var table = new InstrumentTable(first.Count, m, c, mode.Name, channel.Name, text, result);
                first.Add(table);
                found.Add((table, [.. loadProblems, .. result.Warnings.Select(relocate.Apply)]));
            }
            catch (InputException ex)
            {
                problems.AddRange(ex.Diagnostics.Select(d => (label, relocate.Apply(d))));
            }
        }

        if (bag.HasErrors || problems.Any(p => p.Diagnostic.Severity == Severity.Error))
        {
            bag.AddRange(Grouped(problems, spec.Tables.Count));
            throw new InputException(bag.Items);
        }

        var settings = SharedSettings(spec, first, bag);
        if (settings is null)
        {
            throw new InputException(bag.Items);
        }

        var f = settings.OutputFracBits!.Value;
        var tables = first.Select(t => t with { Result = DesignPipeline.WithSettings(t.Result, settings) }).ToArray();
        var warnings = Grouped(found.SelectMany(x => x.Diagnostics.Select(d => (x.Table.Label, d))), first.Count);

        return new InstrumentDesign
        {
            Spec = spec,
            BasePath = basePath,
            BaseSha256 = Convert.ToHexStringLower(SHA256.HashData(baseContent)),
            Settings = settings,
            OutputFracBits = f,
            Tables = tables,
            Widths = Widths(tables),
            Warnings = warnings,
        };
    }

    /// <summary>
    /// One settings record for all tables: modes must agree (target, rounding, accumulator, normalize); widths are the widest
    /// any table has, the output fraction the largest any table fixes or recommends.
    /// </summary>
    private static FixedPointSettings? SharedSettings(InstrumentSpec spec, List<InstrumentTable> tables, DiagnosticBag bag)
    {
        var s0 = tables[0].Result.FixedPointSettings;
        foreach (var t in tables.Skip(1))
        {
            var s = t.Result.FixedPointSettings;
            void Differ(string what, object a, object b) => bag.Error(InstrumentCodes.NotOneDatapath, SourceLocation.FileOnly(spec.SourcePath),
                $"one datapath needs one {what}: table {tables[0].Label} has {a}, table {t.Label} has {b}", "fixed_point");
            if (s.TargetName != s0.TargetName)
            {
                Differ("target", s0.TargetName, s.TargetName);
            }

            if (s.Rounding != s0.Rounding || s.Accumulator != s0.Accumulator || s.Normalize != s0.Normalize)
            {
                Differ("set of modes (rounding, accumulator, normalize)", $"{s0.Rounding}/{s0.Accumulator}/{s0.Normalize}", $"{s.Rounding}/{s.Accumulator}/{s.Normalize}");
            }
        }

        if (bag.HasErrors)
        {
            return null;
        }

        var all = tables.Select(t => t.Result.FixedPointSettings).ToArray();
        var outputBits = all.Max(s => s.OutputBits);
        var frac = tables.Max(t => t.Result.FixedPointSettings.OutputFracBits ?? t.Result.Datapath.OutputFracBits);
        return s0 with
        {
            CoefBits = all.Max(s => s.CoefBits),
            SampleBits = all.Max(s => s.SampleBits),
            AccBits = all.Max(s => s.AccBits),
            OutputBits = outputBits,
            OutputFracBits = Math.Min(frac, outputBits - 1),
        };
    }

    private static SharedWidth[] Widths(InstrumentTable[] tables)
    {
        var names = tables[0].Result.Datapath.Proof.Checks.Select(c => c.Name).ToArray();
        return [.. names.Select(name =>
        {
            var rows = tables.Select(t => (t.Label, Check: t.Result.Datapath.Proof.Checks.Single(c => c.Name == name))).ToArray();
            var widest = rows.MaxBy(r => r.Check.RequiredBits);
            return new SharedWidth(name, widest.Check.RequiredBits, widest.Label, rows.Min(r => r.Check.RequiredBits),
                widest.Check.AvailableBits, rows.Any(r => r.Check.Required));
        })];
    }

    /// <summary>One diagnostic per distinct problem, naming the tables it occurs in (a base warning is not repeated 16 times).</summary>
    private static Diagnostic[] Grouped(IEnumerable<(string Label, Diagnostic Diagnostic)> items, int total) =>
        [.. items.GroupBy(x => x.Diagnostic).Select(g => Prefixed(g.Key, Tables([.. g.Select(x => x.Label)], total)))];

    private static string Tables(string[] labels, int total) =>
        labels.Length == total && total > 1 ? "every table" : labels.Length == 1 ? $"table {labels[0]}" : $"tables {string.Join(", ", labels)}";

    private static Diagnostic Prefixed(Diagnostic d, string where) => d with { Message = $"{where}: {d.Message}" };
}
