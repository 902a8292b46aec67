namespace CoefGen.Core.Readout.Loading;

/// <summary>
/// Reads a general cycle as written: [timing] with [[timing.window]] entries, an optional [timing.repeat] and, for
/// ramp windows, the top-level [integration]. A [timing] without [[timing.window]] is a classic two-window file
/// (<see cref="TimingSectionReader"/>).
/// </summary>
internal static class CycleSectionReader
{
    private static readonly (string, StepModel)[] Steps = [("ideal", StepModel.Ideal), ("pole", StepModel.Pole)];

    private static readonly (string, ChargeSight)[] Sights =
        [("reset", ChargeSight.None), ("charge", ChargeSight.Transfer), ("ramp", ChargeSight.Ramp)];

    /// <summary>Reset groups and repetitions are bounded so that group and copy numbers stay small integers.</summary>
    public const long MaxGroups = 1_000_000;

    /// <summary>True when the file describes its cycle as a list of windows.</summary>
    public static bool IsCycle(TableReader root) =>
        root.Entry("timing") is { Kind: TomlEntryKind.Table } timing && timing.Table!.Find("window") is not null;

    public static CycleInput? Read(TableReader root)
    {
        var timing = root.Section("timing", required: true);
        if (timing is null)
        {
            return null;
        }

        var context = root.Context;
        var errorsBefore = context.ErrorCount;
        timing.RejectUnknown("pixel_samples", "pixel_ns", "step", "window", "repeat");
        var pixel = TimingSectionReader.Pair(timing, "pixel_samples", "pixel_ns", minSamples: 1, NumberRule.Positive);
        var step = timing.Choice("step", Steps);
        var stepLocation = timing.Has("step") ? timing.Entry("step")!.ValueLocation : timing.Location;
        var windows = timing.SectionArray("window").Select((w, i) => ReadWindow(w, i)).ToList();
        var repeat = ReadRepeat(timing);
        var integration = ReadIntegration(root);
        return new CycleInput(pixel, step, stepLocation, windows, repeat, integration, timing.Location, context.ErrorCount == errorsBefore);
    }

    private static CycleWindowInput ReadWindow(TableReader w, int index)
    {
        w.RejectUnknown("name", "start", "start_ns", "count", "count_ns", "sees", "transfer_sample", "transfer_ns", "group");
        var name = w.Text("name", required: false) ?? $"w{index}";
        var start = TimingSectionReader.Pair(w, "start", "start_ns", minSamples: 0, NumberRule.NonNegative);
        var count = TimingSectionReader.Pair(w, "count", "count_ns", minSamples: 1, NumberRule.Positive);
        var sees = w.Has("sees") ? w.Choice("sees", Sights) : null;
        if (!w.Has("sees"))
        {
            w.MissingKey("sees", "the key 'sees' (\"reset\", \"charge\" or \"ramp\")");
        }

        var seesLocation = w.Has("sees") ? w.Entry("sees")!.ValueLocation : w.Location;
        TimeQuantity? transfer = null;
        var transferKey = w.Has("transfer_sample") || w.Has("transfer_ns") ? w.OneOf("transfer_sample", "transfer_ns") : null;
        if (transferKey is not null)
        {
            var value = w.Quantity(transferKey, required: true, NumberRule.NonNegative);
            transfer = value is null ? null : new TimeQuantity(w.KeyPath(transferKey), w.Entry(transferKey)!.ValueLocation, value.Value, IsNs: transferKey == "transfer_ns");
        }

        var group = w.Integer("group", required: false, 0, MaxGroups - 1);
        var groupLocation = w.Has("group") ? w.Entry("group")!.ValueLocation : w.Location;
        return new CycleWindowInput(name, w.Path, w.Location, start, count, sees, seesLocation, transfer, (int?)(group ?? (w.Has("group") ? null : 0)), groupLocation);
    }

    private static RepeatInput? ReadRepeat(TableReader timing)
    {
        var repeat = timing.Section("repeat", required: false);
        if (repeat is null)
        {
            return null;
        }

        repeat.RejectUnknown("group", "times", "every", "every_ns", "new_group");
        var group = repeat.Integer("group", required: false, 0, MaxGroups - 1);
        var times = repeat.Integer("times", required: true, 1, MaxGroups);
        var every = TimingSectionReader.Pair(repeat, "every", "every_ns", minSamples: 1, NumberRule.Positive);
        var newGroup = repeat.Flag("new_group") ?? true;
        return new RepeatInput(
            repeat.Location,
            (int?)(group ?? (repeat.Has("group") ? null : 0)),
            repeat.Has("group") ? repeat.Entry("group")!.ValueLocation : repeat.Location,
            (int?)times,
            repeat.Has("times") ? repeat.Entry("times")!.ValueLocation : repeat.Location,
            every,
            newGroup);
    }

    private static IntegrationInput? ReadIntegration(TableReader root)
    {
        var section = root.Section("integration", required: false);
        if (section is null)
        {
            return null;
        }

        var context = root.Context;
        var errorsBefore = context.ErrorCount;
        section.RejectUnknown("start_sample", "start_ns", "reference_samples", "reference_ns", "photon_flux_e_per_s", "dark_current_e_per_s", "levels_e_per_s");
        var start = Instant(section, "start_sample", "start_ns", NumberRule.NonNegative);
        var reference = Instant(section, "reference_samples", "reference_ns", NumberRule.Positive);
        var flux = section.Quantity("photon_flux_e_per_s", required: false, NumberRule.NonNegative);
        var dark = section.Quantity("dark_current_e_per_s", required: false, NumberRule.NonNegative);
        var levels = section.NumberArray("levels_e_per_s", NumberRule.NonNegative);
        return new IntegrationInput(section.Location, start, reference, flux, dark, levels, context.ErrorCount == errorsBefore);
    }

    /// <summary>An instant or a duration that may fall between samples (kept exact, not rounded).</summary>
    private static TimeQuantity? Instant(TableReader table, string samplesKey, string nsKey, NumberRule rule)
    {
        var key = table.OneOf(samplesKey, nsKey);
        if (key is null)
        {
            return null;
        }

        var value = table.Quantity(key, required: true, rule);
        return value is null ? null : new TimeQuantity(table.KeyPath(key), table.Entry(key)!.ValueLocation, value.Value, IsNs: key == nsKey);
    }
}
