using System.Globalization;
using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Readout.Loading;

/// <summary>Reads [noise], its [[noise.source]] entries and the measured spectrum it names.</summary>
internal static class NoiseSectionReader
{
    private static readonly (string, NoiseReference)[] References = [("sensor", NoiseReference.Sensor), ("adc", NoiseReference.Adc)];

    /// <summary>The low edge of the 1/f part when none is given, in Hz.</summary>
    public const double DefaultLowCutoffHz = 0.01;

    /// <param name="root">The top-level table.</param>
    /// <param name="gain">The chain gain, or null when [sensor] was invalid (sensor-referred tables are then not converted).</param>
    /// <param name="poleGiven">Whether front_end_pole_hz is written (even if invalid), so a "pole" step is not also blamed.</param>
    public static NoiseSpec? Read(TableReader root, double? gain, out bool poleGiven)
    {
        poleGiven = false;
        var context = root.Context;
        var errorsBefore = context.ErrorCount;
        var noise = root.Section("noise", required: false);
        if (noise is null)
        {
            if (!root.Has("noise"))
            {
                context.Error(ReadoutCodes.NoNoise, context.FileOnly, "noise",
                    "no noise is described; add a [[noise.source]] or a [noise] psd_table");
            }

            return null;
        }

        poleGiven = noise.Has("front_end_pole_hz");
        noise.RejectUnknown("front_end_pole_hz", "bandwidth_hz", "psd_table", "psd_at", "capture", "source");
        var pole = noise.Quantity("front_end_pole_hz", required: false, PhysicalRange.FrequencyHz);
        var bandwidth = noise.Quantity("bandwidth_hz", required: false, PhysicalRange.FrequencyHz);
        var capture = noise.Text("capture", required: false);
        var sources = ReadSources(noise);
        var table = ReadTable(noise, gain);
        if (sources.Count == 0 && !noise.Has("psd_table") && !noise.Has("source"))
        {
            context.Error(ReadoutCodes.NoNoise, noise.Location, "noise",
                "no noise is described; add a [[noise.source]] or a psd_table");
        }

        if (!noise.Has("front_end_pole_hz") && !noise.Has("bandwidth_hz"))
        {
            foreach (var (source, reader) in sources)
            {
                if (source.WhiteNvPerRtHz > 0 || source.FlickerCornerHz > 0)
                {
                    context.Error(ReadoutCodes.UnboundedNoise, reader.Location, reader.Path,
                        $"source '{source.Name}' has a white or 1/f part but nothing limits its bandwidth, so its variance is infinite; give noise.front_end_pole_hz or noise.bandwidth_hz");
                }
            }
        }

        if (bandwidth is double limit)
        {
            CheckCutoffsBelowBandwidth(noise, sources, limit);
        }

        return context.ErrorCount > errorsBefore
            ? null
            : new NoiseSpec(sources.Select(s => s.Source).ToList(), pole, bandwidth, table, capture);
    }

    private static List<(NoiseSourceSpec Source, TableReader Reader)> ReadSources(TableReader noise)
    {
        var result = new List<(NoiseSourceSpec, TableReader)>();
        var names = new Dictionary<string, string>(StringComparer.Ordinal);
        foreach (var source in noise.SectionArray("source"))
        {
            source.RejectUnknown("name", "at", "white_nv_per_rthz", "flicker_corner_hz", "low_cutoff_hz");
            var name = source.Text("name", required: true);
            if (name is not null && !names.TryAdd(name, source.Path))
            {
                source.Context.Error(ReadoutCodes.DuplicateSourceName, source.Entry("name")!.ValueLocation, source.KeyPath("name"),
                    $"a noise source named \"{name}\" is already defined ({names[name]}); source names must be unique");
            }

            var at = source.Choice("at", References);
            var white = source.Quantity("white_nv_per_rthz", required: true, PhysicalRange.WhiteNvPerRtHz);
            var corner = source.Has("flicker_corner_hz") ? source.Quantity("flicker_corner_hz", required: false, PhysicalRange.CornerHz) : 0.0;
            var lowCutoff = source.Has("low_cutoff_hz") ? source.Quantity("low_cutoff_hz", required: false, PhysicalRange.LowCutoffHz) : DefaultLowCutoffHz;
            if (name is null || white is null || corner is null || lowCutoff is null || (source.Has("at") && at is null))
            {
                continue;
            }

            if (corner > 0 && lowCutoff >= corner)
            {
                var key = source.Has("low_cutoff_hz") ? "low_cutoff_hz" : "flicker_corner_hz";
                source.Context.Warning(ReadoutCodes.LowCutoffAboveCorner, source.Entry(key)!.ValueLocation, source.KeyPath(key),
                    $"source '{name}': low cutoff {Hz(lowCutoff.Value)} Hz is not below the flicker corner {Hz(corner.Value)} Hz, so the 1/f part hardly contributes; usually low_cutoff_hz is about 1 / (frame time)");
            }

            result.Add((new NoiseSourceSpec(name, at ?? NoiseReference.Sensor, white.Value, corner.Value, lowCutoff.Value), source));
        }

        return result;
    }

    /// <summary>The 1/f part lives from its low cutoff to the bandwidth limit; a limit at or below the cutoff leaves nothing.</summary>
    private static void CheckCutoffsBelowBandwidth(TableReader noise, List<(NoiseSourceSpec Source, TableReader Reader)> sources, double bandwidthHz)
    {
        foreach (var (source, _) in sources.Where(s => s.Source.FlickerCornerHz > 0 && s.Source.WhiteNvPerRtHz > 0 && s.Source.LowCutoffHz >= bandwidthHz))
        {
            noise.Context.Error(ReadoutCodes.BandwidthBelowLowCutoff, noise.Entry("bandwidth_hz")!.ValueLocation, noise.KeyPath("bandwidth_hz"),
                $"bandwidth_hz = {Hz(bandwidthHz)} Hz is not above the 1/f low cutoff {Hz(source.LowCutoffHz)} Hz of source '{source.Name}'; allowed: a bandwidth above every low_cutoff_hz (usually the bandwidth is MHz and the cutoff about 1 / frame time)");
        }
    }

    private static PsdTable? ReadTable(TableReader noise, double? gain)
    {
        var reference = noise.Choice("psd_at", References);
        var path = noise.Text("psd_table", required: false);
        if (path is null || (noise.Has("psd_at") && reference is null) || gain is null)
        {
            return null;
        }

        var context = noise.Context;
        var location = noise.Entry("psd_table")!.ValueLocation;
        var csvFile = CsvName(context.File, path);
        var content = context.ReadRelative(path, out var problem);
        if (content is null)
        {
            var reason = problem is null ? "" : $": {problem}";
            context.Error(ReadoutCodes.PsdTableUnreadable, location, noise.KeyPath("psd_table"),
                $"cannot read the spectrum table '{SafeText.Excerpt(csvFile, 200)}'{reason}; give a CSV file relative to the readout file");
            return null;
        }

        var scale = reference == NoiseReference.Sensor ? Math.Abs(gain.Value) : 1.0;
        return PsdTableReader.Read(content, csvFile, path, scale, location, context);
    }

    /// <summary>The CSV named next to the readout file, for messages (string work only, no file access).</summary>
    private static string CsvName(string readoutFile, string path)
    {
        var folder = Path.GetDirectoryName(readoutFile);
        return string.IsNullOrEmpty(folder) || Path.IsPathRooted(path) ? path : Path.Combine(folder, path);
    }

    private static string Hz(double value) => value.ToString("G6", CultureInfo.InvariantCulture);
}
