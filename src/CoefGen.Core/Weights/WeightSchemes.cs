using CoefGen.Core.Noise;
using CoefGen.Core.Readout;

namespace CoefGen.Core.Weights;

/// <summary>All three schemes for one description, so they can be compared against the same noise.</summary>
public static class WeightSchemes
{
    /// <summary>Boxcar, weighted and optimal weights, in that order, all with the spec's drift setting.</summary>
    public static IReadOnlyList<WeightSet> ComputeAll(SampleGrid grid, SampledCovariance r, WeightsSpec spec) =>
        ComputeAll(grid, r, spec, new DenseNullSpaceSolver());

    /// <summary>As <see cref="ComputeAll(SampleGrid, SampledCovariance, WeightsSpec)"/> with a chosen optimal solver.</summary>
    public static IReadOnlyList<WeightSet> ComputeAll(SampleGrid grid, SampledCovariance r, WeightsSpec spec, IOptimalSolver solver)
    {
        ArgumentNullException.ThrowIfNull(spec);
        return
        [
            BoxcarWeights.Compute(grid, spec.RejectDrift),
            ShapedWeights.Compute(grid, spec),
            OptimalWeights.Compute(grid, r, spec.RejectDrift, solver).Weights,
        ];
    }
}
