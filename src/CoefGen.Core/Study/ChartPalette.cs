using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// The project's own chart palette: one fixed colour and dash pattern per scheme and per noise source, the same in
/// every chart. The colours were picked for distinct lightness as well as hue, so that they stay apart for
/// red-green and blue-yellow colour vision deficiency (checked in the tests with the Machado, Oliveira and
/// Fernandes 2009 simulation); every series also has its own dash pattern, so colour is never the only cue.
/// </summary>
public static class ChartPalette
{
    /// <summary>Boxcar, weighted, optimal (index = <see cref="WeightScheme"/>).</summary>
    public static readonly IReadOnlyList<ChartStyle> Schemes =
    [
        new("#b35806", "9 4"),
        new("#6a3d9a", "2 3"),
        new("#0b4f8a", "", 2.2),
    ];

    /// <summary>The noise sources of a readout in their order in the file (and in the budget), cycling when there are more.</summary>
    public static readonly IReadOnlyList<ChartStyle> Sources =
    [
        new("#11847a", "7 3"),
        new("#c23b75", "1.5 2.5"),
        new("#6b7a0f", "12 3 2 3"),
        new("#4d72e0", "5 2 1 2"),
        new("#d98a1c", "14 5"),
        new("#8b6a55", "3 5"),
    ];

    /// <summary>A sum over sources (the analog total, the measured spectrum).</summary>
    public static readonly ChartStyle Total = new("#1a1a1a", "", 2.4);

    /// <summary>The digital part: quantisation and the ADC's own noise.</summary>
    public static readonly ChartStyle Digital = new("#7a7a7a", "6 2 2 2 2 2");

    /// <summary>The parametric (data-sheet) model drawn beside a measurement.</summary>
    public static readonly ChartStyle Model = new("#9c2a2a", "10 2 2 2");

    /// <summary>Markers (transfer instant) and other annotations.</summary>
    public const string Annotation = "#444444";

    public static ChartStyle Scheme(WeightScheme scheme) => Schemes[(int)scheme];

    public static ChartStyle Source(int index) => Sources[index % Sources.Count];

    /// <summary>Styles for series that have no fixed role (sweep plots): schemes first, then the source styles.</summary>
    public static ChartStyle Cycle(int index)
    {
        var all = Schemes.Concat(Sources).ToList();
        return all[index % all.Count];
    }
}
