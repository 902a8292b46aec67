using System.Globalization;
using System.Text;
using CoefGen.Core.Study;

namespace CoefGen.Cli.Output;

/// <summary>The sweep as CSV (RFC 4180 quoting, '\n' line ends, shortest round-trip numbers).</summary>
internal static class SweepCsv
{
    public static string Render(SweepResult r)
    {
        var firstValid = r.Points.Select(p => p.Outcome).FirstOrDefault(o => o.Valid);
        var schemes = firstValid?.Schemes.Select(s => DesignText.SchemeWord(s.Scheme)).ToList() ?? [];
        var regret = firstValid?.Schemes.All(s => s.WorstRegret is not null) == true;
        var perScheme = regret ? 3 : 2;
        var header = new List<string> { "point" };
        header.AddRange(r.Axes.Select(a => a.Key));
        foreach (var s in schemes)
        {
            header.Add($"{s}_noise_e_rms");
            header.Add($"{s}_noise_adu_rms");
            if (regret)
            {
                header.Add($"{s}_worst_regret");
            }
        }

        header.AddRange(["chosen", "safe", "gain_error_ppm", "noise_penalty_percent", "pixel_samples", "pixel_time_s", "diagnostics"]);
        var sb = new StringBuilder();
        sb.Append(string.Join(',', header.Select(Quote))).Append('\n');
        foreach (var p in r.Points)
        {
            var o = p.Outcome;
            var cells = new List<string> { p.Index.ToString(CultureInfo.InvariantCulture) };
            cells.AddRange(p.Values.Select(N));
            if (o.Valid)
            {
                foreach (var s in o.Schemes)
                {
                    cells.Add(N(s.NoiseElectrons));
                    cells.Add(N(s.NoiseAdu));
                    if (regret)
                    {
                        cells.Add(s.WorstRegret is double x ? N(x) : "");
                    }
                }

                cells.AddRange([DesignText.SchemeWord(o.Chosen), o.Safe ? "true" : "false", N(o.GainErrorPpm), N(o.NoisePenaltyPercent),
                    o.PixelSamples.ToString(CultureInfo.InvariantCulture), N(o.PixelTimeS)]);
            }
            else
            {
                cells.AddRange(Enumerable.Repeat("", (perScheme * schemes.Count) + 6));
            }

            cells.Add(string.Join("; ", o.Diagnostics.Select(d => d.ToString())));
            sb.Append(string.Join(',', cells.Select(Quote))).Append('\n');
        }

        return sb.ToString();
    }

    public static string N(double v) => v.ToString("R", CultureInfo.InvariantCulture);

    private static string Quote(string cell) =>
        cell.IndexOfAny([',', '"', '\n', '\r']) >= 0 ? "\"" + cell.Replace("\"", "\"\"", StringComparison.Ordinal) + "\"" : cell;
}
