using CoefGen.Core.FixedPoint;
using CoefGen.Core.FixedPoint.TwoStage;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights.TwoStage;
using Scriban.Runtime;
using static CoefGen.Core.Emit.ModelBuilder;

namespace CoefGen.Core.Emit;

/// <summary>
/// The template model of the two-stage datapath (form = "two-stage"): the per-read table, the read weights, where each
/// read's samples sit, both stages' shifts and widths and the proof. Plain values only, every field listed in
/// templates/README.md ("Two-stage templates"). The arithmetic is <see cref="TwoStageBitExactModel"/>'s.
/// </summary>
public static class TwoStageTemplateModel
{
    /// <param name="name">Readout name (the identifier prefix comes from it).</param>
    /// <param name="d">The integer two-stage design.</param>
    /// <param name="layout">Read count, period and per-read sample offsets.</param>
    /// <param name="settings">The fixed-point settings it was designed for (coefficient and sample widths).</param>
    /// <param name="pixelSamples">Samples in the pixel cycle.</param>
    /// <param name="firstSample">Cycle sample of read 0's first weighted sample.</param>
    /// <param name="provenance">Tool, readout file and predicted noise of the two-stage weights.</param>
    public static TemplateModel Create(string name, TwoStageIntegerDesign d, ReadLayout layout, FixedPointSettings settings, int pixelSamples, int firstSample, Provenance provenance)
    {
        ArgumentNullException.ThrowIfNull(name);
        ArgumentNullException.ThrowIfNull(d);
        ArgumentNullException.ThrowIfNull(layout);
        ArgumentNullException.ThrowIfNull(settings);
        ArgumentNullException.ThrowIfNull(provenance);
        Validate(d, layout, settings, pixelSamples, firstSample);
        var g = new ScriptObject();
        var prefix = IdentifierPrefix.FromName(name);
        Names(g, name, prefix, provenance);
        Set(g, "vhdl_package", prefix + "_two_stage_pkg");

        Set(g, "pixel_samples", pixelSamples);
        Set(g, "read_count", layout.Reads);
        Set(g, "per_read_count", layout.PerRead);
        Set(g, "read_period", layout.Period);
        Set(g, "first_sample", firstSample);
        Set(g, "last_sample", firstSample + ((layout.Reads - 1) * layout.Period) + layout.Offsets[^1]);
        Set(g, "read_offsets", Array(layout.Offsets));

        var coefBits = settings.CoefBits;
        var wideC = coefBits > 32;
        Set(g, "coef_c_type", wideC ? "int64_t" : "int32_t");
        Literals(g, "table", d.Table, coefBits, wideC);
        Literals(g, "read_weights", d.ReadWeights, coefBits, wideC);

        Set(g, "adc_bits", d.AdcBits);
        Set(g, "sample_bits", settings.SampleBits);
        Set(g, "coef_bits", coefBits);
        Set(g, "p1", d.P1);
        Set(g, "p2", d.P2);
        Set(g, "stage1_shift", d.Stage1Shift);
        Set(g, "shift", d.Shift);
        var stage1Product = Bits(d, "stage1_product");
        var stage1Acc = Math.Max(d.Stage1AccBits, Bits(d, "stage1_accumulator_partial"));
        var readSumBits = Math.Max(2, stage1Acc - d.Stage1Shift + 1);
        var stage2Product = Bits(d, "stage2_product");
        Set(g, "stage1_product_bits", stage1Product);
        Set(g, "stage1_acc_bits", stage1Acc);
        Set(g, "read_sum_bits", readSumBits);
        Set(g, "stage2_product_bits", stage2Product);
        Set(g, "acc_bits", d.AccBits);
        Set(g, "output_bits", d.OutputBits);
        Set(g, "output_frac_bits", d.OutputFracBits);

        Modes(g, d.Rounding, settings.Accumulator, NormalizeMode.Shift);
        Coding(g, d.Coding, d.AdcBits);

        var (accMin, accMax) = SignedRange(d.AccBits);
        var (outMin, outMax) = SignedRange(d.OutputBits);
        Set(g, "acc_min_c", LiteralFormat.C((long)accMin, wide: true));
        Set(g, "acc_max_c", LiteralFormat.C((long)accMax, wide: true));
        Set(g, "output_min_c", LiteralFormat.C((long)outMin, wide: true));
        Set(g, "output_max_c", LiteralFormat.C((long)outMax, wide: true));
        Set(g, "output_min_sv", LiteralFormat.VerilogSigned(outMin, d.OutputBits));
        Set(g, "output_max_sv", LiteralFormat.VerilogSigned(outMax, d.OutputBits));

        Set(g, "proof", Proof(d.Proof));
        Set(g, "proof_safe", d.Proof.Safe);
        Set(g, "gain_error_ppm", LiteralFormat.RoundTrip(d.GainErrorPpm));
        Set(g, "noise_penalty_percent", LiteralFormat.RoundTrip(d.NoisePenaltyPercent));

        // The C reference works in int64_t: emitted only when every intermediate of both stages fits (with a sign bit to spare).
        var cApply = d.AdcBits <= 31 && coefBits <= 32 && stage1Product <= 62 && stage1Acc <= 62 && stage2Product <= 62
            && d.AccBits <= 62 && d.OutputBits <= 63 && d.Shift <= 61 && d.Stage1Shift <= 61;
        Set(g, "c_apply_supported", cApply);
        g.IsReadOnly = true;
        return new TemplateModel(g, prefix, Math.Max(d.Table.Count, d.ReadWeights.Count));
    }

    private static int Bits(TwoStageIntegerDesign d, string check) => d.Proof.Checks.Single(c => c.Name == check).RequiredBits;

    private static void Literals(ScriptObject g, string name, IReadOnlyList<long> values, int bits, bool wideC)
    {
        Set(g, name, Array(values));
        Set(g, name + "_c", Array(values.Select(c => LiteralFormat.C(c, wideC))));
        Set(g, name + "_vhdl", Array(values.Select(c => bits <= 32 ? LiteralFormat.VhdlInteger(c) : LiteralFormat.VhdlBits(c, bits))));
        Set(g, name + "_sv", Array(values.Select(c => LiteralFormat.VerilogSigned(c, bits))));
    }

    private static void Validate(TwoStageIntegerDesign d, ReadLayout layout, FixedPointSettings s, int pixelSamples, int firstSample)
    {
        if (d.Table.Count != layout.PerRead || d.ReadWeights.Count != layout.Reads || layout.Offsets.Count != layout.PerRead)
        {
            throw new ArgumentException("table, read weights and read layout disagree", nameof(d));
        }

        var (min, max) = SignedRange(s.CoefBits);
        if (d.Table.Concat(d.ReadWeights).Any(c => c < min || c > max))
        {
            throw new ArgumentException($"a two-stage coefficient does not fit {s.CoefBits} signed bits", nameof(d));
        }

        var last = firstSample + ((long)(layout.Reads - 1) * layout.Period) + layout.Offsets[^1];
        if (firstSample < 0 || last >= pixelSamples || d.AdcBits > 32 || d.Shift is < 0 or > 62 || d.Stage1Shift is < 0 or > 62)
        {
            throw new ArgumentException("a read lies outside the pixel cycle, or an ADC width or shift is out of range", nameof(d));
        }
    }
}
