using System.Numerics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;
using Scriban.Runtime;
using static CoefGen.Core.Emit.ModelBuilder;

namespace CoefGen.Core.Emit;

/// <summary>
/// The one read-only model every template sees, built from an <see cref="IntegerDesign"/> and its
/// <see cref="Provenance"/>. Templates get only plain values (strings, integers, booleans and read-only
/// arrays/objects of those) as top-level variables; every field is listed in templates/README.md.
/// Numbers that may exceed 64 bits, and all reals, are pre-formatted strings (invariant culture).
/// </summary>
public sealed class TemplateModel
{
    internal TemplateModel(ScriptObject globals, string prefix, int largestArray)
    {
        Globals = globals;
        Prefix = prefix;
        LargestArrayLength = largestArray;
    }

    /// <summary>The identifier prefix (see <see cref="IdentifierPrefix"/>).</summary>
    public string Prefix { get; }

    /// <summary>Length of the longest array in the model; sizes the renderer's loop limit.</summary>
    public int LargestArrayLength { get; }

    /// <summary>The read-only top-level variables.</summary>
    internal ScriptObject Globals { get; }

    /// <summary>
    /// Builds the model. Throws <see cref="ArgumentException"/> when the design is inconsistent (array
    /// lengths, coefficients outside CoefBits, widths outside 1..64): such a design is a bug upstream.
    /// </summary>
    public static TemplateModel Create(IntegerDesign design, Provenance provenance)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(provenance);
        Validate(design);
        var d = design;
        var g = new ScriptObject();
        var prefix = IdentifierPrefix.FromName(d.Name);
        Names(g, d.Name, prefix, provenance);
        Set(g, "vhdl_package", prefix + "_coefs_pkg");

        Set(g, "pixel_samples", d.PixelSamples);
        if (d.Reset is { } reset && d.Signal is { } signal)
        {
            // The classic design's RESET_/SIGNAL_ constants; a general cycle has its window table instead (CycleModel).
            Set(g, "reset_start", reset.Start);
            Set(g, "reset_count", reset.Count);
            Set(g, "signal_start", signal.Start);
            Set(g, "signal_count", signal.Count);
        }

        Set(g, "coef_count", d.Coefficients.Count);
        Set(g, "sample_index", Array(d.SampleIndex));
        Set(g, "last_index", d.Coefficients.Count - 1);
        CycleModel.Add(g, d);

        var wideC = d.CoefBits > 32;
        Coefficients(g, d, wideC);
        Set(g, "coef_wide", wideC);
        Set(g, "coef_c_type", wideC ? "int64_t" : "int32_t");
        Set(g, "coef_min", d.Coefficients.Min());
        Set(g, "coef_max", d.Coefficients.Max());

        Set(g, "adc_bits", d.AdcBits);
        Set(g, "sample_bits", d.SampleBits);
        Set(g, "coef_bits", d.CoefBits);
        Set(g, "product_bits", d.ProductBits);
        Set(g, "acc_bits", d.AccBits);
        Set(g, "output_bits", d.OutputBits);
        Set(g, "output_frac_bits", d.OutputFracBits);
        Set(g, "post_multiplier_bits", d.PostMultiplierBits);
        var scaledBits = d.AccBits + d.PostMultiplierBits;
        Set(g, "scaled_bits", scaledBits);
        Set(g, "p", d.P);
        Set(g, "shift", d.Shift);

        Set(g, "post_multiplier", d.PostMultiplier);
        Set(g, "post_multiplier_c", LiteralFormat.C(d.PostMultiplier, wide: true));
        Set(g, "post_multiplier_sv", LiteralFormat.VerilogSigned(d.PostMultiplier, 64));
        Set(g, "post_multiplier_fits_int32", d.PostMultiplier is >= int.MinValue and <= int.MaxValue);

        var rc = d.RoundingConstant;
        var rcBits = d.Shift + 1;
        Set(g, "rounding_constant", LiteralFormat.DecimalText(rc));
        Set(g, "rounding_constant_c", LiteralFormat.C(rc, wide: true));
        Set(g, "rounding_constant_sv", LiteralFormat.VerilogSigned(rc, 64));
        Set(g, "rounding_constant_bits", rcBits);
        Set(g, "rounding_constant_vhdl_bits", LiteralFormat.VhdlBits(rc, rcBits));
        Set(g, "rounding_constant_fits_int32", rc <= int.MaxValue);

        Modes(g, d.Rounding, d.Accumulator, d.Normalize);
        Coding(g, d.Coding, d.AdcBits);

        Ranges(g, d);
        Set(g, "proof", Proof(d.Proof));
        Set(g, "proof_safe", d.Proof.Safe);
        Set(g, "gain_error_ppm", LiteralFormat.RoundTrip(d.GainErrorPpm));
        Set(g, "noise_penalty_percent", LiteralFormat.RoundTrip(d.NoisePenaltyPercent));
        Set(g, "predicted_noise_output_lsb", LiteralFormat.RoundTrip(d.PredictedNoiseOutputLsb));

        // The C reference function works in int64_t; it is emitted only when every intermediate fits.
        var cApply = d.ProductBits <= 62 && scaledBits + 1 <= 62 && d.AccBits <= 62 && d.Shift <= 61 && d.AdcBits <= 31
            && d.OutputBits <= 63;
        Set(g, "c_apply_supported", cApply);

        // Otherwise the 128-bit path (compiler __int128 or two words): 64-bit products, accumulator and output, acc * M below 2^127.
        var cWide = !cApply && d.AdcBits <= 31 && d.CoefBits <= 32 && d.AccBits <= 64 && d.OutputBits <= 64
            && d.AccBits + Math.Max(d.PostMultiplierBits, 1) <= 127 && d.Shift <= 126;
        Set(g, "c_apply_wide", cWide);
        g.IsReadOnly = true;
        return new TemplateModel(g, prefix, d.Coefficients.Count);
    }

    private static void Ranges(ScriptObject g, IntegerDesign d)
    {
        var (accMin, accMax) = SignedRange(d.AccBits);
        var (outMin, outMax) = SignedRange(d.OutputBits);
        Set(g, "acc_min", LiteralFormat.DecimalText(accMin));
        Set(g, "acc_max", LiteralFormat.DecimalText(accMax));
        Set(g, "acc_min_c", LiteralFormat.C((long)accMin, wide: true));
        Set(g, "acc_max_c", LiteralFormat.C((long)accMax, wide: true));
        Set(g, "output_min", LiteralFormat.DecimalText(outMin));
        Set(g, "output_max", LiteralFormat.DecimalText(outMax));
        Set(g, "output_min_c", LiteralFormat.C((long)outMin, wide: true));
        Set(g, "output_max_c", LiteralFormat.C((long)outMax, wide: true));
        Set(g, "output_min_sv", LiteralFormat.VerilogSigned(outMin, d.OutputBits));
        Set(g, "output_max_sv", LiteralFormat.VerilogSigned(outMax, d.OutputBits));
    }

    private static void Validate(IntegerDesign d)
    {
        var n = d.Coefficients.Count;
        var windowed = d.Windows?.Sum(w => w.Count) ?? (d.Reset?.Count ?? 0) + (d.Signal?.Count ?? 0);
        if (n == 0 || d.SampleIndex.Count != n || windowed != n)
        {
            throw new ArgumentException("coefficients, sample indices and window counts disagree", nameof(d));
        }

        foreach (var bits in new[] { d.AdcBits, d.SampleBits, d.CoefBits, d.ProductBits, d.AccBits, d.OutputBits })
        {
            if (bits is < 2 or > 64)
            {
                throw new ArgumentException($"width {bits} is outside 2..64", nameof(d));
            }
        }

        if (d.AdcBits > 32 || d.Shift is < 0 or > 62 || d.PostMultiplierBits is < 0 or > 63)
        {
            throw new ArgumentException("ADC width above 32, shift outside 0..62 or post-multiplier width outside 0..63", nameof(d));
        }

        var (min, max) = SignedRange(d.CoefBits);
        if (d.Coefficients.Any(c => c < min || c > max))
        {
            throw new ArgumentException($"a coefficient does not fit {d.CoefBits} signed bits", nameof(d));
        }

        if (d.SampleIndex.Any(i => i < 0 || i >= d.PixelSamples))
        {
            throw new ArgumentException("a sample index lies outside the pixel cycle", nameof(d));
        }
    }
}
