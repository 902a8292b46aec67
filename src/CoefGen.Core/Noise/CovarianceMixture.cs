namespace CoefGen.Core.Noise;

/// <summary>
/// The weighted sum sum_i lambda_i C_i of covariances sampled at the same instants with the same digital
/// variance (noise scenarios of one readout). With sum lambda = 1 the digital diagonal is unchanged.
/// </summary>
public static class CovarianceMixture
{
    /// <summary>One analog component, "scenario mixture", whose lags are sum_i lambda_i TotalLag_i.</summary>
    public static SampledCovariance Mix(IReadOnlyList<SampledCovariance> scenarios, IReadOnlyList<double> lambda)
    {
        ArgumentNullException.ThrowIfNull(scenarios);
        ArgumentNullException.ThrowIfNull(lambda);
        if (scenarios.Count == 0 || lambda.Count != scenarios.Count)
        {
            throw new ArgumentException("one weight per scenario, at least one scenario");
        }

        var first = scenarios[0];
        var lags = new double[first.TotalLag.Length];
        var total = 0.0;
        for (var s = 0; s < scenarios.Count; s++)
        {
            var c = scenarios[s];
            if (c.Count != first.Count || c.TotalLag.Length != lags.Length || !c.SampleIndex.SequenceEqual(first.SampleIndex))
            {
                throw new ArgumentException("scenario covariances must be sampled at the same instants");
            }

            if (!(lambda[s] >= 0))
            {
                throw new ArgumentException("scenario weights must be >= 0");
            }

            total += lambda[s];
            for (var k = 0; k < lags.Length; k++)
            {
                lags[k] += lambda[s] * c.TotalLag[k];
            }
        }

        var digital = 0.0;
        for (var s = 0; s < scenarios.Count; s++)
        {
            digital += lambda[s] * scenarios[s].DigitalVarianceV2;
        }

        // A shot term (non-stationary, outside the lag tables) is the same in every scenario: with sum lambda = 1 the
        // mixture's share of it is the term itself.
        if (scenarios.Any(c => !ReferenceEquals(c.Shot, first.Shot)))
        {
            throw new ArgumentException("scenario covariances must share one shot-noise term");
        }

        return new SampledCovariance(first.SampleIndex, [new CovarianceComponent("scenario mixture", lags)], total > 0 ? digital : first.DigitalVarianceV2)
            .WithShot(first.Shot);
    }
}
