using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Prediction;

/// <summary>
/// Ramp readouts: the weights depend on the signal level through the shot noise. For weights designed at the stated
/// level, their noise at every listed level next to the optimum re-designed at that level (dense solve each: the
/// shot term is not stationary).
/// </summary>
public static class SignalLevelTable
{
    public static IReadOnlyList<SignalLevelRow> Compute(SampleGrid grid, SampledCovariance covariance, ReadoutDescription d, IReadOnlyList<double> designed, bool rejectDrift)
    {
        ArgumentNullException.ThrowIfNull(covariance);
        ArgumentNullException.ThrowIfNull(designed);
        return AtEveryLevel(grid, d, shot =>
        {
            var r = covariance.WithShot(shot);
            return (r.QuadraticForm(designed), new DenseNullSpaceSolver().Solve(grid, r, rejectDrift).VarianceV2);
        });
    }

    /// <summary>
    /// The rows for any read-noise covariance: <paramref name="variances"/> gives, for the shot term of one level, the
    /// designed weights' variance and the optimum's there (V²).
    /// </summary>
    public static IReadOnlyList<SignalLevelRow> AtEveryLevel(SampleGrid grid, ReadoutDescription d, Func<ShotNoiseCovariance?, (double Designed, double Optimal)> variances)
    {
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(d);
        ArgumentNullException.ThrowIfNull(variances);
        var shot = d.Timing.Cycle.ShotNoise;
        if (shot is null)
        {
            return [];
        }

        var perElectron = d.Sensor.VoltsAtAdcPerElectron;
        var levels = shot.LevelsEPerS.Append(shot.PhotonFluxEPerS).Distinct().Order().ToList();
        var rows = new List<SignalLevelRow>(levels.Count);
        foreach (var level in levels)
        {
            var (designedV2, optimal) = variances(ShotNoiseCovariance.For(grid, d.Sensor, level + shot.DarkCurrentEPerS));
            rows.Add(new SignalLevelRow(
                level,
                Math.Sqrt(designedV2) / perElectron,
                Math.Sqrt(optimal) / perElectron,
                level == shot.PhotonFluxEPerS));
        }

        return rows;
    }
}
