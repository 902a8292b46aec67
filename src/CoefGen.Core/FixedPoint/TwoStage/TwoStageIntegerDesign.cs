using CoefGen.Core.Readout;

namespace CoefGen.Core.FixedPoint.TwoStage;

/// <summary>
/// The integer two-stage datapath (README "Cycles with many windows"): per read j, acc1_j = sum_p g_p x_(j,p) at full
/// width, then r_j = round(acc1_j / 2^Stage1Shift); acc2 = sum_j w_j r_j; out = round(acc2 / 2^Shift) saturated to OutputBits.
/// </summary>
/// <param name="Table">g: per-read integer table at scale 2^P1, sum g = 0 exactly over each reset class of the read (ReadLayout.ResetClasses).</param>
/// <param name="ReadWeights">w: integer read weights at scale 2^P2.</param>
/// <param name="P1">Scale of g.</param>
/// <param name="P2">Scale of w.</param>
/// <param name="Stage1Shift">s1: the smallest shift of the first sums that lets the second stage fit the accumulator.</param>
/// <param name="Shift">P1 + P2 - s1 - OutputFracBits (output gain 2^F per ADU up to the reported gain error).</param>
/// <param name="OutputFracBits">F.</param>
/// <param name="AdcBits">ADC width.</param>
/// <param name="Coding">ADC coding.</param>
/// <param name="Stage1AccBits">Width given to acc1: the proved requirement.</param>
/// <param name="AccBits">Width of acc2 (the target's accumulator).</param>
/// <param name="OutputBits">Output width.</param>
/// <param name="Rounding">Output rounding.</param>
/// <param name="Proof">Widths of both stages over all ADC codes.</param>
/// <param name="GainErrorPpm">Realised gain sum_j w_j sum_p g_p s_(j,p) / 2^(P1+P2) against 1.</param>
/// <param name="NoisePenaltyPercent">Integer two-stage noise against the real two-stage weights.</param>
public sealed record TwoStageIntegerDesign(
    IReadOnlyList<long> Table,
    IReadOnlyList<long> ReadWeights,
    int P1,
    int P2,
    int Stage1Shift,
    int Shift,
    int OutputFracBits,
    int AdcBits,
    AdcCoding Coding,
    int Stage1AccBits,
    int AccBits,
    int OutputBits,
    RoundingMode Rounding,
    WidthProof Proof,
    double GainErrorPpm,
    double NoisePenaltyPercent);
