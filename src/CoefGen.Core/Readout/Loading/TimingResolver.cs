using System.Globalization;

namespace CoefGen.Core.Readout.Loading;

/// <summary>
/// Turns the timing as written into samples at the ADC clock and checks the order of events in the cycle:
/// reset window, then the charge transfer, then the signal window, all inside the pixel cycle.
/// </summary>
internal static class TimingResolver
{
    /// <summary>Slack when comparing the transfer instant with window edges, in samples (absorbs ns-to-sample round-off).</summary>
    private const double EdgeToleranceSamples = 1e-9;

    public static TimingSpec? Resolve(TimingInput input, double? rateHz, bool poleGiven, LoadContext context)
    {
        var errorsBefore = context.ErrorCount;
        var step = ResolveStep(input, poleGiven, context);
        if (rateHz is null || step is null || input.Pixel is null || input.Transfer is null
            || input.ResetStart is null || input.ResetCount is null || input.SignalStart is null || input.SignalCount is null)
        {
            return null;
        }

        var rate = rateHz.Value;
        var rounding = new List<string>();
        var pixel = ToSamples(input.Pixel, rate, isStart: false, rounding, context);
        var transferSample = input.Transfer.IsNs ? input.Transfer.Value * rate / 1e9 : input.Transfer.Value;
        var transferTime = input.Transfer.IsNs ? input.Transfer.Value / 1e9 : input.Transfer.Value / rate;
        if (input.Transfer.IsNs)
        {
            rounding.Add($"{input.Transfer.Path} = {Ns(input.Transfer.Value)} ns -> sample {transferSample.ToString("0.######", CultureInfo.InvariantCulture)} (kept exact)");
        }

        var resetStart = ToSamples(input.ResetStart, rate, isStart: true, rounding, context);
        var resetCount = ToSamples(input.ResetCount, rate, isStart: false, rounding, context);
        var signalStart = ToSamples(input.SignalStart, rate, isStart: true, rounding, context);
        var signalCount = ToSamples(input.SignalCount, rate, isStart: false, rounding, context);
        if (pixel is null || resetStart is null || resetCount is null || signalStart is null || signalCount is null)
        {
            return null;
        }

        var reset = new SampleWindow(resetStart.Value, resetCount.Value);
        var signal = new SampleWindow(signalStart.Value, signalCount.Value);
        CheckInsideCycle("reset", reset, pixel.Value, input.ResetCount, context);
        CheckInsideCycle("signal", signal, pixel.Value, input.SignalCount, context);
        if (reset.Overlaps(signal))
        {
            context.Error(ReadoutCodes.WindowsOverlap, input.SignalStart.Location, input.SignalStart.Path,
                $"the signal window {Span(signal)} overlaps the reset window {Span(reset)}; the windows must be disjoint, reset first");
        }
        else if (signal.Start < reset.Start)
        {
            context.Error(ReadoutCodes.SignalBeforeReset, input.SignalStart.Location, input.SignalStart.Path,
                $"the signal window {Span(signal)} comes before the reset window {Span(reset)}; the reset window must come first");
        }
        else
        {
            CheckTransfer(input.Transfer, transferSample, reset, signal, context);
        }

        return context.ErrorCount > errorsBefore
            ? null
            : new TimingSpec(pixel.Value, transferTime, reset, signal, step.Value, rounding);
    }

    private static StepModel? ResolveStep(TimingInput input, bool poleGiven, LoadContext context)
    {
        if (input.Step == StepModel.Pole && !poleGiven)
        {
            context.Error(ReadoutCodes.PoleStepWithoutPole, input.StepLocation, "timing.step",
                "step = \"pole\" needs noise.front_end_pole_hz (the pole sets the settling); give the pole or use step = \"ideal\"");
            return null;
        }

        return input.Step ?? (poleGiven ? StepModel.Pole : StepModel.Ideal);
    }

    internal static int? ToSamples(TimeQuantity quantity, double rate, bool isStart, List<string> rounding, LoadContext context)
    {
        if (!quantity.IsNs)
        {
            return (int)quantity.Value;
        }

        var exact = quantity.Value * rate / 1e9;
        var samples = Math.Round(exact, MidpointRounding.AwayFromZero);
        if (samples > TimingSectionReader.MaxSamples)
        {
            context.Error(ReadoutCodes.OutOfRange, quantity.Location, quantity.Path,
                $"{Ns(quantity.Value)} ns is {exact.ToString("0.###", CultureInfo.InvariantCulture)} samples at the ADC clock; at most {TimingSectionReader.MaxSamples.ToString(CultureInfo.InvariantCulture)} samples are allowed");
            return null;
        }

        var n = (int)samples;
        var achievedNs = n * 1e9 / rate;
        var what = isStart ? $"sample {n.ToString(CultureInfo.InvariantCulture)}" : $"{n.ToString(CultureInfo.InvariantCulture)} samples";
        rounding.Add($"{quantity.Path} = {Ns(quantity.Value)} ns -> {what} ({Ns(achievedNs)} ns, {Signed(achievedNs - quantity.Value)} ns)");
        if (!isStart && n == 0)
        {
            var code = quantity.Path.EndsWith("count_ns", StringComparison.Ordinal) ? ReadoutCodes.WindowEmptyAfterRounding : ReadoutCodes.OutOfRange;
            context.Error(code, quantity.Location, quantity.Path,
                $"{Ns(quantity.Value)} ns is {exact.ToString("0.###", CultureInfo.InvariantCulture)} samples at the ADC clock and rounds to 0; give at least half a sample period ({Ns(0.5e9 / rate)} ns)");
            return null;
        }

        return n;
    }

    private static void CheckInsideCycle(string name, SampleWindow window, int pixel, TimeQuantity count, LoadContext context)
    {
        if (window.End > pixel)
        {
            context.Error(ReadoutCodes.WindowOutsideCycle, count.Location, count.Path,
                $"the {name} window {Span(window)} ends after the pixel cycle ({window.End.ToString(CultureInfo.InvariantCulture)} > {pixel.ToString(CultureInfo.InvariantCulture)} samples); it must end by sample {pixel.ToString(CultureInfo.InvariantCulture)}");
        }
    }

    private static void CheckTransfer(TimeQuantity transfer, double at, SampleWindow reset, SampleWindow signal, LoadContext context)
    {
        var position = at.ToString("0.######", CultureInfo.InvariantCulture);
        string? problem = null;
        if (at < reset.End - EdgeToleranceSamples)
        {
            problem = at >= reset.Start
                ? $"the charge transfer at sample {position} falls inside the reset window {Span(reset)}"
                : $"the charge transfer at sample {position} comes before the reset window {Span(reset)}";
        }
        else if (at > signal.Start + EdgeToleranceSamples)
        {
            problem = $"the charge transfer at sample {position} comes after the start of the signal window {Span(signal)}";
        }

        if (problem is not null)
        {
            context.Error(ReadoutCodes.TransferOutOfOrder, transfer.Location, transfer.Path,
                $"{problem}; it must lie from the end of the reset window (sample {reset.End.ToString(CultureInfo.InvariantCulture)}) to the start of the signal window (sample {signal.Start.ToString(CultureInfo.InvariantCulture)})");
        }
    }

    internal static string Span(SampleWindow w) =>
        $"(samples {w.Start.ToString(CultureInfo.InvariantCulture)}..{(w.End - 1).ToString(CultureInfo.InvariantCulture)})";

    internal static string Ns(double ns) => ns.ToString("0.###", CultureInfo.InvariantCulture);

    private static string Signed(double ns)
    {
        var rounded = Math.Round(ns, 3, MidpointRounding.AwayFromZero);
        return rounded < 0 ? "-" + Ns(-rounded) : "+" + Ns(rounded);
    }
}
