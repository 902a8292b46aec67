using CoefGen.Core.Noise;
using CoefGen.Core.Prediction;
using CoefGen.Core.Readout;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Capture;

/// <summary>
/// The noise-against-signal-level table of a ramp design on a capture: at every level the capture covariance (the read
/// noise of idle cycles) plus that level's shot term, the designed weights and the optimum re-designed there on the same
/// sum (<see cref="DenseMatrixOptimalSolver"/>).
/// </summary>
public static class CaptureSignalLevels
{
    public static IReadOnlyList<SignalLevelRow> Compute(SampleGrid grid, CaptureCovariance covariance, ReadoutDescription d, IReadOnlyList<double> designed, bool rejectDrift)
    {
        ArgumentNullException.ThrowIfNull(covariance);
        ArgumentNullException.ThrowIfNull(designed);
        return SignalLevelTable.AtEveryLevel(grid, d, shot =>
        {
            var matrix = shot is null ? covariance.Matrix : CaptureAnalysis.WithShot(covariance.Matrix, grid.Count, shot);
            var shotPart = shot?.QuadraticForm(designed) ?? 0.0;
            return (covariance.QuadraticForm(designed) + shotPart, DenseMatrixOptimalSolver.Solve(grid, matrix, rejectDrift).VarianceV2);
        });
    }
}
