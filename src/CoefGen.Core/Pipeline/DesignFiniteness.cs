using CoefGen.Core.Diagnostics;
using CoefGen.Core.FixedPoint;

namespace CoefGen.Core.Pipeline;

/// <summary>
/// The last gate of a design: every weight, prediction and datapath figure must be a finite number. The loader's
/// ranges are meant to make this unreachable; if a combination still overflows, the user gets a located error
/// (CG2030) instead of an Infinity in JSON or a "SAFE" beside a meaningless design.
/// </summary>
public static class DesignFiniteness
{
    public static void ThrowIfNotFinite(DesignResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var bad = Quantities(result).Where(q => !double.IsFinite(q.Value)).Select(q => q.Name).Distinct().ToList();
        if (bad.Count > 0)
        {
            throw new InputException(Diagnostic.Error(FixedPointCodes.NotFinite, result.Description.LocationOf("adc"),
                $"the design is not computable in double precision ({string.Join(", ", bad)} not finite); the readout's numbers combine to an overflow or underflow: check adc.full_scale_v, sensor.conversion_gain_uv_per_e, the gain and the noise levels"));
        }
    }

    private static IEnumerable<(string Name, double Value)> Quantities(DesignResult r)
    {
        foreach (var w in r.Weights)
        {
            foreach (var v in w.H)
            {
                yield return ($"{w.Label} weights", v);
            }
        }

        foreach (var p in r.Predictions)
        {
            yield return ($"{p.Label} variance", p.VarianceV2);
            yield return ($"{p.Label} noise in V", p.SigmaV);
            yield return ($"{p.Label} noise in ADU", p.SigmaAdu);
            yield return ($"{p.Label} noise in electrons", p.SigmaElectrons);
            yield return ($"{p.Label} frequency-domain check", p.FrequencyDomainVarianceV2 ?? 0);
            yield return ($"{p.Label} frequency-domain difference", p.FrequencyDomainRelativeDifference ?? 0);
            foreach (var b in p.Budget)
            {
                yield return ($"{p.Label} budget '{b.Source}'", b.VarianceV2);
                yield return ($"{p.Label} budget '{b.Source}' share", b.Share);
            }
        }

        if (r.HasFullDatapath)
        {
            var i = r.Datapath;
            yield return ("gain error", i.GainErrorPpm);
            yield return ("noise penalty", i.NoisePenaltyPercent);
            yield return ("predicted output noise", i.PredictedNoiseOutputLsb);
        }

        if (r.TwoStage is { } two)
        {
            yield return ("two-stage variance", two.Real.VarianceV2);
            yield return ("two-stage gain error", two.Quantised.GainErrorPpm);
            yield return ("two-stage noise penalty", two.Quantised.NoisePenaltyPercent);
        }
    }
}
