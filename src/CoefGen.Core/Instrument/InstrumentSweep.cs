using CoefGen.Core.Study;

namespace CoefGen.Core.Instrument;

/// <summary>
/// A sweep of every table of an instrument: the same grid over each table's readout text (base + its mode's and
/// channel's keys), tables in parallel, results in table order. A varied key replaces the table's own value of it.
/// Each point is designed as a standalone readout file (its own [fixed_point] widths, not the shared ones).
/// </summary>
public static class InstrumentSweep
{
    /// <param name="design">The designed instrument (its tables' texts are swept).</param>
    /// <param name="point">How a point is designed (reads files relative to the base readout file).</param>
    /// <param name="axes">Varied keys, as for <see cref="Sweep.Run"/>.</param>
    /// <param name="maxParallelism">Worker limit over tables (null: one per core); each table's points run one after another.</param>
    public static IReadOnlyList<SweepResult> Run(InstrumentDesign design, DesignPoint point, IReadOnlyList<SweepAxis> axes, int? maxParallelism = null)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(point);
        ArgumentNullException.ThrowIfNull(axes);
        var results = new SweepResult[design.Tables.Count];
        var options = new ParallelOptions { MaxDegreeOfParallelism = maxParallelism ?? Environment.ProcessorCount };
        Parallel.For(0, results.Length, options, i => results[i] = Sweep.Run(design.Tables[i].Text, point, axes, maxParallelism: 1));
        return results;
    }
}
