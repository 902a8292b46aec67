using CoefGen.Core.Readout;
using static CoefGen.Core.Tests.Readout.ReadoutFixture;

namespace CoefGen.Core.Tests.Cycle;

public class CycleLoaderTests
{
    private static string Replace(string toml, string oldText, string newText)
    {
        Assert.Equal(toml.IndexOf(oldText, StringComparison.Ordinal), toml.LastIndexOf(oldText, StringComparison.Ordinal));
        Assert.True(toml.Contains(oldText, StringComparison.Ordinal), $"no '{oldText}'");
        return toml.Replace(oldText, newText, StringComparison.Ordinal);
    }

    [Fact]
    public void Repeated_reads_expand_to_one_group_per_read_with_shifted_transfers()
    {
        var result = Load(CycleFiles.RepeatedReads);
        Assert.Empty(result.Diagnostics);
        var cycle = result.Description!.Timing.Cycle!;
        Assert.Equal(16, cycle.Windows.Count);
        Assert.Equal(8, cycle.GroupCount);
        Assert.Equal(8, cycle.RepeatCount);
        var last = cycle.Windows[^1];
        Assert.Equal("signal#7", last.Name);
        Assert.Equal(new SampleWindow(30 + 350, 16), last.Samples);
        Assert.Equal(ChargeSight.Transfer, last.Sees);
        Assert.Equal(7, last.ResetGroup);
        Assert.Equal((30 + 350) / 10e6, last.ChargeTimeS, 15);
        Assert.Null(cycle.AsTwoWindow()); // a general cycle is never read as "first and last window"
    }

    [Fact]
    public void Repetition_without_new_groups_keeps_one_reset_group()
    {
        var result = Load(CycleFiles.Ramp);
        Assert.Empty(result.Diagnostics);
        var cycle = result.Description!.Timing.Cycle!;
        Assert.Equal(40, cycle.Windows.Count);
        Assert.Equal(1, cycle.GroupCount);
        Assert.Equal(20 / 10e6, cycle.ReferenceTimeS);
        Assert.Equal(2e6 + 1000, cycle.ShotNoise!.TotalEPerS);
        Assert.Equal([0, 1e5, 1e7], cycle.ShotNoise.LevelsEPerS);
    }

    [Fact]
    public void Windows_in_nanoseconds_are_rounded_and_reported()
    {
        var toml = Replace(CycleFiles.RepeatedReads, "start = 10\ncount = 16", "start_ns = 1020\ncount = 16");
        var result = Load(toml);
        Assert.Empty(result.Diagnostics);
        Assert.Equal(10, result.Description!.Timing.Cycle!.Windows[0].Samples.Start);
        Assert.Contains(result.Description.Timing.Rounding, l => l.StartsWith("timing.window[0].start_ns = 1020 ns -> sample 10", StringComparison.Ordinal));
    }

    [Fact]
    public void Overlapping_windows_are_located_at_the_later_window()
    {
        var toml = Replace(CycleFiles.Fowler, "start = 900", "start = 12");
        AssertOnly(Load(toml), "CG1202", "timing.window[1].start", LineOf(toml, "start = 12"));
    }

    [Fact]
    public void A_repetition_that_makes_copies_overlap_is_located_at_its_period()
    {
        var toml = Replace(CycleFiles.RepeatedReads, "every = 50", "every = 20");
        AssertOnly(Load(toml), "CG1202", "timing.repeat.every", LineOf(toml, "every = 20"));
    }

    [Fact]
    public void A_signal_window_before_its_transfer_is_located_at_the_transfer()
    {
        var toml = Replace(CycleFiles.RepeatedReads, "transfer_sample = 30", "transfer_sample = 31.5");
        var d = AssertOnly(Load(toml), "CG1250", "timing.window[1].transfer_sample", LineOf(toml, "transfer_sample = 31.5"));
        Assert.Contains("starts before its transfer at sample 31.5", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_ramp_window_before_the_integration_start_is_reported()
    {
        var toml = Replace(CycleFiles.Ramp, "start_sample = 0", "start_sample = 15");
        AssertOnly(Load(toml), "CG1250", "timing.window[0].start", LineOf(toml, "start = 10"));
    }

    [Fact]
    public void A_reset_group_with_no_window_is_located_at_the_highest_group()
    {
        var toml = Replace(CycleFiles.Fowler, "start = 900\ncount = 4\nsees = \"ramp\"", "start = 900\ncount = 4\nsees = \"ramp\"\ngroup = 2");
        var d = AssertOnly(Load(toml), "CG1251", "timing.window[1].group", LineOf(toml, "group = 2"));
        Assert.Contains("reset group 1 has no window", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_repetition_running_past_the_cycle_is_located_at_its_count()
    {
        var toml = Replace(CycleFiles.RepeatedReads, "times = 8", "times = 9");
        var d = AssertOnly(Load(toml), "CG1252", "timing.repeat.times", LineOf(toml, "times = 9"));
        Assert.Contains("at most 8 copies fit", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_repetition_of_a_group_without_windows_is_reported()
    {
        var toml = Replace(CycleFiles.RepeatedReads, "group = 0\ntimes = 8", "group = 3\ntimes = 8");
        AssertOnly(Load(toml), "CG1253", "timing.repeat.group", LineOf(toml, "group = 3"));
    }

    [Fact]
    public void Ramp_windows_need_the_integration_section()
    {
        var start = CycleFiles.Fowler.IndexOf("[integration]", StringComparison.Ordinal);
        var end = CycleFiles.Fowler.IndexOf("[noise]", StringComparison.Ordinal);
        var toml = CycleFiles.Fowler[..start] + CycleFiles.Fowler[end..];
        AssertOnly(Load(toml), "CG1254", "timing.window[0].sees", LineOf(toml, "sees = \"ramp\""));
    }

    [Fact]
    public void A_charge_window_needs_its_transfer_instant()
    {
        var toml = Replace(CycleFiles.RepeatedReads, "transfer_sample = 30\n", "");
        AssertOnly(Load(toml), "CG1002", "timing.window[1].transfer_sample", LineOf(toml, "sees = \"charge\""));
    }

    [Fact]
    public void Unknown_window_keys_get_a_suggestion()
    {
        var toml = Replace(CycleFiles.Fowler, "sees = \"ramp\"\n\n[integration]", "sees = \"ramp\"\ngrup = 0\n\n[integration]");
        var d = AssertOnly(Load(toml), "CG1001", "timing.window[1].grup", LineOf(toml, "grup = 0"));
        Assert.Contains("did you mean 'group'", d.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Explicit_shapes_are_refused_for_a_general_cycle()
    {
        var toml = CycleFiles.Fowler + "\n[weights]\nwindow = \"explicit\"\nreset = [1, 1, 1, 1]\nsignal = [1, 1, 1, 1]\n";
        AssertOnly(Load(toml), "CG1255", "weights.window", LineOf(toml, "window = \"explicit\""));
    }

    [Fact]
    public void Integration_in_a_classic_file_is_reported()
    {
        var toml = Minimal + "\n[integration]\nstart_sample = 0\nreference_samples = 10\n";
        AssertOnly(Load(toml), "CG1254", "integration", LineOf(toml, "[integration]"));
    }

    [Theory]
    [InlineData(CycleFiles.RepeatedReads)]
    [InlineData(CycleFiles.Fowler)]
    [InlineData(CycleFiles.Ramp)]
    public void Writer_round_trip_keeps_every_window(string toml)
    {
        var first = Load(toml).Description!;
        var written = ReadoutWriter.ToToml(first);
        var again = Load(written);
        Assert.Empty(again.Diagnostics);
        var a = first.Timing.Cycle!;
        var b = again.Description!.Timing.Cycle!;
        Assert.Equal(a.GroupCount, b.GroupCount);
        Assert.Equal(a.ReferenceTimeS, b.ReferenceTimeS);
        Assert.Equal(a.ShotNoise, b.ShotNoise is null ? null : b.ShotNoise with { LevelsEPerS = a.ShotNoise!.LevelsEPerS });
        Assert.Equal(a.ShotNoise?.LevelsEPerS, b.ShotNoise?.LevelsEPerS);
        Assert.Equal(a.Windows.Select(w => w with { Read = 0 }), b.Windows);
        Assert.Equal(written, ReadoutWriter.ToToml(again.Description));
    }
}
