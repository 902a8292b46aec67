using System.Globalization;

namespace CoefGen.Core.Readout.Loading;

/// <summary>
/// What [weights] form = "two-stage" allows, checked where the file alone decides it: a cycle with a repetition of
/// N >= 2 reads, the optimal scheme, no drift rejection. Whether the reads are identical sample for sample (and free of
/// shot noise) is checked on the sample grid by the pipeline (CG1270, CG1272 there).
/// </summary>
internal static class TwoStageRules
{
    public static void Check(TableReader weights, TimingSpec? timing, WeightScheme scheme, bool rejectDrift)
    {
        var context = weights.Context;
        var at = weights.Entry("form")!.ValueLocation;
        var path = weights.KeyPath("form");
        if (timing is not null && (timing.Cycle.IsClassic || timing.Cycle.RepeatCount < 2))
        {
            var has = timing.Cycle.IsClassic
                ? "this file has the classic two-window timing"
                : "this cycle has no [timing.repeat] with times >= 2";
            context.Error(TwoStageCodes.NotIdenticalReads, at, path,
                $"form = \"two-stage\" needs a cycle of N >= 2 identical reads ([[timing.window]] with [timing.repeat] covering every window); {has}; use form = \"full\"");
        }

        if (scheme != WeightScheme.Optimal)
        {
            context.Error(TwoStageCodes.SchemeNotOptimal, at, path,
                $"form = \"two-stage\" is the joint optimum of a per-read table and read weights, so it takes scheme = \"optimal\" only (this file chose \"{scheme.ToString().ToLower(CultureInfo.InvariantCulture)}\"); set scheme = \"optimal\" or form = \"full\"");
        }

        if (rejectDrift)
        {
            context.Error(TwoStageCodes.WithDriftRejection, at, path,
                "form = \"two-stage\" cannot reject drift (a slope across the reads is not a per-read table times read weights); set reject_drift = false or form = \"full\"");
        }
    }
}
