using CoefGen.Cli.Io;
using CoefGen.Core.Vectors;

namespace CoefGen.Cli.Commands;

/// <summary>`verify INSTRUMENT --vectors DIR --dut-dir DUMPS`: every table's dump DUMPS/MODE_CHANNEL.txt against DIR/MODE_CHANNEL/.</summary>
internal static class InstrumentVerify
{
    /// <summary>Exit 0 when every table matches, 1 when any mismatches, 2 when any table's input is bad (every table is still checked).</summary>
    public static int Run(string path, string vectorsDir, string dumpDir, DumpFormat format, bool requireAcc, TextWriter output, TextWriter error)
    {
        var design = InstrumentRunner.TryRun(path, error);
        if (design is null)
        {
            return ExitCodes.BadInput;
        }

        var lines = new List<string>();
        var details = new List<(string Label, string Text)>();
        var worst = ExitCodes.Ok;
        var mismatched = 0;
        foreach (var t in design.Tables)
        {
            var folder = $"{t.Mode}_{t.Channel}";
            using var detail = new StringWriter();
            var v = VerifyCommand.Table(t.Result.Description.ContentSha256, $"{path} (table {t.Label})", Path.Combine(vectorsDir, folder),
                Path.Combine(dumpDir, folder + ".txt"), format, requireAcc, detail, error);
            lines.Add($"  {t.Label,-20} {v.Summary}");
            if (v.Code == ExitCodes.Difference)
            {
                mismatched++;
                details.Add((t.Label, detail.ToString()));
            }

            worst = v.Code == ExitCodes.BadInput || worst == ExitCodes.BadInput ? ExitCodes.BadInput : Math.Max(worst, v.Code);
        }

        output.WriteLine($"verified {design.Tables.Count} tables of {design.Spec.Name}:");
        foreach (var line in lines)
        {
            output.WriteLine(line);
        }

        foreach (var (label, text) in details)
        {
            output.WriteLine($"table {label}:");
            output.Write(text);
        }

        output.WriteLine(worst == ExitCodes.Ok ? $"all {design.Tables.Count} tables match"
            : worst == ExitCodes.BadInput ? "not every table could be checked (bad input above)"
            : $"{mismatched} of {design.Tables.Count} tables mismatch");
        return worst;
    }
}
