using System.Globalization;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Study;

/// <summary>The report's view of a general cycle: its windows as table rows, and line breaks between windows in charts.</summary>
internal static class CycleReportRows
{
    /// <summary>Windows listed one per row up to this many; longer cycles list the first and last few.</summary>
    private const int ListedEach = 4;

    public static IEnumerable<IReadOnlyList<ReportCell>> Rows(CycleSpec cycle)
    {
        yield return [ReportCell.Of("reset groups"), ReportCell.Number("readout.timing.cycle.group_count", cycle.GroupCount)];
        yield return [ReportCell.Of("repeated reads"), ReportCell.Number("readout.timing.cycle.repeat_count", cycle.RepeatCount)];
        if (cycle.ReferenceTimeS is double reference)
        {
            yield return [ReportCell.Of("ramp reference time"), ReportCell.Si("readout.timing.cycle.reference_time_s", reference, "s")];
        }

        var windows = cycle.Windows;
        for (var i = 0; i < windows.Count; i++)
        {
            if (windows.Count > 2 * ListedEach && i >= ListedEach && i < windows.Count - ListedEach)
            {
                if (i == ListedEach)
                {
                    yield return [ReportCell.Of(string.Create(CultureInfo.InvariantCulture, $"... {windows.Count - (2 * ListedEach)} more windows")), ReportCell.Of("")];
                }

                continue;
            }

            var w = windows[i];
            var path = string.Create(CultureInfo.InvariantCulture, $"readout.timing.cycle.windows[{i}]");
            var sees = w.Sees switch
            {
                ChargeSight.None => "no charge",
                ChargeSight.Transfer => "charge after its transfer",
                _ => "integrating ramp",
            };
            var label = string.Create(CultureInfo.InvariantCulture, $"window '{w.Name}' ({sees}, reset group {w.ResetGroup})");
            yield return [ReportCell.Of(label + " start"), ReportCell.With(path + ".start", w.Samples.Start, "(sample index)")];
            yield return [ReportCell.Of(label + " length"), ReportCell.With(path + ".count", w.Samples.Count, "samples")];
        }
    }

    /// <summary>The values in grid order with a NaN before every window but the first (a break in a chart's line).</summary>
    public static double[] WithBreaks(SampleGrid grid, IReadOnlyList<double> values)
    {
        var result = new List<double>(values.Count + grid.Windows.Count);
        foreach (var w in grid.Windows)
        {
            if (w.First > 0)
            {
                result.Add(double.NaN);
            }

            for (var k = w.First; k < w.First + w.Count; k++)
            {
                result.Add(values[k]);
            }
        }

        return [.. result];
    }
}
