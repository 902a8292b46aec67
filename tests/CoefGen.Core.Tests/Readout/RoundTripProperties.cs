using System.Text;
using CoefGen.Core.Readout;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace CoefGen.Core.Tests.Readout;

public class RoundTripProperties
{
    /// <summary>Positive doubles with full mantissas (i / 7 etc.), spanning several decades.</summary>
    private static Gen<double> Positive(double scale) =>
        from i in Gen.Choose(1, 1_000_000)
        from d in Gen.Elements(1.0, 3.0, 7.0, 1024.0)
        select i / d * scale;

    private static Gen<T?> Maybe<T>(Gen<T> gen) where T : struct =>
        Gen.OneOf(Gen.Constant<T?>(null), gen.Select(v => (T?)v));

    private static Gen<string?> MaybeText(Gen<string> gen) =>
        Gen.OneOf(Gen.Constant<string?>(null), gen.Select(v => (string?)v));

    private static Gen<IReadOnlyList<double>> Shape(int count) =>
        from values in Gen.Choose(0, 100).Select(i => i / 8.0).ArrayOf(count)
        from positiveAt in Gen.Choose(0, count - 1)
        select (IReadOnlyList<double>)values.Select((v, i) => i == positiveAt ? v + 0.5 : v).ToArray();

    private static readonly Gen<TimingSpec> TimingGen =
        from resetStart in Gen.Choose(0, 50)
        from resetCount in Gen.Choose(1, 40)
        from gap in Gen.Choose(0, 20)
        from signalCount in Gen.Choose(1, 40)
        from tail in Gen.Choose(0, 30)
        from numerator in Gen.Choose(0, 64)
        select new TimingSpec(
            resetStart + resetCount + gap + signalCount + tail,
            resetStart + resetCount + gap * numerator / 64.0, // transfer sample, divided by the rate below
            new SampleWindow(resetStart, resetCount),
            new SampleWindow(resetStart + resetCount + gap, signalCount),
            StepModel.Ideal,
            []);

    private static readonly Gen<NoiseSourceSpec> SourceGen =
        from at in Gen.Elements(NoiseReference.Sensor, NoiseReference.Adc)
        from white in Gen.OneOf(Gen.Constant(0.0), Positive(1e-4))
        from corner in Gen.OneOf(Gen.Constant(0.0), Positive(0.1))
        from cutoff in Positive(1e-6)
        select new NoiseSourceSpec("", at, white, corner, cutoff);

    private static readonly Gen<PsdTable> TableGen =
        from steps in Positive(1e-2).ArrayOf(2)
        from more in Gen.Choose(0, 3)
        from extra in Positive(1.0).ArrayOf(more)
        from densities in Gen.OneOf(Gen.Constant(0.0), Positive(1e-22)).ArrayOf(3 + more)
        select new PsdTable("spectrum.csv", Cumulative(steps.Concat(extra)), densities);

    private static readonly Gen<FixedPointSpec> FixedPointGen =
        from target in MaybeText(Gen.Elements("dsp18x27-acc48", "generic \"quoted\""))
        from coef in Maybe(Gen.Choose(2, 63))
        from sample in Maybe(Gen.Choose(2, 63))
        from acc in Maybe(Gen.Choose(2, 63))
        from output in Maybe(Gen.Choose(2, 63))
        from frac in Maybe(Gen.Choose(0, 32))
        from normalize in MaybeText(Gen.Elements("shift", "exact"))
        from rounding in MaybeText(Gen.Elements("half-up", "half-even", "truncate"))
        from accumulator in MaybeText(Gen.Elements("wrap", "saturate"))
        select new FixedPointSpec(target, coef, sample, acc, output, frac, normalize, rounding, accumulator);

    private static readonly Gen<ReadoutDescription> DescriptionGen =
        from name in Gen.Choose(0, 999).Select(i => "ch" + i)
        from adc in from rate in Positive(100)
                    from bits in Gen.Choose(2, 32)
                    from fs in Positive(1e-5)
                    from coding in Gen.Elements(AdcCoding.TwosComplement, AdcCoding.OffsetBinary)
                    from noise in Gen.OneOf(Gen.Constant(0.0), Positive(1e-5))
                    select new AdcSpec(rate, bits, fs, coding, noise)
        from sensor in from cg in Positive(1e-5)
                       from gain in Positive(1e-5)
                       select new SensorSpec(cg, gain)
        from timing in TimingGen
        from pole in Maybe(Positive(10))
        from bandwidth in Maybe(Positive(10))
        from usePole in Gen.Elements(true, false)
        from sourceCount in Gen.Choose(0, 3)
        from sources in SourceGen.ArrayOf(sourceCount)
        from table in Gen.OneOf(Gen.Constant<PsdTable?>(null), TableGen.Select(t => (PsdTable?)t))
        from capture in MaybeText(Gen.Elements("idle.csv", "captures/dark frame.csv"))
        from scheme in Gen.Elements(WeightScheme.Boxcar, WeightScheme.Weighted, WeightScheme.Optimal)
        from window in Gen.Elements(WindowShape.Triangle, WindowShape.Hann, WindowShape.Trapezoid, WindowShape.Explicit)
        from ramp in Gen.OneOf(Gen.Constant(0), Gen.Choose(1, 10))
        from resetShape in Shape(timing.Cycle.AsTwoWindow()!.Reset.Count)
        from signalShape in Shape(timing.Cycle.AsTwoWindow()!.Signal.Count)
        from drift in Gen.Elements(true, false)
        from fixedPoint in FixedPointGen
        from emitCount in Gen.Choose(0, 2)
        from emit in Gen.Elements(new EmitSpec("c-header", "a.h"), new EmitSpec("t/x.scriban", "out dir/x.txt")).ArrayOf(emitCount)
        let limitedPole = pole ?? (bandwidth is null ? 2e6 : null)
        select new ReadoutDescription
        {
            Name = name,
            SourcePath = "gen.toml",
            ContentSha256 = "",
            Adc = adc,
            Sensor = sensor,
            Timing = timing with
            {
                TransferTimeS = timing.TransferTimeS / adc.RateHz,
                Step = usePole && limitedPole is not null ? StepModel.Pole : StepModel.Ideal,
            },
            Noise = new NoiseSpec(
                sources.Select((s, i) => s with { Name = "source_" + i }).ToList(),
                limitedPole,
                bandwidth,
                sources.Length == 0 ? table ?? new PsdTable("spectrum.csv", [0.0, 1e3], [1e-18, 0.0]) : table,
                capture),
            Weights = new WeightsSpec(scheme, window, ramp,
                window == WindowShape.Explicit ? resetShape : null,
                window == WindowShape.Explicit ? signalShape : null,
                drift),
            FixedPoint = fixedPoint,
            Emit = emit,
        };

    private static double[] Cumulative(IEnumerable<double> steps)
    {
        var sum = 0.0;
        return [0.0, .. steps.Select(s => sum += s)];
    }

    private static LoadResult Reload(ReadoutDescription description)
    {
        var toml = ReadoutWriter.ToToml(description);
        var csv = description.Noise.Table is null ? null : Encoding.UTF8.GetBytes(ReadoutWriter.ToPsdCsv(description.Noise.Table));
        return ReadoutLoader.Load(Encoding.UTF8.GetBytes(toml), "round.toml", path => path == "spectrum.csv" ? csv : null);
    }

    [Property(MaxTest = 300)]
    public Property Written_readout_file_loads_back_to_an_equal_description() =>
        Prop.ForAll(Arb.From(DescriptionGen), description =>
        {
            var result = Reload(description);
            Assert.True(result.Description is not null, string.Join(" | ", result.Diagnostics) + "\n" + ReadoutWriter.ToToml(description));
            Assert.DoesNotContain(result.Diagnostics, d => d.Severity == Diagnostics.Severity.Error);
            DescriptionAssert.Equivalent(description, result.Description);
        });

    [Property(MaxTest = 100)]
    public Property Writing_is_deterministic_and_stable_after_one_round_trip_without_a_table() =>
        Prop.ForAll(Arb.From(DescriptionGen), generated =>
        {
            var description = generated with { Noise = generated.Noise with { Table = null } };
            if (description.Noise.Sources.Count == 0)
            {
                return;
            }

            var first = ReadoutWriter.ToToml(description);
            var reloaded = Reload(description).Description!;
            Assert.Equal(first, ReadoutWriter.ToToml(reloaded));
        });
}
