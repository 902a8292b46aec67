namespace CoefGen.Core.Readout.Loading;

/// <summary>Reads [timing], [timing.reset] and [timing.signal] as written (samples or nanoseconds).</summary>
internal static class TimingSectionReader
{
    /// <summary>Sample indices and counts stay far below int.MaxValue so that Start + Count cannot overflow.</summary>
    public const long MaxSamples = 1_000_000_000;

    private static readonly (string, StepModel)[] Steps = [("ideal", StepModel.Ideal), ("pole", StepModel.Pole)];

    public static TimingInput? Read(TableReader root)
    {
        var timing = root.Section("timing", required: true);
        if (timing is null)
        {
            return null;
        }

        timing.RejectUnknown("pixel_samples", "pixel_ns", "transfer_sample", "transfer_ns", "step", "reset", "signal");
        var pixel = Pair(timing, "pixel_samples", "pixel_ns", minSamples: 1, NumberRule.Positive);
        var transfer = Transfer(timing);
        var step = timing.Choice("step", Steps);
        var stepLocation = timing.Has("step") ? timing.Entry("step")!.ValueLocation : timing.Location;
        var (resetStart, resetCount) = Window(timing, "reset");
        var (signalStart, signalCount) = Window(timing, "signal");
        return new TimingInput(pixel, transfer, resetStart, resetCount, signalStart, signalCount, step, stepLocation);
    }

    private static (TimeQuantity? Start, TimeQuantity? Count) Window(TableReader timing, string name)
    {
        var window = timing.Section(name, required: true);
        if (window is null)
        {
            return (null, null);
        }

        window.RejectUnknown("start", "start_ns", "count", "count_ns");
        return (Pair(window, "start", "start_ns", minSamples: 0, NumberRule.NonNegative),
                Pair(window, "count", "count_ns", minSamples: 1, NumberRule.Positive));
    }

    internal static TimeQuantity? Pair(TableReader table, string samplesKey, string nsKey, long minSamples, NumberRule nsRule)
    {
        var key = table.OneOf(samplesKey, nsKey);
        if (key is null)
        {
            return null;
        }

        var location = table.Entry(key)!.ValueLocation;
        if (key == samplesKey)
        {
            var samples = table.Integer(key, required: true, minSamples, MaxSamples);
            return samples is null ? null : new TimeQuantity(table.KeyPath(key), location, samples.Value, IsNs: false);
        }

        var ns = table.Quantity(key, required: true, nsRule);
        return ns is null ? null : new TimeQuantity(table.KeyPath(key), location, ns.Value, IsNs: true);
    }

    private static TimeQuantity? Transfer(TableReader timing)
    {
        var key = timing.OneOf("transfer_sample", "transfer_ns");
        if (key is null)
        {
            return null;
        }

        var value = timing.Quantity(key, required: true, key == "transfer_ns" ? PhysicalRange.TransferNs : PhysicalRange.TransferSample);
        return value is null
            ? null
            : new TimeQuantity(timing.KeyPath(key), timing.Entry(key)!.ValueLocation, value.Value, IsNs: key == "transfer_ns");
    }
}
