using System.Text;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace CoefGen.Core.Tests.Pipeline;

/// <summary>
/// End-to-end laws over random valid readout descriptions: written as a readout file, loaded back, run through
/// the whole pipeline. The description is drawn from an FsCheck-chosen seed so every case is reproducible.
/// </summary>
public class PipelinePropertyTests
{
    [Property(MaxTest = 60)]
    public Property Random_valid_readouts_design_consistently_end_to_end() =>
        Prop.ForAll(Gen.Choose(0, int.MaxValue).ToArbitrary(), seed =>
        {
            var description = RandomDescription(new Random(seed));
            var text = ReadoutWriter.ToToml(description);
            var load = ReadoutLoader.Load(Encoding.UTF8.GetBytes(text), "random.toml", _ => null);
            Assert.True(load.Description is not null, $"seed {seed}: {string.Join("; ", load.Diagnostics)}\n{text}");
            var r = DesignPipeline.Run(load.Description!, ShippedExamples.Catalog);

            // Every scheme obeys the same constraints (1e-10 of the summed terms, ConstraintResiduals' scale).
            foreach (var w in r.Weights)
            {
                var res = ConstraintResiduals.Of(r.Grid, w.H);
                Assert.True(res.Offset < 1e-10 && res.Gain < 1e-10 && (!description.Weights.RejectDrift || res.Drift < 1e-10), $"seed {seed}: {w.Label} {res}");
            }

            // The optimum is never worse than boxcar or weighted (roundoff allowance 1e-9 relative).
            var optimal = r.Predictions[2].VarianceV2;
            Assert.True(optimal <= r.Predictions[0].VarianceV2 * (1 + 1e-9) && optimal <= r.Predictions[1].VarianceV2 * (1 + 1e-9), $"seed {seed}");

            // Time and frequency domain agree wherever the cross-check ran.
            Assert.All(r.Predictions, p => Assert.True(p.FrequencyDomainRelativeDifference is null or < 1e-6, $"seed {seed}: {p.FrequencyDomainRelativeDifference}"));

            // Integer design: exact sums, and the proof's named worst case reaches its stated extreme in the bit-exact model.
            var d = r.Datapath;
            Assert.Equal(0L, d.Coefficients.Sum());
            if (d.Normalize == NormalizeMode.Shift)
            {
                Assert.Equal(1L << d.P, d.Coefficients.Skip(r.Grid.Windows[0].Count).Sum());
            }

            if (description.Weights.RejectDrift)
            {
                Assert.Equal(0, DriftRepair.Residual(d.Coefficients, d.SampleIndex));
            }

            var final = d.Proof.Checks.Single(c => c.Name == "accumulator_final");
            if (final.Fits && final.WorstCaseCodes is { } codes)
            {
                var acc = BitExactModel.Run(d, codes).Accumulator;
                Assert.True(acc == final.MaxValue || acc == final.MinValue, $"seed {seed}: worst case gives {acc}, proof says [{final.MinValue}, {final.MaxValue}]");
            }

            return true;
        });

    private static ReadoutDescription RandomDescription(Random g)
    {
        double[] rates = [1e6, 5e6, 20e6, 80e6];
        var rate = rates[g.Next(rates.Length)];
        int[] bitChoices = [12, 14, 16, 18];
        var bits = bitChoices[g.Next(bitChoices.Length)];
        var adc = new AdcSpec(rate, bits, 1 + (3 * g.NextDouble()), g.Next(2) == 0 ? AdcCoding.TwosComplement : AdcCoding.OffsetBinary, g.NextDouble());

        var lead = g.Next(0, 10);
        var nR = g.Next(2, 60);
        var gap = g.Next(2, 40);
        var nS = g.Next(2, 60);
        var tail = g.Next(0, 10);
        var reset = new SampleWindow(lead, nR);
        var signal = new SampleWindow(reset.End + gap, nS);
        var transfer = (reset.End + (gap * g.NextDouble() * 0.5)) / rate;
        var usePole = g.Next(2) == 0;
        double? pole = usePole ? rate * (0.02 + (0.4 * g.NextDouble())) : null;
        double? bandwidth = usePole && g.Next(3) != 0 ? null : rate * (0.2 + (0.3 * g.NextDouble()));
        var step = usePole && g.Next(2) == 0 ? StepModel.Pole : StepModel.Ideal;

        var sources = Enumerable.Range(0, g.Next(1, 3)).Select(i => new NoiseSourceSpec(
            $"src{i}",
            g.Next(2) == 0 ? NoiseReference.Sensor : NoiseReference.Adc,
            1 + (20 * g.NextDouble()),
            g.Next(3) == 0 ? 0 : 1e3 * Math.Pow(200, g.NextDouble()),
            0.01 + g.NextDouble())).ToArray();

        WindowShape[] shapes = [WindowShape.Triangle, WindowShape.Hann, WindowShape.Trapezoid];
        var scheme = (WeightScheme)g.Next(3);
        var weights = new WeightsSpec(scheme, shapes[g.Next(shapes.Length)], 0, null, null, g.Next(4) == 0);

        var targets = ShippedExamples.Catalog.Names
            .Where(n => ShippedExamples.Catalog.TryGet(n, out var p) && p.SampleOperandBits >= bits && p.MaxCoefficients >= nR + nS)
            .ToArray();
        var target = targets[g.Next(targets.Length)];
        ShippedExamples.Catalog.TryGet(target, out var profile);
        int? coefBits = g.Next(2) == 0 ? null : g.Next(10, Math.Min(profile.CoefOperandBits, 24) + 1);
        string[] roundings = ["half-up", "half-even", "truncate"];
        var fixedPoint = new FixedPointSpec(target, coefBits, null, null, null, null, null, roundings[g.Next(3)], g.Next(2) == 0 ? "wrap" : "saturate");

        return new ReadoutDescription
        {
            Name = "rnd",
            SourcePath = "random.toml",
            ContentSha256 = "",
            Adc = adc,
            Sensor = new SensorSpec(1 + (9 * g.NextDouble()), 0.5 + (3.5 * g.NextDouble())),
            Timing = new TimingSpec(signal.End + tail, transfer, reset, signal, step, []),
            Noise = new NoiseSpec(sources, pole, bandwidth, null, null),
            Weights = weights,
            FixedPoint = fixedPoint,
            Emit = [],
        };
    }
}
