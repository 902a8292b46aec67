using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Noise;

/// <summary>
/// Shot noise of the integrating charge on ramp samples (PHYSICS.md §4b): K_ij = F min(tau_i, tau_j) for ramp samples
/// i, j of the same reset group, tau the integration time since the start, F the variance rate in V^2/s at the ADC
/// (electrons per second times the squared volts per electron). Not stationary, so it is kept apart from the lag
/// tables: h^T K h = F * integral over u of (sum of h_i with tau_i > u)^2 du, exact in one pass per group.
/// </summary>
public sealed class ShotNoiseCovariance
{
    private readonly double[] _tau;
    private readonly int[] _group;

    private ShotNoiseCovariance(double[] tau, int[] group, double rateV2PerS)
    {
        _tau = tau;
        _group = group;
        RateV2PerS = rateV2PerS;
    }

    /// <summary>Variance rate F in V^2/s at the ADC input.</summary>
    public double RateV2PerS { get; }

    /// <summary>The shot term of a cycle's ramp samples at a total charge rate in e-/s; null when the grid has no ramp samples.</summary>
    public static ShotNoiseCovariance? For(SampleGrid grid, SensorSpec sensor, double electronsPerS)
    {
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(sensor);
        if (!grid.ExposureS.Any(double.IsFinite))
        {
            return null;
        }

        var v = sensor.VoltsAtAdcPerElectron;
        return new ShotNoiseCovariance([.. grid.ExposureS], [.. grid.Group], electronsPerS * v * v);
    }

    /// <summary>The same samples at another variance rate.</summary>
    public ShotNoiseCovariance WithRate(double rateV2PerS) => new(_tau, _group, rateV2PerS);

    public double At(int i, int j)
    {
        if (_group[i] != _group[j] || !double.IsFinite(_tau[i]) || !double.IsFinite(_tau[j]))
        {
            return 0.0;
        }

        return RateV2PerS * Math.Min(_tau[i], _tau[j]);
    }

    /// <summary>h^T K h. Grid order is time order, so tau increases along each group's ramp samples.</summary>
    public double QuadraticForm(IReadOnlyList<double> h)
    {
        ArgumentNullException.ThrowIfNull(h);
        if (h.Count != _tau.Length)
        {
            throw new ArgumentException($"weight vector has {h.Count} entries, shot term {_tau.Length}");
        }

        // Walk backwards: tail[g] = sum of h over the ramp samples of group g seen so far (the later ones).
        var tail = new Dictionary<int, (double Sum, double Tau)>();
        var total = 0.0;
        for (var i = h.Count - 1; i >= 0; i--)
        {
            if (!double.IsFinite(_tau[i]))
            {
                continue;
            }

            if (tail.TryGetValue(_group[i], out var t))
            {
                total += t.Sum * t.Sum * (t.Tau - _tau[i]);
                tail[_group[i]] = (t.Sum + h[i], _tau[i]);
            }
            else
            {
                tail[_group[i]] = (h[i], _tau[i]);
            }
        }

        foreach (var (sum, tau) in tail.Values)
        {
            total += sum * sum * tau;
        }

        return total * RateV2PerS;
    }

    /// <summary>
    /// Adds one draw of the shot noise (V) to <paramref name="destination"/>: per reset group a random walk in time
    /// order with independent Gaussian increments of variance F * (tau_i - tau_previous), from the integration start.
    /// </summary>
    public void AddDraw(Func<double> standardNormal, double[] destination)
    {
        ArgumentNullException.ThrowIfNull(standardNormal);
        ArgumentNullException.ThrowIfNull(destination);
        var walk = new Dictionary<int, (double Value, double Tau)>();
        for (var i = 0; i < _tau.Length; i++)
        {
            if (!double.IsFinite(_tau[i]))
            {
                continue;
            }

            var (value, tau) = walk.GetValueOrDefault(_group[i], (0.0, 0.0));
            value += Math.Sqrt(RateV2PerS * Math.Max(0, _tau[i] - tau)) * standardNormal();
            walk[_group[i]] = (value, _tau[i]);
            destination[i] += value;
        }
    }
}
