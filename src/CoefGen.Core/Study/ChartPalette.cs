using CoefGen.Core.Readout;

namespace CoefGen.Core.Study;

/// <summary>
/// The project's own chart palette: one fixed colour and dash pattern per scheme and per noise source, the same in
/// every chart. The colours were found by a search that maximised the smallest CIELAB distance between any two of
/// them under normal vision and simulated protanopia, deuteranopia and tritanopia (Machado, Oliveira and Fernandes
/// 2009), keeping each clearly off white; the tests hold those distances. Every series also has its own dash
/// pattern, so colour is never the only cue.
/// </summary>
public static class ChartPalette
{
    /// <summary>Boxcar, weighted, optimal, robust (index = <see cref="WeightScheme"/>).</summary>
    public static readonly IReadOnlyList<ChartStyle> Schemes =
    [
        new("#e69a2e", "9 4", 2.2),
        new("#b0417f", "2 3", 2.2),
        new("#14336b", "", 2.2),
        new("#c61028", "8 3 1 3", 2.2),
    ];

    /// <summary>The noise sources of a readout in their order in the file (and in the budget), cycling when there are more.</summary>
    public static readonly IReadOnlyList<ChartStyle> Sources =
    [
        new("#00425f", "7 3"),
        new("#98403b", "1.5 2.5"),
        new("#0b9e00", "12 3 2 3"),
        new("#6268e6", "5 2 1 2"),
        new("#e2cc21", "14 5", 2.2),
        new("#bc6abf", "3 5"),
    ];

    /// <summary>A sum over sources (the analog total, the measured spectrum).</summary>
    public static readonly ChartStyle Total = new("#1a1a1a", "", 2.4);

    /// <summary>The digital part: quantisation and the ADC's own noise.</summary>
    public static readonly ChartStyle Digital = new("#8a8a8a", "6 2 2 2 2 2");

    /// <summary>The parametric (data-sheet) model drawn beside a measurement.</summary>
    public static readonly ChartStyle Model = new("#9c2a2a", "10 2 2 2");

    /// <summary>The ADC's own noise, a bar next to quantisation in the budget (bars carry their names, so colour is not the only cue).</summary>
    public static readonly ChartStyle AdcNoise = new("#4f4f4f", "1 2");

    /// <summary>A reference curve drawn beside the schemes (each scenario's own optimum).</summary>
    public static readonly ChartStyle Reference = new("#5a5a5a", "2 2 8 2");

    /// <summary>The two-stage form of repeated reads, drawn beside the schemes (at least 26 CIELAB units from each of them and from <see cref="Reference"/> under the four visions).</summary>
    public static readonly ChartStyle TwoStage = new("#07a364", "6 3 1 3 1 3", 2.2);

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
