using System.Globalization;

namespace CoefGen.Core.Readout.Loading;

/// <summary>Reads [weights]; explicit shapes are checked against the window lengths when the timing is known.</summary>
internal static class WeightsSectionReader
{
    private static readonly (string, WeightScheme)[] Schemes =
        [("boxcar", WeightScheme.Boxcar), ("weighted", WeightScheme.Weighted), ("optimal", WeightScheme.Optimal), ("robust", WeightScheme.Robust)];

    private static readonly (string, WindowShape)[] Windows =
        [("triangle", WindowShape.Triangle), ("hann", WindowShape.Hann), ("trapezoid", WindowShape.Trapezoid), ("explicit", WindowShape.Explicit)];

    private static readonly (string, WeightsForm)[] Forms = [("full", WeightsForm.Full), ("two-stage", WeightsForm.TwoStage)];

    private static readonly string[] ShapeKeys = ["reset", "signal"];

    /// <summary>The defaults when [weights] is absent: optimal, trapezoid with an automatic ramp, no drift rejection.</summary>
    public static readonly WeightsSpec Defaults = new(WeightScheme.Optimal, WindowShape.Trapezoid, 0, null, null, false);

    public static WeightsSpec? Read(TableReader root, TimingSpec? timing)
    {
        var weights = root.Section("weights", required: false);
        if (weights is null)
        {
            return root.Has("weights") ? null : Defaults;
        }

        var context = root.Context;
        var errorsBefore = context.ErrorCount;
        weights.RejectUnknown("scheme", "window", "ramp_samples", "reset", "signal", "reject_drift", "form");
        var scheme = weights.Choice("scheme", Schemes);
        var window = weights.Choice("window", Windows);
        var ramp = weights.Integer("ramp_samples", required: false, 1, TimingSectionReader.MaxSamples);
        var rejectDrift = weights.Flag("reject_drift");
        var reset = weights.NumberArray("reset", PhysicalRange.ShapeWeight);
        var signal = weights.NumberArray("signal", PhysicalRange.ShapeWeight);
        var form = weights.Choice("form", Forms);
        if (form == WeightsForm.TwoStage)
        {
            TwoStageRules.Check(weights, timing, scheme ?? WeightScheme.Optimal, rejectDrift ?? false);
        }

        var twoWindow = timing?.Cycle.AsTwoWindow();
        if (window == WindowShape.Explicit && timing is not null && twoWindow is null)
        {
            context.Error(CycleCodes.TwoWindowOnly, weights.Entry("window")!.ValueLocation, weights.KeyPath("window"),
                "window = \"explicit\" gives one reset and one signal shape, which applies to a classic two-window timing; with [[timing.window]] use \"triangle\", \"hann\" or \"trapezoid\" (applied to every window)");
        }
        else if (window == WindowShape.Explicit)
        {
            CheckShape(weights, "reset", reset, twoWindow?.Reset.Count);
            CheckShape(weights, "signal", signal, twoWindow?.Signal.Count);
        }
        else if (!weights.Has("window") || window is not null)
        {
            foreach (var key in ShapeKeys.Where(weights.Has))
            {
                context.Error(ReadoutCodes.ShapeWithoutExplicit, weights.Entry(key)!.KeyLocation, weights.KeyPath(key),
                    $"'{key}' gives an explicit window shape, which only applies with window = \"explicit\"; set window = \"explicit\" or remove '{key}'");
            }
        }

        return context.ErrorCount > errorsBefore
            ? null
            : new WeightsSpec(scheme ?? WeightScheme.Optimal, window ?? WindowShape.Trapezoid, (int)(ramp ?? 0), reset, signal, rejectDrift ?? false) { Form = form ?? WeightsForm.Full };
    }

    private static void CheckShape(TableReader weights, string key, IReadOnlyList<double>? shape, int? count)
    {
        var context = weights.Context;
        if (!weights.Has(key))
        {
            var location = weights.Entry("window")!.ValueLocation;
            context.Error(ReadoutCodes.ExplicitShape, location, weights.KeyPath(key),
                $"window = \"explicit\" needs '{key}' in [weights]: an array of non-negative numbers, one per {key} sample");
            return;
        }

        if (shape is null)
        {
            return; // element problems already reported
        }

        var valueLocation = weights.Entry(key)!.ValueLocation;
        if (count is not null && shape.Count != count)
        {
            context.Error(ReadoutCodes.ExplicitShape, valueLocation, weights.KeyPath(key),
                $"'{key}' has {shape.Count.ToString(CultureInfo.InvariantCulture)} values but the {key} window has {count.Value.ToString(CultureInfo.InvariantCulture)} samples; give one value per sample");
        }
        else if (shape.All(v => v == 0))
        {
            context.Error(ReadoutCodes.ExplicitShape, valueLocation, weights.KeyPath(key),
                $"'{key}' is all zero; an explicit shape needs at least one positive value");
        }
    }
}
