using CoefGen.Core.Noise;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Pipeline;

/// <summary>Adds the shot noise of a cycle's integrating charge (at the stated signal level) to the sampled covariance.</summary>
public static class CycleNoise
{
    public static SampledCovariance WithShot(SampledCovariance covariance, SampleGrid grid, ReadoutDescription d)
    {
        ArgumentNullException.ThrowIfNull(covariance);
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(d);
        return ShotOf(grid, d) is { } shot ? covariance.WithShot(shot) : covariance;
    }

    /// <summary>The shot-noise term of the cycle's integrating charge, or null without one.</summary>
    public static ShotNoiseCovariance? ShotOf(SampleGrid grid, ReadoutDescription d)
    {
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(d);
        var shot = d.Timing.Cycle.ShotNoise;
        return shot is null || !(shot.TotalEPerS > 0) ? null : ShotNoiseCovariance.For(grid, d.Sensor, shot.TotalEPerS);
    }
}
