namespace CoefGen.Core.FixedPoint;

/// <summary>Integer weights c at scale P (h ~ c / 2^P) as the quantiser left them.</summary>
/// <param name="Coefficients">One per weighted sample, time order.</param>
/// <param name="P">Coefficient scale.</param>
/// <param name="PowerOfTwoGain">True when the signal window sums to 2^P and the reset window to -2^P exactly.</param>
/// <param name="RefinementMoves">Pairwise +-1 moves the local refinement applied.</param>
public sealed record QuantisedWeights(IReadOnlyList<long> Coefficients, int P, bool PowerOfTwoGain, int RefinementMoves);
