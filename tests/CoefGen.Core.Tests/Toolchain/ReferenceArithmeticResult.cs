using System.Numerics;

namespace CoefGen.Core.Tests.Toolchain;

/// <summary>What <see cref="ReferenceArithmetic.Evaluate"/> computes for one pixel cycle.</summary>
/// <param name="Accumulator">The AccBits-wide accumulator after the last product (wrapped or saturated).</param>
/// <param name="Output">The OutputBits-wide output word.</param>
/// <param name="AccumulatorClipped">A saturating accumulator clamped at least one partial sum.</param>
/// <param name="OutputSaturated">The rounded output was clamped to OutputBits.</param>
public sealed record ReferenceArithmeticResult(BigInteger Accumulator, BigInteger Output, bool AccumulatorClipped, bool OutputSaturated);
