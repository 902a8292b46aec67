using CoefGen.Core.FixedPoint;
using CoefGen.Core.FixedPoint.TwoStage;
using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;
using CoefGen.Core.Weights.TwoStage;
using static CoefGen.Core.Tests.Readout.ReadoutFixture;

namespace CoefGen.Core.Tests.Cycle;

/// <summary>
/// The two-stage form under every reset pattern of repeated reads: sum h = 0 over each reset group (each reset has its own
/// kTC level; PHYSICS.md, the general cycle's constraints), for the real weights and exactly for the integer ones.
/// </summary>
public class TwoStageResetGroupTests
{
    private const double Rate = 10e6;

    /// <summary>Eight reads every 50 samples; <paramref name="groupOf"/> (read, pair 0 or 1) gives each window pair's reset group.</summary>
    private static SampleGrid Reads(bool twoPairs, Func<int, int, int> groupOf)
    {
        var windows = new List<CycleWindow>();
        for (var j = 0; j < 8; j++)
        {
            var pairs = twoPairs ? 2 : 1;
            for (var pair = 0; pair < pairs; pair++)
            {
                var start = (j * 50) + (pair * 24);
                windows.Add(new CycleWindow($"ped{j}.{pair}", new SampleWindow(start + 2, 8), ChargeSight.None, 0, groupOf(j, pair), j));
                windows.Add(new CycleWindow($"sig{j}.{pair}", new SampleWindow(start + 12, 8), ChargeSight.Transfer, (start + 11) / Rate, groupOf(j, pair), j));
            }
        }

        var groups = windows.Max(w => w.ResetGroup) + 1;
        return SampleGrid.FromCycle(Rate, new CycleSpec(windows, groups, null, null, 8), poleHz: null);
    }

    private static (TwoStageResult Real, TwoStageIntegerDesign Integer, ReadLayout Layout) Design(SampleGrid grid)
    {
        // The white + flicker noise of the repeated-reads test file, sampled on this grid.
        var d = Load(CycleFiles.RepeatedReads.Replace("white_nv_per_rthz = 20.0", "white_nv_per_rthz = 20.0\nflicker_corner_hz = \"100 kHz\"\nlow_cutoff_hz = 1", StringComparison.Ordinal)).Description!;
        var r = NoiseModel.FromDescription(d).Sample(grid);
        var real = TwoStageWeights.Design(grid, r, rejectDrift: false);
        Assert.NotNull(real);
        var settings = FixedPointSettingsResolver.Resolve(d, Pipeline.ShippedExamples.Catalog).Settings!;
        return (real, TwoStageIntegerDesigner.Design(grid, r, real, d.Adc, settings), ReadLayout.Of(grid)!);
    }

    /// <summary>Sum of h over each reset group, for h = w (x) c (integers: exact).</summary>
    private static long[] GroupSums(SampleGrid grid, TwoStageIntegerDesign d)
    {
        var sums = new long[grid.GroupCount];
        var m = d.Table.Count;
        for (var k = 0; k < grid.Count; k++)
        {
            sums[grid.Group[k]] += d.ReadWeights[k / m] * d.Table[k % m];
        }

        return sums;
    }

    private static double[] GroupSums(SampleGrid grid, double[] h)
    {
        var sums = new double[grid.GroupCount];
        for (var k = 0; k < grid.Count; k++)
        {
            sums[grid.Group[k]] += h[k];
        }

        return sums;
    }

    [Theory]
    [InlineData("own reset per read")]
    [InlineData("one reset shared by all reads")]
    [InlineData("one reset per pair of reads")]
    [InlineData("two resets per read")]
    [InlineData("two resets per read, shared by pairs of reads")]
    public void Every_reset_group_sums_to_zero_in_the_real_and_exactly_in_the_integer_form(string pattern)
    {
        var grid = pattern switch
        {
            "own reset per read" => Reads(false, (j, _) => j),
            "one reset shared by all reads" => Reads(false, (_, _) => 0),
            "one reset per pair of reads" => Reads(false, (j, _) => j / 2),
            "two resets per read" => Reads(true, (j, pair) => (2 * j) + pair),
            _ => Reads(true, (j, pair) => (2 * (j / 2)) + pair),
        };
        var (real, integer, layout) = Design(grid);
        Assert.Equal(pattern.StartsWith("two", StringComparison.Ordinal) ? 2 : 1, layout.ResetClasses.Count);
        var scale = real.H.Max(Math.Abs);
        Assert.All(GroupSums(grid, real.H), s => Assert.True(Math.Abs(s) < 1e-9 * scale, $"real group sum {s}"));
        Assert.All(GroupSums(grid, integer), s => Assert.Equal(0L, s));
        foreach (var c in layout.ResetClasses)
        {
            Assert.Equal(0L, c.Sum(p => integer.Table[p]));
        }

        // The constraints leave the charge gain at 1.
        var gain = real.H.Select((v, k) => v * grid.Step[k]).Sum();
        Assert.Equal(1.0, gain, 9);
    }

    [Fact]
    public void Two_resets_per_read_need_a_zero_sum_per_reset_not_only_per_read()
    {
        // A single sum over the read would let each reset's level leak with opposite signs: the per-class sums are not
        // zero by accident, each half carries a real pedestal - signal pair of weights.
        var (_, integer, layout) = Design(Reads(true, (j, pair) => (2 * j) + pair));
        Assert.Equal([.. Enumerable.Range(0, 16)], layout.ResetClasses[0]);
        Assert.Equal([.. Enumerable.Range(16, 16)], layout.ResetClasses[1]);
        Assert.All(layout.ResetClasses, c => Assert.True(c.Sum(p => Math.Abs(integer.Table[p])) > 0));
    }
}
