using CoefGen.Core.Pipeline;

namespace CoefGen.Core.Instrument;

/// <summary>
/// What a reviewer reads of one design (a readout file or one instrument table): cycle, windows, read noise per scheme,
/// integer penalty, proof margin and the integer datapath's numbers. Windows are the runs of consecutive weighted samples,
/// so the summary depends only on the design result, not on how the readout file describes its windows.
/// </summary>
public sealed record TableSummary
{
    public required string Label { get; init; }

    public required double PixelTimeS { get; init; }

    public required int PixelSamples { get; init; }

    /// <summary>First and last cycle index of each run of consecutive weighted samples, in time order.</summary>
    public required IReadOnlyList<(int First, int Last)> Windows { get; init; }

    /// <summary>Read noise in e- rms per scheme name (boxcar, weighted, optimal: the label's first word), in the pipeline's scheme order.</summary>
    public required IReadOnlyList<(string Scheme, double Electrons)> Noise { get; init; }

    public required string ChosenScheme { get; init; }

    public required double PenaltyPercent { get; init; }

    /// <summary>
    /// Smallest spare bits over the checks that decide safety, the coefficient check aside (the quantiser fills the
    /// coefficient width by construction); negative when one does not fit.
    /// </summary>
    public required int MarginBits { get; init; }

    public required bool Safe { get; init; }

    public required int P { get; init; }

    public required int Shift { get; init; }

    public required long PostMultiplier { get; init; }

    public required int OutputFracBits { get; init; }

    /// <summary>Available bits per proof check name (coefficient, product, accumulator_final, ...).</summary>
    public required IReadOnlyList<(string Check, int RequiredBits, int AvailableBits)> Widths { get; init; }

    public required IReadOnlyList<long> Coefficients { get; init; }

    public static TableSummary Of(string label, DesignResult r)
    {
        ArgumentNullException.ThrowIfNull(label);
        ArgumentNullException.ThrowIfNull(r);
        var d = r.Datapath;
        return new TableSummary
        {
            Label = label,
            PixelTimeS = d.PixelSamples / r.Description.Adc.RateHz,
            PixelSamples = d.PixelSamples,
            Windows = Runs(d.SampleIndex),
            Noise = [.. r.Predictions.Select(p => (p.Label.Split(' ')[0], p.SigmaElectrons))],
            ChosenScheme = r.ChosenPrediction.Label,
            PenaltyPercent = d.NoisePenaltyPercent,
            MarginBits = d.Proof.Checks.Where(c => c.Required && c.Name != "coefficient").Min(c => c.MarginBits),
            Safe = d.Proof.Safe,
            P = d.P,
            Shift = d.Shift,
            PostMultiplier = d.PostMultiplier,
            OutputFracBits = d.OutputFracBits,
            Widths = [.. d.Proof.Checks.Select(c => (c.Name, c.RequiredBits, c.AvailableBits))],
            Coefficients = d.Coefficients,
        };
    }

    public static IReadOnlyList<TableSummary> Of(InstrumentDesign design)
    {
        ArgumentNullException.ThrowIfNull(design);
        return [.. design.Tables.Select(t => Of(t.Label, t.Result))];
    }

    private static List<(int, int)> Runs(IReadOnlyList<int> index)
    {
        var runs = new List<(int, int)>();
        var start = 0;
        for (var k = 1; k <= index.Count; k++)
        {
            if (k == index.Count || index[k] != index[k - 1] + 1)
            {
                runs.Add((index[start], index[k - 1]));
                start = k;
            }
        }

        return runs;
    }
}
