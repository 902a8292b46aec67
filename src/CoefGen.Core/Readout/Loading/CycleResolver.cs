using System.Globalization;
using CoefGen.Core.Diagnostics;

namespace CoefGen.Core.Readout.Loading;

/// <summary>
/// Turns a general cycle as written into samples at the ADC clock, expands the repetition and checks the cycle:
/// windows inside the pixel cycle and disjoint, every charge window after its transfer, every ramp window after the
/// integration start, reset groups numbered 0 .. G-1 with a window each, the repetition inside the cycle.
/// </summary>
internal static class CycleResolver
{
    /// <summary>Slack when comparing an instant with a window edge, in samples (absorbs ns-to-sample round-off).</summary>
    private const double EdgeToleranceSamples = 1e-9;

    /// <summary>Upper bound on the expanded window count (a repetition of 10^6 is already far beyond any readout).</summary>
    private const long MaxWindows = 4_000_000;

    /// <summary>A window with where it came from; ChargeSample is the transfer instant in (fractional) samples, so that copies shift exactly.</summary>
    private sealed record Placed(CycleWindow Window, CycleWindowInput Source, int Copy, SourceLocation StartLocation, string StartPath, double ChargeSample);

    public static TimingSpec? Resolve(CycleInput input, double? rateHz, bool poleGiven, LoadContext context)
    {
        var errorsBefore = context.ErrorCount;
        if (input.Step == StepModel.Pole && !poleGiven)
        {
            context.Error(ReadoutCodes.PoleStepWithoutPole, input.StepLocation, "timing.step",
                "step = \"pole\" needs noise.front_end_pole_hz (the pole sets the settling); give the pole or use step = \"ideal\"");
        }

        if (input.Windows.Count == 0)
        {
            context.Error(ReadoutCodes.MissingKey, input.TimingLocation, "timing.window", "[[timing.window]] lists no window");
        }

        if (!input.Valid || rateHz is null || input.Pixel is null || context.ErrorCount > errorsBefore)
        {
            return null;
        }

        var rate = rateHz.Value;
        var step = input.Step ?? (poleGiven ? StepModel.Pole : StepModel.Ideal);
        var rounding = new List<string>();
        var pixel = TimingResolver.ToSamples(input.Pixel, rate, isStart: false, rounding, context);
        var integration = ResolveIntegration(input, rate, rounding, context);
        var originals = new List<Placed>();
        foreach (var w in input.Windows)
        {
            var start = TimingResolver.ToSamples(w.Start!, rate, isStart: true, rounding, context);
            var count = TimingResolver.ToSamples(w.Count!, rate, isStart: false, rounding, context);
            var chargeTime = ChargeTime(w, integration?.StartS, rate, rounding, context);
            if (start is null || count is null || chargeTime is null)
            {
                continue;
            }

            var window = new CycleWindow(w.Name, new SampleWindow(start.Value, count.Value), w.Sees!.Value, chargeTime.Value, w.Group!.Value, 0);
            var chargeSample = w.Transfer is null ? 0.0 : w.Transfer.IsNs ? w.Transfer.Value * rate / 1e9 : w.Transfer.Value;
            originals.Add(new Placed(window, w, 0, w.Start!.Location, w.Start!.Path, chargeSample));
        }

        if (pixel is null || context.ErrorCount > errorsBefore)
        {
            return null;
        }

        CheckGroupsNumbered(input.Windows, context);
        CheckIntegrationUse(input, context);
        var placed = Expand(originals, input.Repeat, pixel.Value, rate, rounding, context);
        if (placed is null || context.ErrorCount > errorsBefore)
        {
            return null;
        }

        placed = [.. placed.OrderBy(p => p.Window.Samples.Start).ThenBy(p => p.Window.Samples.Count)];
        // One message per window as written: a repeated window's copies share its problem.
        var reported = new HashSet<CycleWindowInput>(ReferenceEqualityComparer.Instance);
        foreach (var p in placed)
        {
            var before = context.ErrorCount;
            if (!reported.Contains(p.Source))
            {
                CheckPlacement(p, pixel.Value, rate, context);
            }

            if (context.ErrorCount > before)
            {
                reported.Add(p.Source);
            }
        }

        for (var i = 1; i < placed.Count; i++)
        {
            var (a, b) = (placed[i - 1], placed[i]);
            if (a.Window.Samples.Overlaps(b.Window.Samples))
            {
                context.Error(ReadoutCodes.WindowsOverlap, b.StartLocation, b.StartPath,
                    $"window '{b.Window.Name}' {TimingResolver.Span(b.Window.Samples)} overlaps window '{a.Window.Name}' {TimingResolver.Span(a.Window.Samples)}; the windows of a cycle must be disjoint");
                break;
            }
        }

        if (!placed.Any(p => p.Window.Sees != ChargeSight.None))
        {
            context.Error(CycleCodes.NoChargeWindow, input.TimingLocation, "timing.window",
                "no window sees the charge; give at least one window with sees = \"charge\" (after a transfer) or sees = \"ramp\"");
        }

        if (context.ErrorCount > errorsBefore)
        {
            return null;
        }

        var windows = Renumber(placed);
        var groups = windows.Max(w => w.ResetGroup) + 1;
        var transfer = windows.FirstOrDefault(w => w.Sees == ChargeSight.Transfer)?.ChargeTimeS ?? 0.0;
        var cycle = new CycleSpec(windows, groups, integration?.ReferenceS, integration?.Shot, input.Repeat?.Times ?? 1);
        return new TimingSpec(pixel.Value, transfer, cycle, step, rounding);
    }

    private sealed record Integration(double StartS, double ReferenceS, ShotNoiseSpec Shot);

    private static Integration? ResolveIntegration(CycleInput input, double rate, List<string> rounding, LoadContext context)
    {
        var i = input.Integration;
        if (i is null || !i.Valid || i.Start is null || i.Reference is null)
        {
            return null;
        }

        var start = Seconds(i.Start, rate, rounding);
        var reference = Seconds(i.Reference, rate, rounding);
        var shot = new ShotNoiseSpec(i.PhotonFlux ?? 0, i.DarkCurrent ?? 0, i.Levels ?? []);
        return new Integration(start, reference, shot);
    }

    /// <summary>An instant kept exact (not rounded to a sample), as the transfer instant of a classic file.</summary>
    private static double Seconds(TimeQuantity q, double rate, List<string> rounding)
    {
        if (!q.IsNs)
        {
            return q.Value / rate;
        }

        var samples = q.Value * rate / 1e9;
        rounding.Add($"{q.Path} = {TimingResolver.Ns(q.Value)} ns -> sample {samples.ToString("0.######", CultureInfo.InvariantCulture)} (kept exact)");
        return q.Value / 1e9;
    }

    private static double? ChargeTime(CycleWindowInput w, double? integrationStartS, double rate, List<string> rounding, LoadContext context)
    {
        switch (w.Sees)
        {
            case ChargeSight.Transfer:
                if (w.Transfer is null)
                {
                    context.Error(ReadoutCodes.MissingKey, w.SeesLocation, w.Path + ".transfer_sample",
                        $"window '{w.Name}' sees the charge, so it needs the instant of its transfer: 'transfer_sample' or 'transfer_ns'");
                    return null;
                }

                return Seconds(w.Transfer, rate, rounding);
            case ChargeSight.Ramp:
                if (w.Transfer is not null)
                {
                    TransferNotAllowed(w, "a ramp window integrates from [integration] start_*", context);
                    return null;
                }

                return integrationStartS ?? 0.0; // a missing [integration] is reported once, by CheckIntegrationUse
            case ChargeSight.None:
                if (w.Transfer is not null)
                {
                    TransferNotAllowed(w, "a window with sees = \"reset\" sees no charge", context);
                    return null;
                }

                return 0.0;
            default:
                return null;
        }
    }

    private static void TransferNotAllowed(CycleWindowInput w, string why, LoadContext context) =>
        context.Error(ReadoutCodes.UnknownKey, w.Transfer!.Location, w.Transfer.Path,
            $"'{w.Transfer.Path}' is not allowed in window '{w.Name}': {why}; remove it or set sees = \"charge\"");

    private static void CheckGroupsNumbered(IReadOnlyList<CycleWindowInput> windows, LoadContext context)
    {
        var used = windows.Where(w => w.Group is not null).Select(w => w.Group!.Value).ToHashSet();
        if (used.Count == 0)
        {
            return;
        }

        var max = used.Max();
        for (var g = 0; g < max; g++)
        {
            if (!used.Contains(g))
            {
                var highest = windows.First(w => w.Group == max);
                context.Error(CycleCodes.ResetGroupWithoutWindow, highest.GroupLocation, highest.Path + ".group",
                    $"reset group {g.ToString(CultureInfo.InvariantCulture)} has no window (groups are numbered 0 .. {max.ToString(CultureInfo.InvariantCulture)} here); number the reset groups 0, 1, 2, ... without gaps");
                return;
            }
        }
    }

    private static void CheckIntegrationUse(CycleInput input, LoadContext context)
    {
        var ramp = input.Windows.FirstOrDefault(w => w.Sees == ChargeSight.Ramp);
        if (ramp is not null && input.Integration is null)
        {
            context.Error(CycleCodes.IntegrationMismatch, ramp.SeesLocation, ramp.Path + ".sees",
                $"window '{ramp.Name}' is a ramp, so the file needs [integration] with start_sample (or start_ns: when the charge starts to integrate) and reference_samples (or reference_ns: the estimate is the charge collected in this time)");
        }
        else if (ramp is null && input.Integration is not null)
        {
            context.Error(CycleCodes.IntegrationMismatch, input.Integration.Location, "integration",
                "[integration] applies to ramp windows (sees = \"ramp\") and there are none; remove it or make the integrating windows ramps");
        }
    }

    /// <summary>The originals plus Times - 1 shifted copies of the repeated group's windows.</summary>
    private static List<Placed>? Expand(List<Placed> originals, RepeatInput? repeat, int pixel, double rate, List<string> rounding, LoadContext context)
    {
        if (repeat is null)
        {
            return originals;
        }

        if (repeat.Group is null || repeat.Times is null || repeat.Every is null)
        {
            return null;
        }

        var every = TimingResolver.ToSamples(repeat.Every, rate, isStart: false, rounding, context);
        if (every is null)
        {
            return null;
        }

        var group = repeat.Group.Value;
        var members = originals.Where(p => p.Window.ResetGroup == group).ToList();
        if (members.Count == 0)
        {
            context.Error(CycleCodes.RepeatUnknownGroup, repeat.GroupLocation, "timing.repeat.group",
                $"[timing.repeat] repeats reset group {group.ToString(CultureInfo.InvariantCulture)}, which has no window; name a group that [[timing.window]] uses");
            return null;
        }

        var times = repeat.Times.Value;
        var end = members.Max(p => p.Window.Samples.End);
        var lastEnd = end + ((long)(times - 1) * every.Value);
        if (lastEnd > pixel)
        {
            var fit = 1 + ((pixel - end) / every.Value);
            context.Error(CycleCodes.RepeatPastCycle, repeat.TimesLocation, "timing.repeat.times",
                $"the repetition runs past the pixel cycle: copy {times.ToString(CultureInfo.InvariantCulture)} of group {group.ToString(CultureInfo.InvariantCulture)} ends at sample {lastEnd.ToString(CultureInfo.InvariantCulture)} > {pixel.ToString(CultureInfo.InvariantCulture)}; at most {Math.Max(0, fit).ToString(CultureInfo.InvariantCulture)} copies fit every {every.Value.ToString(CultureInfo.InvariantCulture)} samples");
            return null;
        }

        if ((long)times * originals.Count > MaxWindows)
        {
            context.Error(ReadoutCodes.OutOfRange, repeat.TimesLocation, "timing.repeat.times",
                $"the repetition gives {((long)times * originals.Count).ToString(CultureInfo.InvariantCulture)} windows; at most {MaxWindows.ToString(CultureInfo.InvariantCulture)} are supported");
            return null;
        }

        var result = new List<Placed>(originals.Count + ((times - 1) * members.Count));
        result.AddRange(originals.Select(p => p.Window.ResetGroup == group ? p with { Window = p.Window with { Read = 0 } } : p));
        var everyPath = repeat.Every.Path;
        for (var k = 1; k < times; k++)
        {
            var shift = (long)k * every.Value;
            foreach (var m in members)
            {
                var w = m.Window;
                var chargeTime = w.Sees == ChargeSight.Transfer ? (m.ChargeSample + shift) / rate : w.ChargeTimeS;
                var copy = w with
                {
                    Name = string.Create(CultureInfo.InvariantCulture, $"{w.Name}#{k}"),
                    Samples = new SampleWindow(w.Samples.Start + (int)shift, w.Samples.Count),
                    ChargeTimeS = chargeTime,
                    Read = k,
                };
                result.Add(new Placed(copy, m.Source, repeat.NewGroup ? k : 0, repeat.Every.Location, everyPath, m.ChargeSample + shift));
            }
        }

        return result;
    }

    private static void CheckPlacement(Placed p, int pixel, double rate, LoadContext context)
    {
        var w = p.Window;
        if (w.Samples.End > pixel)
        {
            context.Error(ReadoutCodes.WindowOutsideCycle, p.Copy == 0 ? p.Source.Count!.Location : p.StartLocation, p.Copy == 0 ? p.Source.Count!.Path : p.StartPath,
                $"window '{w.Name}' {TimingResolver.Span(w.Samples)} ends after the pixel cycle ({w.Samples.End.ToString(CultureInfo.InvariantCulture)} > {pixel.ToString(CultureInfo.InvariantCulture)} samples)");
        }

        if (w.Sees == ChargeSight.None)
        {
            return;
        }

        var at = w.ChargeTimeS * rate;
        if (w.Samples.Start < at - EdgeToleranceSamples)
        {
            var what = w.Sees == ChargeSight.Transfer ? "its transfer" : "the integration start";
            var key = w.Sees == ChargeSight.Transfer ? p.Source.Transfer!.Path : p.StartPath;
            var location = w.Sees == ChargeSight.Transfer ? p.Source.Transfer!.Location : p.StartLocation;
            context.Error(CycleCodes.WindowBeforeCharge, location, key,
                $"window '{w.Name}' {TimingResolver.Span(w.Samples)} starts before {what} at sample {at.ToString("0.######", CultureInfo.InvariantCulture)}; a window that sees the charge must start at or after it");
        }
    }

    /// <summary>Group ids in time order of first appearance: copy k of a new-group repetition gets its own groups.</summary>
    private static List<CycleWindow> Renumber(List<Placed> placed)
    {
        var ids = new Dictionary<(int Copy, int Group), int>();
        var result = new List<CycleWindow>(placed.Count);
        foreach (var p in placed)
        {
            var key = (p.Copy, p.Window.ResetGroup);
            if (!ids.TryGetValue(key, out var id))
            {
                ids[key] = id = ids.Count;
            }

            result.Add(p.Window with { ResetGroup = id });
        }

        return result;
    }
}
