using CoefGen.Core.FixedPoint;
using CoefGen.Core.Noise;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Vectors;

/// <summary>
/// Builds golden stimulus for an integer design and its expected results from <see cref="BitExactModel"/>.
/// Each pixel cycle is x_k = baseline + q s_k + n_k at the ADC input, quantised as an ideal mid-tread ADC
/// (nearest code, ties up), clipped to the rails and written in the readout's coding. n_k is drawn at the
/// weighted samples with the model's analog covariance (<see cref="CorrelatedNoiseSampler"/>) plus the ADC's
/// own white noise, both before quantisation, so quantisation itself supplies the LSB^2/12 term. Samples
/// outside the windows carry the noise-free level. The edge cases come first (with the pixels of
/// <see cref="BranchPixels"/> that separate the arithmetic modes), then a repeating ladder of ten
/// pixels: eight of zero charge (noise), one mid-scale and one full-scale charge.
/// </summary>
public static class GoldenVectorGenerator
{
    /// <summary>Fraction of the ADC span between the bottom rail and the baseline (DC offset), plus a fractional part.</summary>
    public const double BaselineSpanFraction = 0.125;

    public const double BaselineFractionAdu = 0.3125;

    /// <summary>Generates for the chosen scheme's datapath of <paramref name="result"/>.</summary>
    public static GoldenVectorSet Generate(DesignResult result, VectorOptions options)
    {
        ArgumentNullException.ThrowIfNull(result);
        return Generate(result, result.Datapath, options);
    }

    /// <summary>Generates for any integer design of the same readout (e.g. the boxcar one, for comparisons), in memory.</summary>
    public static GoldenVectorSet Generate(DesignResult result, IntegerDesign design, VectorOptions options)
    {
        var source = Source(result, design, options);
        return new GoldenVectorSet(source, [.. source.Pixels]);
    }

    /// <summary>
    /// The same vectors as a stream: the pixels are drawn one at a time as they are enumerated (enumerate once),
    /// so memory does not grow with the pixel count.
    /// </summary>
    public static GoldenVectorSource Source(DesignResult result, IntegerDesign design, VectorOptions options)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(design);
        ArgumentNullException.ThrowIfNull(options);
        ArgumentOutOfRangeException.ThrowIfLessThan(options.Pixels, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(options.Pixels, VectorOptions.MaxPixels);
        var d = result.Description;
        if (!design.SampleIndex.SequenceEqual(result.Covariance.SampleIndex) || design.PixelSamples != d.Timing.PixelSamples)
        {
            throw new ArgumentException("the design's samples are not the readout's weighted samples", nameof(design));
        }

        var adc = d.Adc;
        var baseline = BaselineOf(adc);
        var fullCharge = adc.MaxCode - baseline;
        var step = CycleStep(d);
        var sampler = SamplerFor(result);
        var shape = CycleShape.Of(design, adc, baseline, step);
        var baselineSample = BitExactModel.ToSample(shape.Clean(0.0)[design.SampleIndex[0]], adc.Bits, adc.Coding);
        var (targeted, unreached) = BranchPixels.Build(design, baselineSample);
        var edges = EdgeCases(shape, design).Concat(targeted.Select(t => (t.Kind, 0.0, shape.WithWeighted(t.Weighted)))).ToList();
        var info = new VectorInfo
        {
            Design = design,
            Seed = options.Seed,
            ReadoutFileName = Path.GetFileName(d.SourcePath),
            ReadoutSha256 = d.ContentSha256,
            BaselineAdu = baseline,
            FullScaleChargeAdu = fullCharge,
            AduPerElectron = d.Sensor.VoltsAtAdcPerElectron / adc.LsbV,
            AddedConstantV2 = sampler.AddedConstantV2,
            DiagonalLoadingV2 = sampler.DiagonalLoadingV2,
            UnreachedBranches = unreached,
            SamplerNote = sampler.Note,
        };
        return new GoldenVectorSource(info, Pixels(design, shape, sampler, result.Covariance.Shot, edges, fullCharge, options));
    }

    private static IEnumerable<GoldenPixel> Pixels(
        IntegerDesign design, CycleShape shape, IAnalogNoiseSampler sampler, ShotNoiseCovariance? shot, List<(string Kind, double Charge, long[] Codes)> edges, double fullCharge, VectorOptions options)
    {
        GoldenPixel Pixel(string kind, double charge, long[] codes) => new(kind, charge, codes, BitExactModel.RunCycle(design, codes));
        foreach (var (kind, charge, codes) in edges.Take(options.Pixels))
        {
            yield return Pixel(kind, charge, codes);
        }

        var rng = new Xoshiro256StarStar(options.Seed);
        var noise = new double[sampler.Count];
        for (var j = 0; j < options.Pixels - edges.Count; j++)
        {
            var (kind, charge) = Ladder(j, fullCharge);
            sampler.Sample(rng, noise);
            shot?.AddDraw(rng.NextGaussian, noise);
            yield return Pixel(kind, charge, shape.Noisy(charge, noise, rng));
        }
    }

    /// <summary>The DC level of every pixel (ADU): an eighth of the span above the bottom rail plus a fraction.</summary>
    internal static double BaselineOf(AdcSpec adc) => adc.MinCode + (BaselineSpanFraction * Math.Pow(2, adc.Bits)) + BaselineFractionAdu;

    /// <summary>
    /// A capture's covariance, or the model's by dense Cholesky up to its limit (exact, unchanged results); above it
    /// circulant embedding of the stationary model covariance.
    /// </summary>
    internal static IAnalogNoiseSampler SamplerFor(DesignResult result) => result.CaptureCovariance is { } measured
        ? CorrelatedNoiseSampler.FromCaptureCovariance(measured.Matrix, measured.Count, result.Noise.DigitalVarianceV2)
        : result.Covariance.Count <= CorrelatedNoiseSampler.MaxSamples
            ? CorrelatedNoiseSampler.Create(result.Covariance, result.Noise)
            : CirculantNoiseSampler.Create(result.Covariance, result.Noise, result.Description.Adc.RateHz);

    /// <summary>The pixel kind and charge of the j-th ladder pixel after the edge cases: eight noise pixels, one mid-scale, one full-scale.</summary>
    internal static (string Kind, double Charge) Ladder(int j, double fullCharge) => (j % 10) switch
    {
        4 => (PixelKind.ChargeMid, fullCharge / 2),
        9 => (PixelKind.ChargeFull, fullCharge),
        _ => (PixelKind.Noise, 0.0),
    };

    /// <summary>The step response s_k at every sample of the cycle, by the same formula as the weights' grid.</summary>
    internal static IReadOnlyList<double> CycleStep(ReadoutDescription d)
    {
        var t = d.Timing;
        // A general cycle's waveform is its windows' steps (0 elsewhere); a classic file's is the one transfer's step
        // at every sample of the cycle, unweighted samples included (its golden vectors are kept byte-identical).
        if (!t.Cycle.IsClassic)
        {
            return SampleGrid.StepAtEverySample(d.Adc.RateHz, t.Cycle, t.Step == StepModel.Pole ? d.Noise.FrontEndPoleHz : null, t.PixelSamples);
        }

        if (t.PixelSamples < 2)
        {
            return [0.0];
        }

        double? pole = t.Step == StepModel.Pole ? d.Noise.FrontEndPoleHz : null;
        return SampleGrid.Create(d.Adc.RateHz, new SampleWindow(0, 1), new SampleWindow(1, t.PixelSamples - 1), t.TransferTimeS, pole).Step;
    }

    /// <summary>The edge cases that do not depend on the arithmetic: DC offset, rails, window extremes, alternation, rails outside the windows.</summary>
    internal static IEnumerable<(string Kind, double Charge, long[] Codes)> StimulusEdges(CycleShape s)
    {
        yield return (PixelKind.DcOffset, 0.0, s.Clean(0.0));
        yield return (PixelKind.RailsLow, 0.0, s.Fill(_ => s.Low));
        yield return (PixelKind.RailsHigh, 0.0, s.Fill(_ => s.High));
        yield return (PixelKind.ResetLowSignalHigh, 0.0, s.Windows(s.Low, s.High));
        yield return (PixelKind.ResetHighSignalLow, 0.0, s.Windows(s.High, s.Low));
        yield return (PixelKind.Alternating, 0.0, s.Fill(i => i % 2 == 0 ? s.Low : s.High));
        yield return (PixelKind.AlternatingInverted, 0.0, s.Fill(i => i % 2 == 0 ? s.High : s.Low));
        yield return (PixelKind.OutsideWindowsRails, 0.0, s.OutsideRails());
    }

    private static IEnumerable<(string Kind, double Charge, long[] Codes)> EdgeCases(CycleShape s, IntegerDesign design)
    {
        return StimulusEdges(s).Concat(WorstCases(s, design.Proof, design.Coefficients.Count));
    }

    /// <summary>One pixel per distinct worst case of the proof (the codes of its weighted samples, the baseline elsewhere).</summary>
    internal static IEnumerable<(string Kind, double Charge, long[] Codes)> WorstCases(CycleShape s, WidthProof proof, int weighted)
    {
        var seen = new List<long[]>();
        foreach (var check in proof.Checks)
        {
            if (check.WorstCaseCodes is { } w && w.Count == weighted)
            {
                var codes = s.WithWeighted(w);
                if (!seen.Any(c => c.SequenceEqual(codes)))
                {
                    seen.Add(codes);
                    yield return (PixelKind.WorstPrefix + check.Name, 0.0, codes);
                }
            }
        }
    }

    /// <summary>The description on its own, before the pixels are attached.</summary>
    private sealed record VectorInfo : GoldenVectorInfo;
}
