using CoefGen.Core.Diagnostics;
using CoefGen.Core.Readout;

namespace CoefGen.Core.FixedPoint;

/// <summary>Applies a readout's [fixed_point] overrides to its target profile and checks the result (CG2001..CG2007).</summary>
public static class FixedPointSettingsResolver
{
    public static FixedPointResolution Resolve(ReadoutDescription description, TargetCatalog catalog)
    {
        ArgumentNullException.ThrowIfNull(description);
        ArgumentNullException.ThrowIfNull(catalog);
        var spec = description.FixedPoint;
        var adcBits = description.Adc.Bits;
        var count = description.Timing.Cycle.Windows.Sum(w => w.Samples.Count);
        var bag = new DiagnosticBag();
        SourceLocation At(string key) => description.LocationOf("fixed_point." + key);

        var targetName = spec.Target ?? TargetCatalog.DefaultTargetName;
        if (!catalog.TryGet(targetName, out var p))
        {
            var near = catalog.Suggest(targetName);
            var hint = near.Count > 0 ? $"did you mean {string.Join(" or ", near.Select(n => $"'{n}'"))}? " : "";
            bag.Error(FixedPointCodes.UnknownTarget, At("target"),
                $"unknown target '{targetName}'; {hint}available: {string.Join(", ", catalog.Names)}", "fixed_point.target");
            return new FixedPointResolution(null, bag.Items);
        }

        var coefBits = spec.CoefBits ?? p.CoefOperandBits;
        if (coefBits < 2)
        {
            bag.Error(FixedPointCodes.CoefficientTooNarrow, At("coef_bits"),
                $"{coefBits} signed bits cannot hold the weight of one sample (+1 and -1 need 2 bits); allowed: 2..{p.CoefOperandBits}", "fixed_point.coef_bits");
        }
        else if (coefBits > p.CoefOperandBits)
        {
            bag.Error(FixedPointCodes.BadWidth, At("coef_bits"),
                $"{coefBits} bits is wider than the coefficient operand of '{p.Name}'; allowed: 2..{p.CoefOperandBits}", "fixed_point.coef_bits");
        }

        if (adcBits > p.SampleOperandBits)
        {
            bag.Error(FixedPointCodes.AdcWiderThanSampleOperand, description.LocationOf("adc.bits"),
                $"{adcBits}-bit ADC codes do not fit the {p.SampleOperandBits}-bit sample operand of '{p.Name}'", "adc.bits");
        }

        var sampleBits = spec.SampleBits ?? adcBits;
        if (spec.SampleBits is int sb && (sb < adcBits || sb > p.SampleOperandBits))
        {
            var code = sb < adcBits ? FixedPointCodes.AdcWiderThanSampleOperand : FixedPointCodes.BadWidth;
            bag.Error(code, At("sample_bits"),
                $"sample width {sb} bits; allowed: {adcBits} (the ADC bits)..{p.SampleOperandBits} (the sample operand)", "fixed_point.sample_bits");
        }

        var accBits = spec.AccBits ?? p.AccBits;
        if (accBits < 2 || accBits > p.AccBits)
        {
            bag.Error(FixedPointCodes.BadWidth, At("acc_bits"),
                $"accumulator width {accBits} bits; allowed: 2..{p.AccBits} (the accumulator of '{p.Name}')", "fixed_point.acc_bits");
        }
        else if (accBits < coefBits + sampleBits)
        {
            bag.Error(FixedPointCodes.AccumulatorNarrowerThanProduct, At(spec.AccBits is null ? "coef_bits" : "acc_bits"),
                $"the {accBits}-bit accumulator is narrower than one {coefBits}x{sampleBits}-bit product ({coefBits + sampleBits} bits)", "fixed_point.acc_bits");
        }

        var outputBits = spec.OutputBits ?? p.OutputBits;
        if (outputBits < 2 || outputBits > TargetProfileLoader.MaxModelBits)
        {
            bag.Error(FixedPointCodes.BadWidth, At("output_bits"),
                $"output width {outputBits} bits; allowed: 2..{TargetProfileLoader.MaxModelBits}", "fixed_point.output_bits");
        }

        var frac = spec.OutputFracBits ?? p.OutputFracBits;
        if (frac is int f && (f < 0 || f >= outputBits))
        {
            bag.Error(FixedPointCodes.BadWidth, At("output_frac_bits"),
                $"{f} fractional bits; allowed: 0..{outputBits - 1} (below the output width)", "fixed_point.output_frac_bits");
        }

        // Repeated reads: with form = "two-stage" the target stores a per-read table and the read weights, not the full table.
        var reads = description.Timing.Cycle.RepeatCount;
        var perRead = (count + reads - 1) / reads;
        if (description.Weights.Form == WeightsForm.TwoStage && reads >= 2)
        {
            if (Math.Max(perRead, reads) > p.MaxCoefficients)
            {
                bag.Error(FixedPointCodes.TooManyCoefficients, description.LocationOf("weights.form"),
                    $"the two-stage tables hold {perRead} per-read coefficients and {reads} read weights, but '{p.Name}' stores at most {p.MaxCoefficients} coefficients per table; use fewer samples per read or fewer reads", "weights.form");
            }
        }
        else if (count > p.MaxCoefficients)
        {
            var twoStage = reads >= 2 && count % reads == 0 && Math.Max(perRead, reads) <= p.MaxCoefficients
                ? $"; or set [weights] form = \"two-stage\": its per-read table of {perRead} coefficients and {reads} read weights fit"
                : "";
            bag.Error(FixedPointCodes.TooManyCoefficients, description.LocationOf("timing.signal"),
                $"{count} weighted samples, but '{p.Name}' stores at most {p.MaxCoefficients} coefficients; use {count - p.MaxCoefficients} samples fewer{twoStage}", "timing");
        }

        var normalize = Mode(spec.Normalize, ModeNames.ParseNormalize, ModeNames.NormalizeNames, p.Normalize, "normalize", At, bag);
        var rounding = Mode(spec.Rounding, ModeNames.ParseRounding, ModeNames.RoundingNames, p.Rounding, "rounding", At, bag);
        var acc = Mode(spec.Accumulator, ModeNames.ParseAccumulator, ModeNames.AccumulatorNames, p.Accumulator, "accumulator", At, bag);
        if (bag.HasErrors)
        {
            return new FixedPointResolution(null, bag.Items);
        }

        var settings = new FixedPointSettings
        {
            TargetName = p.Name,
            CoefBits = coefBits,
            SampleBits = sampleBits,
            AccBits = accBits,
            Accumulator = acc,
            OutputBits = outputBits,
            OutputFracBits = frac,
            Rounding = rounding,
            Normalize = normalize,
            PostMultiplierBits = Math.Min(p.PostMultiplierBits, 48),
            PostProductBits = p.PostProductBits,
            MaxCoefficients = p.MaxCoefficients,
        };
        return new FixedPointResolution(settings, bag.Items);
    }

    private static T Mode<T>(string? text, Func<string, T?> parse, IReadOnlyList<string> names, T fallback, string key, Func<string, SourceLocation> at, DiagnosticBag bag)
        where T : struct
    {
        if (text is null)
        {
            return fallback;
        }

        if (parse(text) is T m)
        {
            return m;
        }

        bag.Error(FixedPointCodes.BadMode, at(key), $"unknown {key} '{text}'; allowed: {string.Join(", ", names)}", "fixed_point." + key);
        return fallback;
    }
}
