using System.Text;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Tests.Cycle;

/// <summary>
/// One cycle concept for every readout: a classic file and the same two windows written as [[timing.window]] give
/// the same numbers to the bit; a general cycle is never read as "first and last window"; in shift mode the charge
/// windows of every cycle without ramps sum to exactly 2^P (derived in IntegerSumPins; no external source).
/// </summary>
public class TwoWindowCycleTests
{
    private const string Tail = """

        [noise]
        front_end_pole_hz = "2 MHz"

        [[noise.source]]
        name = "amplifier"
        at = "sensor"
        white_nv_per_rthz = 12.0
        flicker_corner_hz = "50 kHz"
        low_cutoff_hz = 0.01

        [weights]
        scheme = "SCHEME"

        [fixed_point]
        normalize = "MODE"
        """;

    private const string Classic = CycleFiles.Head + """
        [timing]
        pixel_samples = 200
        transfer_sample = 60
        step = "pole"

        [timing.reset]
        start = 10
        count = 40

        [timing.signal]
        start = 66
        count = 40
        """ + Tail;

    private const string Windows = CycleFiles.Head + """
        [timing]
        pixel_samples = 200
        step = "pole"

        [[timing.window]]
        name = "reset"
        start = 10
        count = 40
        sees = "reset"

        [[timing.window]]
        name = "signal"
        start = 66
        count = 40
        sees = "charge"
        transfer_sample = 60
        """ + Tail;

    /// <summary>A cycle whose first window sees the charge: a second transfer's read comes first in time.</summary>
    private const string ChargeFirst = CycleFiles.Head + """
        [timing]
        pixel_samples = 300
        step = "ideal"

        [[timing.window]]
        name = "early signal"
        start = 20
        count = 30
        sees = "charge"
        transfer_sample = 15
        group = 0

        [[timing.window]]
        name = "reset"
        start = 100
        count = 30
        sees = "reset"
        group = 1

        [[timing.window]]
        name = "signal"
        start = 140
        count = 30
        sees = "charge"
        transfer_sample = 135
        group = 1

        [[timing.window]]
        name = "late reset"
        start = 200
        count = 30
        sees = "reset"
        group = 0
        """ + Tail;

    private static ReadoutDescription Load(string text, string scheme, string mode)
    {
        var bytes = Encoding.UTF8.GetBytes(text.Replace("SCHEME", scheme, StringComparison.Ordinal).Replace("MODE", mode, StringComparison.Ordinal));
        var result = ReadoutLoader.Load(bytes, "cyc.toml", _ => null);
        Assert.True(result.Description is not null, string.Join("\n", result.Diagnostics));
        return result.Description!;
    }

    [Theory]
    [InlineData("boxcar", "shift")]
    [InlineData("weighted", "shift")]
    [InlineData("optimal", "shift")]
    [InlineData("optimal", "exact")]
    public void A_classic_file_and_its_two_windows_written_as_a_cycle_give_the_same_bits(string scheme, string mode)
    {
        var classic = DesignPipeline.Run(Load(Classic, scheme, mode), Pipeline.ShippedExamples.Catalog);
        var cycle = DesignPipeline.Run(Load(Windows, scheme, mode), Pipeline.ShippedExamples.Catalog);
        Assert.True(classic.Description.Timing.Cycle.IsClassic);
        Assert.Null(cycle.Description.Timing.Cycle.AsTwoWindow());

        Assert.Equal(classic.Grid.Step, cycle.Grid.Step);
        for (var i = 0; i < classic.Weights.Count; i++)
        {
            Assert.Equal(classic.Weights[i].H, cycle.Weights[i].H); // exact doubles: one path over windows and groups
        }

        var a = classic.Datapath;
        var b = cycle.Datapath;
        Assert.Equal(a.Coefficients, b.Coefficients);
        Assert.Equal((a.P, a.Shift, a.PostMultiplier, a.OutputFracBits), (b.P, b.Shift, b.PostMultiplier, b.OutputFracBits));
        Assert.Equal(a.GainErrorPpm, b.GainErrorPpm);

        // Only the output form differs: the classic design keeps its reset/signal view, the cycle its window table.
        Assert.NotNull(a.Reset);
        Assert.Null(b.Reset);
        Assert.NotNull(b.Windows);
    }

    [Theory]
    [InlineData("shift")]
    [InlineData("exact")]
    public void A_cycle_whose_first_window_sees_charge_is_not_read_as_reset_then_signal(string mode)
    {
        var d = Load(ChargeFirst, "optimal", mode);
        Assert.Null(d.Timing.Cycle.AsTwoWindow());
        var r = DesignPipeline.Run(d, Pipeline.ShippedExamples.Catalog);
        Assert.Null(r.Grid.TwoWindow);
        Assert.Null(r.Datapath.Reset);
        Assert.Null(r.Datapath.Signal);
        Assert.Equal(ChargeSight.Transfer, r.Grid.SightOf(0));
        Assert.Equal(1.0, r.Grid.Step[0]);

        var c = r.Datapath.Coefficients;
        foreach (var group in r.Grid.GroupMembers())
        {
            Assert.Equal(0L, group.Sum(k => c[k]));
        }

        // The first window carries positive weight (it sees the charge), the late reset window negative.
        Assert.True(Enumerable.Range(0, 30).Sum(k => c[k]) > 0);
        Assert.True(Enumerable.Range(90, 30).Sum(k => c[k]) < 0);
        if (mode == "shift")
        {
            // Ideal step: s = 1 on every charge sample, so the integer gain sum c s is exactly 2^P.
            Assert.Equal(1L << r.Datapath.P, IntegerGain(r));
            Assert.Equal(0.0, r.Datapath.GainErrorPpm);
        }
    }

    [Theory]
    [MemberData(nameof(CycleExampleTests.Names), MemberType = typeof(CycleExampleTests))]
    public void In_shift_mode_the_integer_gain_of_a_cycle_without_ramps_is_exactly_two_to_the_p(string name)
    {
        var loaded = Pipeline.ShippedExamples.Load(Path.Combine("cycles", name));
        var d = loaded with { Timing = loaded.Timing with { Step = StepModel.Ideal } };
        var model = DesignPipeline.Run(d, Pipeline.ShippedExamples.Catalog);
        var settings = model.FixedPointSettings with { Normalize = NormalizeMode.Shift };
        var integer = FixedPointDesigner.Design(d.Name, model.Grid, model.Chosen.H, model.Covariance, d.Adc, settings, d.Timing.PixelSamples, d.Weights.RejectDrift);
        var r = model with { Datapath = integer };

        var c = integer.Coefficients;
        foreach (var group in model.Grid.GroupMembers())
        {
            Assert.Equal(0L, group.Sum(k => c[k]));
        }

        if (model.Grid.Windows.Any(w => w.Sees == ChargeSight.Ramp))
        {
            // A ramp's gain sum c (t - t0) / T_ref is not a sum of pinned counts: only sum c = 0 per group is kept,
            // and the gain is realised as it rounds (IntegerSumPins).
            return;
        }

        Assert.Equal(1L << integer.P, IntegerGain(r));
        Assert.Equal(0.0, integer.GainErrorPpm);
    }

    /// <summary>sum c_k s_k over samples with s = 0 or 1 exactly (ideal step), in integers.</summary>
    private static long IntegerGain(DesignResult r)
    {
        var g = r.Grid;
        Assert.All(g.Step, s => Assert.True(s is 0.0 or 1.0));
        return Enumerable.Range(0, g.Count).Where(k => g.Step[k] == 1.0).Sum(k => r.Datapath.Coefficients[k]);
    }
}
