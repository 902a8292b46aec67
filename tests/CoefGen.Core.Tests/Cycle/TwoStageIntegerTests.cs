using System.Numerics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.FixedPoint.TwoStage;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Tests.Vectors;
using CoefGen.Core.Weights.TwoStage;

namespace CoefGen.Core.Tests.Cycle;

/// <summary>The integer two-stage datapath of repeated reads (README "Cycles with many windows") on the shipped skipper example.</summary>
public class TwoStageIntegerTests
{
    private static (DesignResult R, TwoStageResult Real, TwoStageIntegerDesign D) Skipper()
    {
        var r = ExampleDesigns.Load(Path.Combine("cycles", "skipper_reads.toml"));
        var real = TwoStageWeights.Design(r.Grid, r.Covariance, r.Description.Weights.RejectDrift);
        Assert.NotNull(real);
        return (r, real, TwoStageIntegerDesigner.Design(r.Grid, r.Covariance, real, r.Description.Adc, r.FixedPointSettings));
    }

    [Fact]
    public void Per_read_table_sums_to_zero_exactly_and_fits_the_coefficient_width()
    {
        var (r, real, d) = Skipper();
        Assert.Equal(0L, d.Table.Sum());
        Assert.Equal(real.PerReadTable.Length, d.Table.Count);
        Assert.Equal(real.ReadWeights.Length, d.ReadWeights.Count);
        var limit = (1L << (r.FixedPointSettings.CoefBits - 1)) - 1;
        Assert.All(d.Table, v => Assert.InRange(v, -limit, limit));
        Assert.All(d.ReadWeights, v => Assert.InRange(v, -limit, limit));

        // The largest scale that fits: one bit more would overflow the width (so P1 and P2 are not lazily small).
        Assert.True(2 * d.Table.Max(Math.Abs) > limit - 2);
        Assert.True(2 * d.ReadWeights.Max(Math.Abs) > limit);
    }

    [Fact]
    public void Proof_is_safe_and_its_worst_cases_are_reached_by_the_bit_exact_model()
    {
        var (r, _, d) = Skipper();
        Assert.True(d.Proof.Safe, string.Join("\n", d.Proof.Advice));
        var mode = r.FixedPointSettings.Accumulator;
        var acc2 = d.Proof.Checks.Single(c => c.Name == "stage2_accumulator_final");
        var run = TwoStageBitExactModel.Run(d, acc2.WorstCaseCodes!, mode);
        var worst = BigInteger.Abs(acc2.MinValue) > acc2.MaxValue ? acc2.MinValue : acc2.MaxValue;
        Assert.Equal(worst, (BigInteger)run.Acc2);

        var output = d.Proof.Checks.Single(c => c.Name == "output");
        var outRun = TwoStageBitExactModel.Run(d, output.WorstCaseCodes!, mode);
        Assert.Contains((BigInteger)outRun.Output, new[] { output.MinValue, output.MaxValue });

        // Stage 1: every read sees the pattern that makes its first sum extreme, then the stage-1 rounding.
        var acc1 = d.Proof.Checks.Single(c => c.Name == "stage1_accumulator_final");
        var one = TwoStageBitExactModel.Run(d, acc1.WorstCaseCodes!, mode);
        var expected = BitExactModel.RoundShift((Int128)(BigInteger.Abs(acc1.MinValue) > acc1.MaxValue ? acc1.MinValue : acc1.MaxValue), d.Stage1Shift, d.Rounding);
        Assert.All(one.Stage1, v => Assert.Equal((long)expected, v));
    }

    [Fact]
    public void Bit_exact_model_agrees_with_an_independent_BigInteger_reference_on_random_codes()
    {
        var (r, _, d) = Skipper();
        var rng = new Random(11);
        var max = (1L << d.AdcBits) - 1;
        for (var trial = 0; trial < 40; trial++)
        {
            // Half the trials near the rails, where rounding and any clipping matter most.
            var codes = Enumerable.Range(0, d.Table.Count * d.ReadWeights.Count)
                .Select(_ => trial % 2 == 0 ? rng.NextInt64(0, max + 1) : (rng.Next(2) == 0 ? rng.NextInt64(0, 4) : max - rng.NextInt64(0, 4)))
                .Select(c => r.Description.Adc.Coding == Core.Readout.AdcCoding.OffsetBinary ? c : c - (1L << (d.AdcBits - 1)))
                .ToArray();
            var run = TwoStageBitExactModel.Run(d, codes, r.FixedPointSettings.Accumulator);
            Assert.Equal(TwoStageCases.Reference(d, codes), (BigInteger)run.Output);
        }
    }

    [Fact]
    public void Integer_noise_penalty_against_the_real_two_stage_weights_is_small_at_18_bit_coefficients()
    {
        var (r, _, d) = Skipper();
        Assert.Equal(18, r.FixedPointSettings.CoefBits);
        Assert.InRange(d.NoisePenaltyPercent, -0.01, 0.01);
        Assert.InRange(Math.Abs(d.GainErrorPpm), 0, 1);
    }
}
