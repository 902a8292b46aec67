using System.Numerics;
using CoefGen.Core.FixedPoint;
using Scriban.Runtime;

namespace CoefGen.Core.Emit;

/// <summary>Builds read-only Scriban values (strings, integers, booleans, arrays of those) for the template model.</summary>
internal static class ModelBuilder
{
    public static ScriptArray Array<T>(IEnumerable<T> items)
        where T : notnull
    {
        var a = new ScriptArray();
        foreach (var item in items)
        {
            a.Add(item);
        }

        a.IsReadOnly = true;
        return a;
    }

    public static void Set(ScriptObject target, string key, object value) => target.SetValue(key, value, readOnly: true);

    /// <summary>The name and provenance fields every model carries.</summary>
    public static void Names(ScriptObject g, string name, string prefix, Provenance provenance)
    {
        Set(g, "name", ModelText.CommentSafe(name));
        Set(g, "prefix", prefix);
        Set(g, "prefix_upper", prefix.ToUpperInvariant());
        Set(g, "tool_name", ModelText.CommentSafe(provenance.ToolName));
        Set(g, "tool_version", ModelText.CommentSafe(provenance.ToolVersion));
        Set(g, "readout_file", ModelText.CommentSafe(provenance.ReadoutFileName));
        Set(g, "readout_sha256", ModelText.CommentSafe(provenance.ReadoutSha256));
        Set(g, "scheme", ModelText.CommentSafe(provenance.SchemeLabel));
        // Comments show people 4 significant figures: a last-digit difference between machines must not change a file.
        Set(g, "noise_e", Formatting.Human.NumShort(provenance.PredictedReadNoiseElectrons));
        Set(g, "noise_adu", Formatting.Human.NumShort(provenance.PredictedReadNoiseAdu));
    }

    public static ScriptObject Proof(WidthProof proof)
    {
        var checks = new List<ScriptObject>();
        foreach (var c in proof.Checks)
        {
            var o = new ScriptObject();
            Set(o, "name", c.Name);
            Set(o, "min", LiteralFormat.DecimalText(c.MinValue));
            Set(o, "max", LiteralFormat.DecimalText(c.MaxValue));
            Set(o, "required_bits", c.RequiredBits);
            Set(o, "available_bits", c.AvailableBits);
            Set(o, "margin_bits", c.MarginBits);
            Set(o, "required", c.Required);
            Set(o, "fits", c.Fits);
            Set(o, "worst_case_codes", Array(c.WorstCaseCodes ?? []));
            o.IsReadOnly = true;
            checks.Add(o);
        }

        var p = new ScriptObject();
        Set(p, "safe", proof.Safe);
        Set(p, "checks", Array(checks));
        Set(p, "advice", Array(proof.Advice.Select(ModelText.CommentSafe)));
        p.IsReadOnly = true;
        return p;
    }

    /// <summary>Per-language coefficient literals, each array as long as the coefficient array.</summary>
    public static void Coefficients(ScriptObject g, IntegerDesign d, bool wideC)
    {
        var w = d.CoefBits;
        Set(g, "coefs", Array(d.Coefficients));
        Set(g, "coefs_c", Array(d.Coefficients.Select(c => LiteralFormat.C(c, wideC))));
        Set(g, "coefs_vhdl", Array(d.Coefficients.Select(c => w <= 32 ? LiteralFormat.VhdlInteger(c) : LiteralFormat.VhdlBits(c, w))));
        Set(g, "coefs_vhdl_bits", Array(d.Coefficients.Select(c => LiteralFormat.VhdlBits(c, w))));
        Set(g, "coefs_sv", Array(d.Coefficients.Select(c => LiteralFormat.VerilogSigned(c, w))));
        Set(g, "coefs_hex", Array(d.Coefficients.Select(c => LiteralFormat.MaskedHex(c, w))));
    }

    /// <summary>The rounding, accumulator and normalize words and flags every template model carries.</summary>
    public static void Modes(ScriptObject g, RoundingMode rounding, AccumulatorMode accumulator, NormalizeMode normalize)
    {
        Set(g, "rounding", ModelText.Word(rounding));
        Set(g, "round_half_up", rounding == RoundingMode.HalfUp);
        Set(g, "round_half_even", rounding == RoundingMode.HalfEven);
        Set(g, "round_truncate", rounding == RoundingMode.Truncate);
        Set(g, "accumulator", ModelText.Word(accumulator));
        Set(g, "saturate", accumulator == AccumulatorMode.Saturate);
        Set(g, "normalize", ModelText.Word(normalize));
    }

    /// <summary>The ADC coding word and flag and the offset subtracted from offset-binary codes.</summary>
    public static void Coding(ScriptObject g, Readout.AdcCoding coding, int adcBits)
    {
        Set(g, "coding", ModelText.Word(coding));
        var offsetBinary = coding == Readout.AdcCoding.OffsetBinary;
        Set(g, "offset_binary", offsetBinary);
        var adcOffset = offsetBinary ? 1L << (adcBits - 1) : 0L;
        Set(g, "adc_offset", adcOffset);
        Set(g, "adc_offset_c", LiteralFormat.C(adcOffset, wide: false));
    }

    /// <summary>Smallest and largest value of a signed word of <paramref name="bits"/> bits.</summary>
    public static (BigInteger Min, BigInteger Max) SignedRange(int bits) =>
        (-(BigInteger.One << (bits - 1)), (BigInteger.One << (bits - 1)) - 1);
}
