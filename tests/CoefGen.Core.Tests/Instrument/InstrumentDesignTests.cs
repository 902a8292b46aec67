using System.Numerics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Instrument;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Study;

namespace CoefGen.Core.Tests.Instrument;

/// <summary>The example instrument: 16 tables on one datapath, each equal to its standalone readout file (common practice, no source: one datapath, per-table constants).</summary>
public class InstrumentDesignTests
{
    private static InstrumentDesign D => ExampleInstrument.Shipped;

    [Fact]
    public void Four_modes_by_four_channels_give_sixteen_tables_in_mode_major_order()
    {
        Assert.Equal(16, D.Tables.Count);
        Assert.Equal(["slow/a", "slow/b", "slow/c", "slow/d", "normal/a"], D.Tables.Take(5).Select(t => t.Label));
        Assert.All(D.Tables, t => Assert.Equal(t.ModeIndex * 4 + t.ChannelIndex, t.Index));
        Assert.Equal("cam4_fast_b", D.Tables[13].Result.Datapath.Name);
        Assert.Equal([200, 80, 160, 40], D.Tables.Where(t => t.Channel == "a").Select(t => t.Result.Datapath.PixelSamples));
    }

    /// <summary>fast/b written by hand as its own readout file (Instrument/cam4_fast_b.toml), with the shared widths.</summary>
    [Fact]
    public void A_table_equals_the_hand_written_standalone_readout_bit_for_bit()
    {
        var s = D.Settings;
        var standalone = ExampleInstrument.Standalone(File.ReadAllText(ExampleInstrument.FastB));
        var f = standalone.Description.FixedPoint;
        Assert.Equal((s.CoefBits, s.SampleBits, s.AccBits, s.OutputBits, D.OutputFracBits), (f.CoefBits, f.SampleBits, f.AccBits, f.OutputBits, f.OutputFracBits));
        AssertSame(standalone, D.Tables.Single(t => t.Label == "fast/b").Result);
    }

    [Fact]
    public void Every_table_equals_its_readout_text_with_the_shared_widths_written_in()
    {
        var s = D.Settings;
        foreach (var t in D.Tables)
        {
            var text = t.Text;
            foreach (var (key, value) in new[] { ("coef_bits", s.CoefBits), ("sample_bits", s.SampleBits), ("acc_bits", s.AccBits), ("output_bits", s.OutputBits), ("output_frac_bits", D.OutputFracBits) })
            {
                text = ReadoutTextEditor.SetNumber(text, "fixed_point." + key, value, out var error) ?? throw new InvalidOperationException(error);
            }

            AssertSame(ExampleInstrument.Standalone(text), t.Result);
        }
    }

    /// <summary>
    /// The accumulator extreme of each table recomputed here from its coefficients (sum of max(c x_max, c x_min) over the
    /// 16-bit range, PHYSICS.md §6): the shared need is the largest, reached by the longest mode, and fits every table.
    /// </summary>
    [Fact]
    public void Shared_widths_are_the_widest_any_table_needs_and_the_proof_holds_for_all()
    {
        var needs = D.Tables.Select(t =>
        {
            var d = t.Result.Datapath;
            BigInteger xMax = (1L << (d.AdcBits - 1)) - 1, xMin = -(1L << (d.AdcBits - 1));
            BigInteger hi = 0, lo = 0;
            foreach (var c in d.Coefficients)
            {
                hi += BigInteger.Max(c * xMax, c * xMin);
                lo += BigInteger.Min(c * xMax, c * xMin);
            }

            return (t.Label, Bits: TwosComplement.RequiredBits(lo, hi));
        }).ToArray();
        var acc = D.Widths.Single(w => w.Name == "accumulator_final");
        Assert.Equal(needs.Max(n => n.Bits), acc.RequiredBits);
        Assert.Equal(needs.Min(n => n.Bits), acc.NarrowestRequiredBits);
        Assert.True(acc.ForcedByOneTable);
        Assert.StartsWith("slow/", acc.WidestTable, StringComparison.Ordinal);
        Assert.Equal(needs.First(n => n.Bits == acc.RequiredBits).Label, acc.WidestTable);
        Assert.True(D.Safe);
        Assert.All(D.Tables, t => Assert.True(t.Result.Datapath.Proof.Safe));
        Assert.All(D.Tables, t => Assert.Equal(D.Settings.AccBits, t.Result.Datapath.AccBits));
        Assert.All(D.Tables, t => Assert.Equal(D.OutputFracBits, t.Result.Datapath.OutputFracBits));
        foreach (var w in D.Widths)
        {
            Assert.Equal(D.Tables.Max(t => t.Result.Datapath.Proof.Checks.Single(c => c.Name == w.Name).RequiredBits), w.RequiredBits);
        }
    }

    /// <summary>The output fraction is the largest any table recommends on its own, so no table loses resolution.</summary>
    [Fact]
    public void Shared_output_fraction_is_the_largest_recommended_by_any_table()
    {
        var own = D.Tables.Select(t => ExampleInstrument.Standalone(t.Text).Datapath.OutputFracBits).ToArray();
        Assert.Equal(own.Max(), D.OutputFracBits);
        Assert.True(own.Min() < own.Max(), "the example should have modes that recommend different fractions");
    }

    private static void AssertSame(DesignResult expected, DesignResult actual)
    {
        var e = expected.Datapath;
        var a = actual.Datapath;
        Assert.Equal(e.Name, a.Name);
        Assert.Equal(e.Coefficients, a.Coefficients);
        Assert.Equal(e.SampleIndex, a.SampleIndex);
        Assert.Equal(e.PixelSamples, a.PixelSamples);
        Assert.Equal((e.P, e.Shift, e.PostMultiplier, e.OutputFracBits, e.AccBits, e.CoefBits, e.SampleBits, e.OutputBits), (a.P, a.Shift, a.PostMultiplier, a.OutputFracBits, a.AccBits, a.CoefBits, a.SampleBits, a.OutputBits));
        Assert.Equal(e.GainErrorPpm, a.GainErrorPpm);
        Assert.Equal(e.Proof.Checks.Select(c => (c.Name, c.MinValue, c.MaxValue, c.RequiredBits, c.AvailableBits)), a.Proof.Checks.Select(c => (c.Name, c.MinValue, c.MaxValue, c.RequiredBits, c.AvailableBits)));
        Assert.Equal(expected.Chosen.H, actual.Chosen.H);
        Assert.Equal(expected.Predictions.Select(p => p.SigmaElectrons), actual.Predictions.Select(p => p.SigmaElectrons));
    }
}
