using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Prediction;

/// <summary>Turns weights and the sampled noise covariance into read noise in V, ADU and electrons.</summary>
public static class NoisePredictor
{
    // The covariance's digital diagonal must be the ADC's quantisation + own noise; allow roundoff only.
    private const double DigitalMismatchTolerance = 1e-9;

    /// <summary>
    /// Predicts the noise of <paramref name="w"/>. <paramref name="frequencyDomainVariance"/>, when given,
    /// must return the analog part only, the integral of S(f) |H(f)|^2 df over f >= 0 with
    /// H(f) = sum h_k exp(-j 2 pi f t_k); the predictor adds sigma_d^2 sum h^2 before comparing it with
    /// h^T R h (PHYSICS.md §4, frequency-domain identity).
    /// </summary>
    public static NoisePrediction Predict(
        WeightSet w,
        SampledCovariance r,
        AdcSpec adc,
        SensorSpec sensor,
        Func<IReadOnlyList<double>, double>? frequencyDomainVariance)
    {
        ArgumentNullException.ThrowIfNull(w);
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(adc);
        ArgumentNullException.ThrowIfNull(sensor);
        var h = w.H;
        var expectedDigital = adc.DigitalVarianceV2;
        if (Math.Abs(r.DigitalVarianceV2 - expectedDigital) > DigitalMismatchTolerance * expectedDigital)
        {
            throw new ArgumentException("the covariance's digital variance does not match the ADC's quantisation and noise");
        }

        var sumSq = 0.0;
        foreach (var x in h)
        {
            sumSq += x * x;
        }

        var lsb2 = adc.LsbV * adc.LsbV;
        var parts = new List<(string Source, double Variance)>();
        var perComponent = r.ComponentQuadraticForms(h);
        for (var c = 0; c < r.Components.Count; c++)
        {
            parts.Add((r.Components[c].Name, perComponent[c]));
        }

        var shot = r.Shot?.QuadraticForm(h) ?? 0.0;
        if (r.Shot is not null)
        {
            parts.Add(("shot noise", shot));
        }

        parts.Add(("quantisation", lsb2 / 12.0 * sumSq));
        if (adc.NoiseLsb != 0)
        {
            parts.Add(("ADC noise", adc.NoiseLsb * adc.NoiseLsb * lsb2 * sumSq));
        }

        var budgetTotal = parts.Sum(p => p.Variance);
        var budget = parts
            .Select(p => new NoiseBudgetEntry(p.Source, p.Variance, budgetTotal > 0 ? p.Variance / budgetTotal : 0))
            .ToArray();

        var variance = perComponent.Sum() + r.DigitalPart(h) + shot;
        var sigma = Math.Sqrt(Math.Max(0, variance));
        double? fd = null;
        double? agreement = null;
        if (frequencyDomainVariance is not null)
        {
            fd = frequencyDomainVariance(h) + r.DigitalPart(h);
            agreement = Math.Abs(fd.Value - variance) / variance;
        }

        return new NoisePrediction(
            w.Scheme,
            w.Label,
            variance,
            sigma,
            sigma / adc.LsbV,
            sigma / sensor.VoltsAtAdcPerElectron,
            budget,
            fd,
            agreement);
    }
}
