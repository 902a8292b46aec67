using CoefGen.Core.FixedPoint;
using CoefGen.Core.FixedPoint.TwoStage;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Weights.TwoStage;

namespace CoefGen.Core.Vectors.TwoStage;

/// <summary>
/// Golden vectors of the two-stage datapath (form = "two-stage"): the same stimulus as <see cref="GoldenVectorGenerator"/>
/// (DC offset, rails, window extremes, alternation, the proof's worst cases of both stages, then the noise and charge
/// ladder drawn with the model's covariance), with expected outputs, final accumulators and read sums from
/// <see cref="TwoStageBitExactModel"/>. The one-stage mode-separating pixels are not drawn: their targets are the full
/// table's accumulator.
/// </summary>
public static class TwoStageVectorGenerator
{
    public static TwoStageVectorSource Source(DesignResult result, VectorOptions options)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(options);
        ArgumentOutOfRangeException.ThrowIfLessThan(options.Pixels, 1);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(options.Pixels, VectorOptions.MaxPixels);
        var two = result.TwoStage ?? throw new ArgumentException("the design has no two-stage form", nameof(result));
        var d = result.Description;
        var adc = d.Adc;
        var q = two.Quantised;
        var baseline = GoldenVectorGenerator.BaselineOf(adc);
        var fullCharge = adc.MaxCode - baseline;
        var h = TwoStageWeights.Expand([.. q.ReadWeights.Select(v => (double)v)], [.. q.Table.Select(v => (double)v)]);
        var shape = new CycleShape(d.Timing.PixelSamples, result.Grid.SampleIndex, [.. h.Select(v => (long)Math.Sign(v))], null, adc, baseline,
            GoldenVectorGenerator.CycleStep(d));
        var edges = GoldenVectorGenerator.StimulusEdges(shape).Concat(GoldenVectorGenerator.WorstCases(shape, q.Proof, result.Grid.Count)).ToList();
        var sampler = GoldenVectorGenerator.SamplerFor(result);
        return new TwoStageVectorSource
        {
            Name = d.Name,
            Design = q,
            Layout = two.Layout,
            Accumulator = result.FixedPointSettings.Accumulator,
            PixelSamples = d.Timing.PixelSamples,
            Seed = options.Seed,
            ReadoutFileName = Path.GetFileName(d.SourcePath),
            ReadoutSha256 = d.ContentSha256,
            BaselineAdu = baseline,
            FullScaleChargeAdu = fullCharge,
            AduPerElectron = d.Sensor.VoltsAtAdcPerElectron / adc.LsbV,
            SamplerNote = sampler.Note,
            Pixels = Pixels(result, shape, sampler, edges, fullCharge, options),
        };
    }

    private static IEnumerable<GoldenPixel> Pixels(DesignResult result, CycleShape shape, IAnalogNoiseSampler sampler, List<(string Kind, double Charge, long[] Codes)> edges,
        double fullCharge, VectorOptions options)
    {
        var q = result.TwoStage!.Quantised;
        var mode = result.FixedPointSettings.Accumulator;
        var index = result.Grid.SampleIndex;
        GoldenPixel Pixel(string kind, double charge, long[] codes)
        {
            var run = TwoStageBitExactModel.Run(q, [.. index.Select(k => codes[k])], mode);
            return new GoldenPixel(kind, charge, codes, new BitExactResult((long)run.Acc2, run.Output, run.Clipped, run.Saturated)) { ReadSums = run.Stage1 };
        }

        foreach (var (kind, charge, codes) in edges.Take(options.Pixels))
        {
            yield return Pixel(kind, charge, codes);
        }

        var rng = new Xoshiro256StarStar(options.Seed);
        var noise = new double[sampler.Count];
        for (var j = 0; j < options.Pixels - edges.Count; j++)
        {
            var (kind, charge) = GoldenVectorGenerator.Ladder(j, fullCharge);
            sampler.Sample(rng, noise);
            yield return Pixel(kind, charge, shape.Noisy(charge, noise, rng));
        }
    }
}
