using CoefGen.Core.FixedPoint.TwoStage;
using CoefGen.Core.Weights.TwoStage;

namespace CoefGen.Core.Pipeline;

/// <summary>The two-stage form of repeated identical reads: the real design and its proved integer datapath.</summary>
/// <param name="Real">Per-read table g and read weights a (h = a (x) g), designed jointly.</param>
/// <param name="Quantised">The integer tables, shifts, widths and proof of both stages.</param>
/// <param name="Layout">Where read j's samples sit in the cycle.</param>
public sealed record TwoStageDatapath(TwoStageResult Real, TwoStageIntegerDesign Quantised, ReadLayout Layout);
