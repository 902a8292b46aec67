using CoefGen.Core.Readout;

namespace CoefGen.Core.FixedPoint;

/// <summary>
/// The integer datapath for one channel: the single source of truth for emitted tables and golden vectors.
/// Arithmetic, exactly as <see cref="BitExactModel"/> computes it:
///   x_k = code_k (two's complement) or code_k - 2^(B-1) (offset binary: MSB flipped);
///   acc = sum_k c_k * x_k over the weighted samples in time order, each product formed at full width
///         (CoefBits + SampleBits), the sum wrapping or saturating at AccBits;
///   m   = acc * PostMultiplier (PostMultiplier = 1 for normalize = shift);
///   out = round(m / 2^Shift) with <see cref="Rounding"/>, then saturated to OutputBits (signed).
/// The output carries OutputFracBits fractional bits of ADU; P is the coefficient scale (h = c / 2^P).
/// </summary>
public sealed record IntegerDesign
{
    public required string Name { get; init; }

    /// <summary>Integer coefficient per weighted sample, time order (reset window first).</summary>
    public required IReadOnlyList<long> Coefficients { get; init; }

    /// <summary>Cycle index of each coefficient's sample.</summary>
    public required IReadOnlyList<int> SampleIndex { get; init; }

    public required int PixelSamples { get; init; }

    /// <summary>The reset window of a classic design (<see cref="TwoWindowCycle"/>); null for a general cycle.</summary>
    public SampleWindow? Reset { get; init; }

    /// <summary>The signal window of a classic design; null for a general cycle.</summary>
    public SampleWindow? Signal { get; init; }

    public required int AdcBits { get; init; }

    public required AdcCoding Coding { get; init; }

    /// <summary>Signed width of one sample entering the multiplier (AdcBits, or AdcBits + 1 when offset removal needs it... always AdcBits here since MSB flip is exact).</summary>
    public required int SampleBits { get; init; }

    public required int CoefBits { get; init; }

    public required int ProductBits { get; init; }

    public required int AccBits { get; init; }

    public required AccumulatorMode Accumulator { get; init; }

    public required int OutputBits { get; init; }

    public required int OutputFracBits { get; init; }

    public required RoundingMode Rounding { get; init; }

    public required NormalizeMode Normalize { get; init; }

    /// <summary>Coefficient scale: real weight h_k ~ c_k / 2^P (in ADU per ADU).</summary>
    public required int P { get; init; }

    /// <summary>Post-multiplier (1 for normalize = shift).</summary>
    public required long PostMultiplier { get; init; }

    /// <summary>Right shift applied to acc * PostMultiplier.</summary>
    public required int Shift { get; init; }

    /// <summary>Width of the post-multiplier as a signed operand (0 when PostMultiplier = 1 and no multiplier is built).</summary>
    public required int PostMultiplierBits { get; init; }

    /// <summary>The width proof and its findings.</summary>
    public required WidthProof Proof { get; init; }

    /// <summary>(realised gain / wanted gain - 1) in ppm.</summary>
    public required double GainErrorPpm { get; init; }

    /// <summary>Read noise of the integer weights against the real-valued ones, in percent (100 * (sigma_int / sigma_real - 1)).</summary>
    public required double NoisePenaltyPercent { get; init; }

    /// <summary>Predicted read noise at the output in output LSB (including output rounding), for reports.</summary>
    public required double PredictedNoiseOutputLsb { get; init; }

    /// <summary>
    /// The windows of a general cycle as runs of coefficients, in time order; null for a classic two-window design
    /// (then <see cref="Reset"/> and <see cref="Signal"/> are its windows; for a general cycle they are null).
    /// </summary>
    public IReadOnlyList<CoefGen.Core.Weights.GridWindow>? Windows { get; init; }

    /// <summary>Reset groups (1 for a classic design).</summary>
    public int GroupCount { get; init; } = 1;

    /// <summary>Copies of the repeated windows (1 when nothing repeats).</summary>
    public int ReadCount { get; init; } = 1;

    /// <summary>Rounding constant added before the shift for HalfUp (2^(Shift-1)), 0 otherwise.</summary>
    public long RoundingConstant => Rounding == RoundingMode.HalfUp && Shift > 0 ? 1L << (Shift - 1) : 0L;
}
