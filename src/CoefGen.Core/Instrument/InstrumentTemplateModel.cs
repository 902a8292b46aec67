using CoefGen.Core.Emit;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Readout;
using Scriban.Runtime;
using static CoefGen.Core.Emit.ModelBuilder;

namespace CoefGen.Core.Instrument;

/// <summary>
/// The model of the combined templates: every table of an instrument for a datapath that picks its table at run time.
/// Shared widths and modes at top level; per table its place (mode, channel), coefficient count, shift, post-multiplier,
/// rounding constant, and the coefficient and sample-index arrays, also padded with zeros to max_coef_count.
/// Every field is listed in templates/README.md.
/// </summary>
public static class InstrumentTemplateModel
{
    /// <param name="design">The instrument design.</param>
    /// <param name="toolName">Generating tool, for the opening comment.</param>
    /// <param name="toolVersion">Its version.</param>
    public static TemplateModel Create(InstrumentDesign design, string toolName, string toolVersion)
    {
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(toolName);
        ArgumentNullException.ThrowIfNull(toolVersion);
        var spec = design.Spec;
        var s = design.Settings;
        var g = new ScriptObject();
        var prefix = IdentifierPrefix.FromName(spec.Name);
        Set(g, "name", ModelText.CommentSafe(spec.Name));
        Set(g, "prefix", prefix);
        Set(g, "prefix_upper", prefix.ToUpperInvariant());
        Set(g, "tool_name", ModelText.CommentSafe(toolName));
        Set(g, "tool_version", ModelText.CommentSafe(toolVersion));
        Set(g, "instrument_file", ModelText.CommentSafe(Path.GetFileName(spec.SourcePath)));
        Set(g, "instrument_sha256", spec.ContentSha256);
        Set(g, "base_file", ModelText.CommentSafe(Path.GetFileName(design.BasePath)));
        Set(g, "base_sha256", design.BaseSha256);

        Set(g, "modes", Array(spec.Modes.Select((m, i) => Named(m.Name, i))));
        Set(g, "channels", Array(spec.Channels.Select((c, i) => Named(c.Name, i))));
        Set(g, "mode_count", spec.Modes.Count);
        Set(g, "channel_count", spec.Channels.Count);
        Set(g, "table_count", design.Tables.Count);
        var max = design.MaxCoefficientCount;
        Set(g, "max_coef_count", max);
        Set(g, "max_pixel_samples", design.Tables.Max(t => t.Result.Datapath.PixelSamples));
        var index = new int[spec.Modes.Count, spec.Channels.Count];
        foreach (var t in design.Tables)
        {
            index[t.ModeIndex, t.ChannelIndex] = t.Index + 1;
        }

        Set(g, "table_index", Array(Enumerable.Range(0, spec.Modes.Count).Select(m => Array(Enumerable.Range(0, spec.Channels.Count).Select(c => index[m, c] - 1)))));

        var first = design.Tables[0].Result.Datapath;
        var adcBits = design.Tables.Max(t => t.Result.Datapath.AdcBits);
        Set(g, "adc_bits", adcBits);
        Set(g, "sample_bits", s.SampleBits);
        Set(g, "coef_bits", s.CoefBits);
        Set(g, "product_bits", first.ProductBits);
        Set(g, "acc_bits", s.AccBits);
        Set(g, "output_bits", s.OutputBits);
        Set(g, "output_frac_bits", design.OutputFracBits);
        var postBits = design.Tables.Max(t => t.Result.Datapath.PostMultiplierBits);
        Set(g, "post_multiplier_bits", postBits);
        var maxShift = design.Tables.Max(t => t.Result.Datapath.Shift);
        Set(g, "max_shift", maxShift);
        Modes(g, s.Rounding, s.Accumulator, s.Normalize);
        var wideC = s.CoefBits > 32;
        Set(g, "coef_wide", wideC);
        Set(g, "coef_c_type", wideC ? "int64_t" : "int32_t");
        var (accMin, accMax) = SignedRange(s.AccBits);
        var (outMin, outMax) = SignedRange(s.OutputBits);
        Set(g, "acc_min_c", LiteralFormat.C((long)accMin, wide: true));
        Set(g, "acc_max_c", LiteralFormat.C((long)accMax, wide: true));
        Set(g, "output_min_c", LiteralFormat.C((long)outMin, wide: true));
        Set(g, "output_max_c", LiteralFormat.C((long)outMax, wide: true));
        Set(g, "proof_safe", design.Safe);
        Set(g, "widths", Array(design.Widths.Select(Width)));
        var cApply = first.ProductBits <= 62 && s.AccBits + postBits + 1 <= 62 && s.AccBits <= 62 && maxShift <= 61 && adcBits <= 31 && s.OutputBits <= 63;
        Set(g, "c_apply_supported", cApply);

        // Wide constants are written at one width for all tables: enough for the largest value of any table.
        var constBits = Math.Max(2, Math.Max(postBits + 1, maxShift + 1));
        Set(g, "constant_bits", constBits);
        Set(g, "tables", Array(design.Tables.Select(t => Table(t, max, s.CoefBits, constBits, wideC))));
        g.IsReadOnly = true;
        return new TemplateModel(g, prefix, Math.Max(max, design.Tables.Count));
    }

    private static ScriptObject Named(string name, int index)
    {
        var o = new ScriptObject();
        Set(o, "name", name);
        Set(o, "name_upper", name.ToUpperInvariant());
        Set(o, "index", index);
        o.IsReadOnly = true;
        return o;
    }

    private static ScriptObject Width(SharedWidth w)
    {
        var o = new ScriptObject();
        Set(o, "name", w.Name);
        Set(o, "required_bits", w.RequiredBits);
        Set(o, "available_bits", w.AvailableBits);
        Set(o, "margin_bits", w.MarginBits);
        Set(o, "widest_table", w.WidestTable);
        Set(o, "required", w.Required);
        o.IsReadOnly = true;
        return o;
    }

    private static ScriptObject Table(InstrumentTable t, int max, int coefBits, int constBits, bool wideC)
    {
        var d = t.Result.Datapath;
        var o = new ScriptObject();
        Set(o, "index", t.Index);
        Set(o, "mode", t.Mode);
        Set(o, "channel", t.Channel);
        Set(o, "mode_index", t.ModeIndex);
        Set(o, "channel_index", t.ChannelIndex);
        Set(o, "label", t.Label);
        Set(o, "prefix", IdentifierPrefix.FromName(d.Name));
        Set(o, "noise_e", LiteralFormat.RoundTrip(t.Result.ChosenPrediction.SigmaElectrons));
        Set(o, "scheme", ModelText.CommentSafe(t.Result.ChosenPrediction.Label));
        Set(o, "safe", d.Proof.Safe);
        Set(o, "coef_count", d.Coefficients.Count);
        Set(o, "pixel_samples", d.PixelSamples);
        Set(o, "adc_bits", d.AdcBits);
        var offset = d.Coding == AdcCoding.OffsetBinary ? 1L << (d.AdcBits - 1) : 0L;
        Set(o, "offset_binary", d.Coding == AdcCoding.OffsetBinary);
        Set(o, "adc_offset", offset);
        Set(o, "p", d.P);
        Set(o, "shift", d.Shift);
        Set(o, "post_multiplier", LiteralFormat.DecimalText(d.PostMultiplier));
        Set(o, "post_multiplier_c", LiteralFormat.C(d.PostMultiplier, wide: true));
        Set(o, "post_multiplier_sv", LiteralFormat.VerilogSigned(d.PostMultiplier, constBits));
        Set(o, "post_multiplier_vhdl_bits", LiteralFormat.VhdlBits(d.PostMultiplier, constBits));
        Set(o, "rounding_constant", LiteralFormat.DecimalText(d.RoundingConstant));
        Set(o, "rounding_constant_c", LiteralFormat.C(d.RoundingConstant, wide: true));
        Set(o, "rounding_constant_sv", LiteralFormat.VerilogSigned(d.RoundingConstant, constBits));
        Set(o, "rounding_constant_vhdl_bits", LiteralFormat.VhdlBits(d.RoundingConstant, constBits));
        Coefficients(o, d, wideC);
        Set(o, "sample_index", Array(d.SampleIndex));
        var padded = d.Coefficients.Concat(Enumerable.Repeat(0L, max - d.Coefficients.Count)).ToArray();
        Set(o, "coefs_padded", Array(padded));
        Set(o, "coefs_padded_c", Array(padded.Select(c => LiteralFormat.C(c, wideC))));
        Set(o, "coefs_padded_vhdl", Array(padded.Select(c => coefBits <= 32 ? LiteralFormat.VhdlInteger(c) : LiteralFormat.VhdlBits(c, coefBits))));
        Set(o, "coefs_padded_sv", Array(padded.Select(c => LiteralFormat.VerilogSigned(c, coefBits))));
        Set(o, "sample_index_padded", Array(d.SampleIndex.Concat(Enumerable.Repeat(0, max - d.SampleIndex.Count))));
        o.IsReadOnly = true;
        return o;
    }
}
