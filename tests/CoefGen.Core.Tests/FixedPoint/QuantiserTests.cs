using CoefGen.Core.FixedPoint;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace CoefGen.Core.Tests.FixedPoint;

public class QuantiserTests
{
    [Property(MaxTest = 150)]
    public Property Integer_weights_sum_to_zero_and_fit_their_width_for_every_valid_design() =>
        Prop.ForAll(DesignCase.Arbitrary(), dc =>
        {
            var g = dc.Grid;
            var q = Quantiser.Quantise(dc.Weights, g, dc.Covariance(g), dc.CoefBits, g.IsSettled);
            var limit = (1L << (dc.CoefBits - 1)) - 1;
            return q.Coefficients.Sum() == 0 && q.Coefficients.All(c => Math.Abs(c) <= limit);
        });

    [Property(MaxTest = 150)]
    public Property Settled_shift_designs_sum_to_exactly_two_to_the_P_over_the_signal_window() =>
        Prop.ForAll(DesignCase.Arbitrary(), dc =>
        {
            var g = FixedPointFixtures.Grid(dc.ResetCount, dc.SignalCount);
            var q = Quantiser.Quantise(dc.Weights, g, dc.Covariance(g), dc.CoefBits, true);
            var signal = q.Coefficients.Skip(g.Windows[0].Count).Sum();
            var reset = q.Coefficients.Take(g.Windows[0].Count).Sum();
            return signal == 1L << q.P && reset == -(1L << q.P);
        });

    [Property(MaxTest = 100)]
    public Property Scale_P_is_the_largest_the_coefficient_width_allows() =>
        Prop.ForAll(DesignCase.Arbitrary(), dc =>
        {
            // At P + 1 the plain rounding of the largest weight no longer fits (or the repair pushes it over).
            var g = dc.Grid;
            var q = Quantiser.Quantise(dc.Weights, g, dc.Covariance(g), dc.CoefBits, g.IsSettled);
            var gain = dc.Weights.Select((v, k) => v * g.Step[k]).Sum();
            var maxAtNext = dc.Weights.Max(v => Math.Abs(v / gain)) * Math.ScaleB(1.0, q.P + 1);
            var limit = (1L << (dc.CoefBits - 1)) - 1;
            return maxAtNext > limit - 1 || q.P == 61;
        });

    [Theory]
    [InlineData(64, 22)]
    [InlineData(16, 20)]
    [InlineData(1, 16)]
    public void Boxcar_with_a_power_of_two_count_gives_exactly_two_to_the_P_over_N(int n, int expectedP)
    {
        // 18-bit coefficients hold at most 2^17 - 1, so 2^P / N <= 131071 gives P = 16 + log2 N (derived).
        var g = FixedPointFixtures.Grid(n, n);
        var d = FixedPointFixtures.Design(g, FixedPointFixtures.Boxcar(g), FixedPointFixtures.Ar1(g, 0.9, 4e-9, 1e-9), FixedPointFixtures.Settings());
        Assert.Equal(expectedP, d.P);
        var w = (1L << d.P) / n;
        Assert.All(d.Coefficients.Take(n), c => Assert.Equal(-w, c));
        Assert.All(d.Coefficients.Skip(n), c => Assert.Equal(w, c));
        Assert.Equal(0.0, d.GainErrorPpm);
        Assert.Equal(0.0, d.NoisePenaltyPercent, 12);
    }

    [Fact]
    public void Boxcar_of_100_at_scale_2_to_16_mixes_656_and_655()
    {
        // PHYSICS.md §6: N = 100 and 2^16 give 36 x 656 + 64 x 655 = 65536. 11-bit coefficients (max 1023) make
        // P = 16 the largest scale: 2^17 / 100 = 1310.72 does not fit.
        var g = FixedPointFixtures.Grid(100, 100);
        var q = Quantiser.Quantise(FixedPointFixtures.Boxcar(g), g, FixedPointFixtures.White(g), 11, true);
        Assert.Equal(16, q.P);
        var signal = q.Coefficients.Skip(100).ToArray();
        Assert.Equal(36, signal.Count(c => c == 656));
        Assert.Equal(64, signal.Count(c => c == 655));
        Assert.Equal(65536, signal.Sum());
        Assert.Equal(36, q.Coefficients.Take(100).Count(c => c == -656));
        Assert.Equal(0, q.Coefficients.Sum());
    }

    [Fact]
    public void Refinement_never_raises_the_noise_of_the_largest_remainder_start()
    {
        // Under AR(1) noise the choice of which samples get 656 matters; the refined weights are never worse
        // than the same mix placed in index order (what the repair alone gives for equal remainders).
        var g = FixedPointFixtures.Grid(100, 100);
        var r = FixedPointFixtures.Ar1(g, 0.95, 4e-9, 1e-9);
        var q = Quantiser.Quantise(FixedPointFixtures.Boxcar(g), g, r, 11, true);
        double[] naive = [.. Enumerable.Range(0, 200).Select(k => k < 100 ? (k < 36 ? -656.0 : -655.0) : (k < 136 ? 656.0 : 655.0))];
        var refined = q.Coefficients.Select(c => (double)c).ToArray();
        Assert.True(r.QuadraticForm(refined) <= r.QuadraticForm(naive));
        Assert.Equal(65536, q.Coefficients.Skip(100).Sum());
    }

    [Fact]
    public void Exact_normalisation_realises_the_gain_with_a_post_multiplier_within_its_resolution()
    {
        // An 18-bit M lies in [2^16, 2^17): the relative gain error is at most 2^-17 (7.6 ppm), derived.
        var g = FixedPointFixtures.Grid(100, 100);
        var s = FixedPointFixtures.Settings(normalize: NormalizeMode.Exact, frac: 4);
        var d = FixedPointFixtures.Design(g, FixedPointFixtures.Boxcar(g), FixedPointFixtures.White(g), s);
        Assert.Equal(NormalizeMode.Exact, d.Normalize);
        Assert.InRange(d.PostMultiplier, 1L << 16, (1L << 17) - 1);
        Assert.InRange(Math.Abs(d.GainErrorPpm), 0, 7.63);
        var gain = (double)d.Coefficients.Skip(100).Sum() * d.PostMultiplier / Math.ScaleB(1.0, d.Shift);
        Assert.Equal(16.0, gain, 16.0 * 7.63e-6);
    }
}
