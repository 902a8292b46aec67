using System.Globalization;
using System.Text;
using CoefGen.Core.Diagnostics;
using Tomlyn.Parsing;
using Tomlyn.Syntax;

namespace CoefGen.Core.FixedPoint;

/// <summary>Reads one target profile (targets/*.toml; schema in targets/README.md) into a <see cref="TargetProfile"/>.</summary>
public static class TargetProfileLoader
{
    /// <summary>Widest signed width the bit-exact model supports for any register.</summary>
    public const int MaxModelBits = 64;

    private static readonly string[] KnownKeys =
    [
        "name", "description", "multiplier.coef_bits", "multiplier.sample_bits", "accumulator.bits", "accumulator.mode",
        "post_multiplier.bits", "post_multiplier.product_bits", "output.normalize", "output.rounding", "output.bits",
        "output.frac_bits", "limits.max_coefficients", "limits.coef_storage_bits",
    ];

    /// <summary>Parses the bytes of one profile file; never throws on bad content.</summary>
    public static TargetProfileLoadResult Load(byte[] content, string sourcePath)
    {
        ArgumentNullException.ThrowIfNull(content);
        ArgumentNullException.ThrowIfNull(sourcePath);
        var bag = new DiagnosticBag();
        string text;
        try
        {
            text = new UTF8Encoding(false, true).GetString(content);
        }
        catch (DecoderFallbackException)
        {
            bag.Error(FixedPointCodes.ProfileSyntax, SourceLocation.FileOnly(sourcePath), "the file is not valid UTF-8");
            return new TargetProfileLoadResult(null, bag.Items);
        }

        if (text.Length > 0 && text[0] == '\uFEFF')
        {
            text = text[1..];
        }

        var doc = SyntaxParser.Parse(text, sourcePath, true);
        foreach (var m in doc.Diagnostics)
        {
            bag.Error(FixedPointCodes.ProfileSyntax, At(sourcePath, m.Span), m.Message);
        }

        if (bag.HasErrors)
        {
            return new TargetProfileLoadResult(null, bag.Items);
        }

        var values = new Dictionary<string, KeyValueSyntax>(StringComparer.Ordinal);
        Collect(doc.KeyValues, "", values);
        foreach (var table in doc.Tables)
        {
            if (table.Name is null)
            {
                continue;
            }

            Collect(table.Items, KeyText(table.Name) + ".", values);
        }

        foreach (var (key, kv) in values.OrderBy(p => p.Key, StringComparer.Ordinal))
        {
            if (!KnownKeys.Contains(key))
            {
                bag.Error(FixedPointCodes.ProfileUnknownKey, At(sourcePath, kv.Span), $"unknown key; allowed: {string.Join(", ", KnownKeys)}", key);
            }
        }

        var r = new Reader(values, sourcePath, bag);
        var coef = r.Int("multiplier.coef_bits", 2, 32, null);
        var profile = new TargetProfile
        {
            Name = r.Text("name", null),
            Description = r.Text("description", ""),
            CoefOperandBits = coef,
            SampleOperandBits = r.Int("multiplier.sample_bits", 2, 32, null),
            AccBits = r.Int("accumulator.bits", 2, MaxModelBits, null),
            Accumulator = r.Mode("accumulator.mode", ModeNames.ParseAccumulator, ModeNames.AccumulatorNames, AccumulatorMode.Wrap),
            PostMultiplierBits = r.Int("post_multiplier.bits", 2, 48, coef),
            PostProductBits = r.Int("post_multiplier.product_bits", 2, 127, MaxModelBits),
            Normalize = r.Mode("output.normalize", ModeNames.ParseNormalize, ModeNames.NormalizeNames, NormalizeMode.Shift),
            Rounding = r.Mode("output.rounding", ModeNames.ParseRounding, ModeNames.RoundingNames, RoundingMode.HalfUp),
            OutputBits = r.Int("output.bits", 2, MaxModelBits, null),
            OutputFracBits = values.ContainsKey("output.frac_bits") ? r.Int("output.frac_bits", 0, 62, null) : null,
            MaxCoefficients = r.Int("limits.max_coefficients", 2, 1 << 24, null),
            CoefStorageBits = values.ContainsKey("limits.coef_storage_bits") ? r.Int("limits.coef_storage_bits", 2, 64, null) : null,
            SourcePath = sourcePath,
        };

        if (profile.CoefStorageBits is int storage && storage < profile.CoefOperandBits)
        {
            bag.Error(FixedPointCodes.ProfileBadValue, r.LocationOf("limits.coef_storage_bits"),
                $"storage word ({storage} bits) is narrower than the coefficient operand ({profile.CoefOperandBits} bits)", "limits.coef_storage_bits");
        }

        return bag.HasErrors ? new TargetProfileLoadResult(null, bag.Items) : new TargetProfileLoadResult(profile, bag.Items);
    }

    internal static SourceLocation At(string file, SourceSpan span) => new(file, span.Start.Line + 1, span.Start.Column + 1);

    private static void Collect(SyntaxList<KeyValueSyntax> items, string prefix, Dictionary<string, KeyValueSyntax> into)
    {
        foreach (var kv in items)
        {
            if (kv.Key is not null)
            {
                into[prefix + KeyText(kv.Key)] = kv;
            }
        }
    }

    private static string KeyText(KeySyntax key)
    {
        var sb = new StringBuilder(Part(key.Key));
        foreach (var dotted in key.DotKeys)
        {
            sb.Append('.').Append(Part(dotted.Key));
        }

        return sb.ToString();
    }

    private static string Part(BareKeyOrStringValueSyntax? node) => node switch
    {
        BareKeySyntax bare => bare.Key?.Text ?? "",
        StringValueSyntax str => str.Value ?? "",
        _ => "",
    };

    /// <summary>Typed access with located diagnostics; a missing required key reports once and yields a placeholder.</summary>
    private sealed class Reader(Dictionary<string, KeyValueSyntax> values, string file, DiagnosticBag bag)
    {
        public SourceLocation LocationOf(string key) =>
            values.TryGetValue(key, out var kv) ? At(file, kv.Span) : SourceLocation.FileOnly(file);

        public string Text(string key, string? fallback)
        {
            if (!values.TryGetValue(key, out var kv))
            {
                return fallback ?? Missing(key, "a string");
            }

            if (kv.Value is StringValueSyntax s && !string.IsNullOrWhiteSpace(s.Value))
            {
                return s.Value;
            }

            bag.Error(FixedPointCodes.ProfileBadValue, At(file, kv.Span), "expected a non-empty string", key);
            return "";
        }

        public int Int(string key, int min, int max, int? fallback)
        {
            if (!values.TryGetValue(key, out var kv))
            {
                if (fallback is int f)
                {
                    return f;
                }

                Missing(key, $"an integer {min}..{max}");
                return min;
            }

            if (kv.Value is IntegerValueSyntax i && i.Value >= min && i.Value <= max)
            {
                return (int)i.Value;
            }

            var got = kv.Value is IntegerValueSyntax j ? j.Value.ToString(CultureInfo.InvariantCulture) : "a non-integer";
            bag.Error(FixedPointCodes.ProfileBadValue, At(file, kv.Span), $"expected an integer {min}..{max}, got {got}", key);
            return min;
        }

        public T Mode<T>(string key, Func<string, T?> parse, IReadOnlyList<string> allowed, T fallback)
            where T : struct
        {
            if (!values.TryGetValue(key, out var kv))
            {
                return fallback;
            }

            if (kv.Value is StringValueSyntax s && s.Value is not null && parse(s.Value) is T mode)
            {
                return mode;
            }

            bag.Error(FixedPointCodes.ProfileBadValue, At(file, kv.Span), $"expected one of {string.Join(", ", allowed)}", key);
            return fallback;
        }

        private string Missing(string key, string what)
        {
            bag.Error(FixedPointCodes.ProfileBadValue, SourceLocation.FileOnly(file), $"missing required key (expected {what})", key);
            return "";
        }
    }
}
