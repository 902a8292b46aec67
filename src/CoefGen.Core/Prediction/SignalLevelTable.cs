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
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(covariance);
        ArgumentNullException.ThrowIfNull(d);
        ArgumentNullException.ThrowIfNull(designed);
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
            var r = covariance.WithShot(ShotNoiseCovariance.For(grid, d.Sensor, level + shot.DarkCurrentEPerS));
            var optimal = new DenseNullSpaceSolver().Solve(grid, r, rejectDrift).VarianceV2;
            rows.Add(new SignalLevelRow(
                level,
                Math.Sqrt(r.QuadraticForm(designed)) / perElectron,
                Math.Sqrt(optimal) / perElectron,
                level == shot.PhotonFluxEPerS));
        }

        return rows;
    }
}
