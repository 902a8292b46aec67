namespace CoefGen.Core.FixedPoint;

/// <summary>What the hardware holds after one pixel cycle.</summary>
/// <param name="Accumulator">The accumulator register (AccBits wide, wrapped or saturated as the design says).</param>
/// <param name="Output">The final output word (OutputBits wide, OutputFracBits fractional bits of ADU).</param>
/// <param name="AccumulatorClipped">True when a saturating accumulator clipped at least one partial sum.</param>
/// <param name="OutputSaturated">True when the output was clamped to its width.</param>
public sealed record BitExactResult(long Accumulator, long Output, bool AccumulatorClipped, bool OutputSaturated);
