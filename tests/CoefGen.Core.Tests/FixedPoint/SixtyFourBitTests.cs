using System.Numerics;
using System.Text;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;
using CoefGen.Core.Tests.Pipeline;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace CoefGen.Core.Tests.FixedPoint;

/// <summary>
/// The 64-bit accumulator and output of the 32-bit microcontroller target (32 x 32 products, int64_t sums):
/// the bit-exact model and the width proof against BigInteger references (FixedPointFixtures.Reference, written
/// from the IntegerDesign doc comment, and a direct enumeration of the vertex sums).
/// </summary>
public class SixtyFourBitTests
{
    private const int Bits = 32;

    private sealed record Case(long[] Coefficients, long[][] Samples, AccumulatorMode Mode, RoundingMode Rounding, long M, int Shift)
    {
        public override string ToString() => $"c [{string.Join(", ", Coefficients)}], {Mode}, {Rounding}, M {M}, shift {Shift}";
    }

    private static readonly Gen<long> Coefficient =
        Gen.Frequency((2, Gen.Elements(int.MinValue + 1L, int.MaxValue)), (3, Gen.Choose(int.MinValue + 1, int.MaxValue).Select(v => (long)v)));

    private static readonly Gen<long> Sample =
        Gen.Frequency((2, Gen.Elements((long)int.MinValue, int.MaxValue)), (3, Gen.Choose(int.MinValue, int.MaxValue).Select(v => (long)v)));

    private static readonly Gen<Case> Cases =
        from n in Gen.Choose(2, 12)
        from c in Gen.ArrayOf(Coefficient, n)
        from x in Gen.ArrayOf(Gen.ArrayOf(Sample, n), 6)
        from mode in Gen.Elements(AccumulatorMode.Wrap, AccumulatorMode.Saturate)
        from rounding in Gen.Elements(RoundingMode.HalfUp, RoundingMode.HalfEven, RoundingMode.Truncate)
        from m in Gen.Elements(1L, 3L, 1L << 20, int.MaxValue)
        from shift in Gen.Elements(0, 1, 17, 40, 62)
        select new Case(c, x, mode, rounding, m, shift);

    [Property(MaxTest = 80)]
    public Property Bit_exact_model_at_64_bits_equals_the_big_integer_reference() =>
        Prop.ForAll(Cases.ToArbitrary(), k =>
        {
            var d = Design(k);
            foreach (var x in k.Samples)
            {
                var got = BitExactModel.Run(d, x);
                var (acc, output, _) = FixedPointFixtures.Reference(d, x);
                Assert.True(got.Accumulator == acc && got.Output == output, $"{k}: model {got.Accumulator} / {got.Output}, reference {acc} / {output}");
            }
        });

    [Property(MaxTest = 80)]
    public Property Width_proof_at_64_bits_equals_the_vertex_enumeration() =>
        Prop.ForAll(Cases.ToArbitrary(), k =>
        {
            var c = k.Coefficients;
            var settings = FixedPointFixtures.Settings(Bits, 64, k.Mode, k.Rounding, NormalizeMode.Shift, Bits, null, 64);
            var proof = WidthProver.Prove(c, Bits, AdcCoding.TwosComplement, settings, 1, 0, 0);
            BigInteger xMin = int.MinValue, xMax = int.MaxValue;
            var hi = c.Aggregate(BigInteger.Zero, (s, v) => s + BigInteger.Max(v * xMax, v * xMin));
            var lo = c.Aggregate(BigInteger.Zero, (s, v) => s + BigInteger.Min(v * xMax, v * xMin));
            var final = proof.Checks.Single(ch => ch.Name == "accumulator_final");
            Assert.Equal(hi, final.MaxValue);
            Assert.Equal(lo, final.MinValue);

            // Required width from the definition: the smallest b with -2^(b-1) <= lo and hi <= 2^(b-1) - 1.
            var b = 1;
            while (lo < -(BigInteger.One << (b - 1)) || hi > (BigInteger.One << (b - 1)) - 1)
            {
                b++;
            }

            Assert.Equal(b, final.RequiredBits);
            Assert.Equal(b <= 64, final.Fits);

            // The named worst case reaches the extreme exactly (the true sum, before any wrap).
            var (_, _, sum) = FixedPointFixtures.Reference(Design(k), final.WorstCaseCodes!);
            Assert.True(sum == hi || sum == lo, $"{k}: worst case sums to {sum}, proof [{lo}, {hi}]");
        });

    [Fact]
    public void A_readout_with_64_bit_accumulator_and_output_designs_safely_and_its_worst_case_runs_exactly()
    {
        var toml = Readout.ReadoutFixture.Minimal + "\n[fixed_point]\ntarget = \"mcu32-acc64\"\ncoef_bits = 32\nacc_bits = 64\noutput_bits = 64\n";
        var load = ReadoutLoader.Load(Encoding.UTF8.GetBytes(toml), "sixty_four.toml", _ => null);
        Assert.True(load.Succeeded, string.Join("\n", load.Diagnostics));
        var r = DesignPipeline.Run(load.Description!, ShippedExamples.Catalog);
        var d = r.Datapath;
        Assert.Equal(64, d.AccBits);
        Assert.Equal(64, d.OutputBits);
        Assert.True(d.Proof.Checks.Where(c => c.Required).All(c => c.Fits), string.Join("; ", d.Proof.Advice));
        foreach (var check in d.Proof.Checks.Where(c => c.WorstCaseCodes is not null))
        {
            var got = BitExactModel.Run(d, check.WorstCaseCodes!);
            var (acc, output, _) = FixedPointFixtures.Reference(d, check.WorstCaseCodes!);
            Assert.Equal(acc, (BigInteger)got.Accumulator);
            Assert.Equal(output, (BigInteger)got.Output);
        }
    }

    private static IntegerDesign Design(Case k) => BitExactModelTests.Manual(k.Coefficients, 64, k.Mode) with
    {
        AdcBits = Bits,
        SampleBits = Bits,
        CoefBits = Bits,
        ProductBits = 2 * Bits,
        OutputBits = 64,
        Rounding = k.Rounding,
        PostMultiplier = k.M,
        Shift = k.Shift,
    };
}
