using System.Globalization;
using System.Text;
using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Readout.Loading;

/// <summary>
/// Reads a measured spectrum: CSV rows "frequency_hz, density_nv_per_rthz", '#' comments, blank lines,
/// an optional header row before the first data row. Problems are located in the CSV file itself.
/// </summary>
internal static class PsdTableReader
{
    /// <summary>The table, or null after diagnostics.</summary>
    /// <param name="content">The CSV bytes.</param>
    /// <param name="csvFile">Name of the CSV in messages.</param>
    /// <param name="name">Label of the table (the path as written in the readout file).</param>
    /// <param name="densityScale">Factor from the written amplitude density to V/sqrt(Hz) at the ADC input.</param>
    /// <param name="keyLocation">Where psd_table was written, for whole-table problems.</param>
    /// <param name="context">Collects the diagnostics.</param>
    public static PsdTable? Read(byte[] content, string csvFile, string name, double densityScale, SourceLocation keyLocation, LoadContext context)
    {
        var errorsBefore = context.ErrorCount;
        var text = Encoding.UTF8.GetString(content);
        var lines = text.Split('\n');
        var frequencies = new List<double>();
        var densities = new List<double>();
        var seenRow = false;
        var listed = 0;
        var unlisted = 0;

        // A file that is not a table (a binary, /etc/passwd) would give one error per line: list the first few only.
        void Report(string code, SourceLocation location, string message)
        {
            if (listed++ < MaxListedRows)
            {
                context.Error(code, location, "noise.psd_table", message);
            }
            else
            {
                unlisted++;
            }
        }

        for (var i = 0; i < lines.Length; i++)
        {
            var location = new SourceLocation(csvFile, i + 1, 1);
            var line = StripComment(lines[i]).Trim().TrimStart('\uFEFF').Trim();
            if (line.Length == 0)
            {
                continue;
            }

            var fields = line.Split(',');
            if (fields.Length != 2 || !TryNumber(fields[0], out var f) || !TryNumber(fields[1], out var nv))
            {
                if (!seenRow && fields.Length == 2 && !TryNumber(fields[0], out _) && !TryNumber(fields[1], out _))
                {
                    seenRow = true; // a header row such as "frequency_hz, density_nv_per_rthz"
                    continue;
                }

                Report(ReadoutCodes.PsdTableBadLine, location, BadLine(fields));
                seenRow = true;
                continue;
            }

            seenRow = true;
            if (f < 0 || (frequencies.Count > 0 && f <= frequencies[^1]))
            {
                var previous = frequencies.Count > 0 ? $" (previous row: {ValueReader.Format(frequencies[^1])} Hz)" : "";
                Report(ReadoutCodes.PsdTableNotIncreasing, location,
                    $"frequency {ValueReader.Format(f)} Hz{previous}; frequencies must be >= 0 and strictly increasing");
                continue;
            }

            if (nv < 0)
            {
                Report(ReadoutCodes.PsdTableNegativeDensity, location,
                    $"density {ValueReader.Format(nv)} nV/rtHz is negative; densities must be >= 0");
                continue;
            }

            if (nv > PhysicalRange.MaxTableDensityNv || f > PhysicalRange.MaxTableFrequencyHz)
            {
                context.Error(ReadoutCodes.OutOfRange, location, "noise.psd_table",
                    $"row {ValueReader.Format(f)} Hz, {ValueReader.Format(nv)} nV/rtHz is out of range; allowed: frequencies up to {ValueReader.Format(PhysicalRange.MaxTableFrequencyHz)} Hz, densities up to {ValueReader.Format(PhysicalRange.MaxTableDensityNv)} nV/rtHz");
                continue;
            }

            var amplitude = nv * 1e-9 * densityScale;
            frequencies.Add(f);
            densities.Add(amplitude * amplitude);
        }

        if (unlisted > 0)
        {
            context.Error(ReadoutCodes.PsdTableBadLine, keyLocation, "noise.psd_table",
                $"{unlisted.ToString(CultureInfo.InvariantCulture)} more bad rows in '{SafeText.Excerpt(csvFile, 200)}' not shown");
        }

        if (context.ErrorCount > errorsBefore)
        {
            return null;
        }

        if (frequencies.Count < 2)
        {
            context.Error(ReadoutCodes.PsdTableTooShort, keyLocation, "noise.psd_table",
                $"'{csvFile}' has {frequencies.Count.ToString(CultureInfo.InvariantCulture)} data row(s); a spectrum needs at least 2");
            return null;
        }

        return new PsdTable(name, frequencies, densities);
    }

    /// <summary>Bad rows reported one by one; the rest are counted in one diagnostic.</summary>
    public const int MaxListedRows = 20;

    /// <summary>What is wrong with a row, quoting at most one short field (never the whole line of an arbitrary file).</summary>
    private static string BadLine(string[] fields)
    {
        const string expected = "expected two finite numbers \"frequency_hz, density_nv_per_rthz\"";
        if (fields.Length != 2)
        {
            return $"{expected}, found {fields.Length.ToString(CultureInfo.InvariantCulture)} comma-separated field(s)";
        }

        var bad = TryNumber(fields[0], out _) ? 1 : 0;
        var column = bad == 0 ? "frequency" : "density";
        return $"the {column} \"{SafeText.Excerpt(fields[bad].Trim(), 24)}\" is not a finite number; {expected}";
    }

    private static string StripComment(string line)
    {
        var hash = line.IndexOf('#', StringComparison.Ordinal);
        return hash < 0 ? line : line[..hash];
    }

    private static bool TryNumber(string field, out double value) =>
        double.TryParse(field.Trim(), NumberStyles.Float, CultureInfo.InvariantCulture, out value) && double.IsFinite(value);
}
