using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Noise;

/// <summary>
/// The noise of one readout channel at the ADC input: stationary analog components plus the white
/// digital variance per sample (quantisation LSB²/12 and the ADC's own noise).
/// </summary>
public sealed class NoiseModel
{
    public NoiseModel(IReadOnlyList<NoiseComponent> components, double digitalVarianceV2)
    {
        ArgumentNullException.ThrowIfNull(components);
        if (!(digitalVarianceV2 >= 0) || double.IsInfinity(digitalVarianceV2))
        {
            throw new ArgumentException("digital variance must be finite and >= 0", nameof(digitalVarianceV2));
        }

        Components = [.. components];
        DigitalVarianceV2 = digitalVarianceV2;
    }

    public IReadOnlyList<NoiseComponent> Components { get; }

    /// <summary>σ_d² in V² per sample.</summary>
    public double DigitalVarianceV2 { get; }

    /// <summary>
    /// Builds the model of a validated description. Each source gives "&lt;name&gt; white" (S = e²) and
    /// "&lt;name&gt; 1/f" (S = e²·f_c/f from the low cutoff), both shaped by the front-end pole and the
    /// bandwidth limit; a source at the sensor is scaled by |gain|². The measured table, already at the
    /// ADC input, is used as given (no extra shaping). Zero components are skipped.
    /// </summary>
    public static NoiseModel FromDescription(ReadoutDescription d)
    {
        ArgumentNullException.ThrowIfNull(d);
        var noise = d.Noise;
        var components = new List<NoiseComponent>();
        foreach (var source in noise.Sources)
        {
            var e = source.WhiteNvPerRtHz * 1e-9 * (source.At == NoiseReference.Sensor ? Math.Abs(d.Sensor.Gain) : 1.0);
            var e2 = e * e;
            if (e2 > 0)
            {
                components.Add(ParametricNoiseComponent.White(source.Name + " white", e2, noise.FrontEndPoleHz, noise.BandwidthHz));
            }

            if (e2 > 0 && source.FlickerCornerHz > 0)
            {
                components.Add(ParametricNoiseComponent.Flicker(
                    source.Name + " 1/f", e2 * source.FlickerCornerHz, source.LowCutoffHz, noise.FrontEndPoleHz, noise.BandwidthHz));
            }
        }

        if (noise.Table is { } table && table.DensityV2PerHz.Any(s => s > 0))
        {
            components.Add(MeasuredPsdComponent.FromTable(table));
        }

        return new NoiseModel(components, d.Adc.DigitalVarianceV2);
    }

    /// <summary>
    /// The covariance at the grid's sample instants: per component, Lag[k] = Covariance(k / rate) for
    /// k = 0..(last index - first index). Memory is one value per lag.
    /// </summary>
    public SampledCovariance Sample(SampleGrid grid)
    {
        ArgumentNullException.ThrowIfNull(grid);
        var index = grid.SampleIndex;
        var count = index.Count == 0 ? 1 : index[^1] - index[0] + 1;
        var sampled = new List<CovarianceComponent>(Components.Count);
        foreach (var c in Components)
        {
            sampled.Add(new CovarianceComponent(c.Name, c.LagTable(grid.RateHz, count)));
        }

        return new SampledCovariance(index, sampled, DigitalVarianceV2);
    }
}
