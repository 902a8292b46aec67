using MathNet.Numerics.Distributions;
using CoefGen.Core.Weights;

namespace CoefGen.Core.Capture;

/// <summary>
/// Measures the read noise of weights on cycles that took no part in designing them. The interval is
/// the usual chi-square interval for a normal variance with (P - 1) degrees of freedom; it assumes the
/// held-out cycles independent, which 1/f noise makes slightly optimistic.
/// </summary>
public static class HeldOutValidation
{
    public static SchemeValidation Evaluate(
        string label, double[] h, SampleCapture capture, IReadOnlyList<int> heldOut, SampleGrid grid, double lsbV,
        double modelVarianceV2, double captureVarianceV2, double confidence = 0.95)
    {
        ArgumentNullException.ThrowIfNull(h);
        ArgumentNullException.ThrowIfNull(capture);
        ArgumentNullException.ThrowIfNull(heldOut);
        ArgumentNullException.ThrowIfNull(grid);
        var p = heldOut.Count;
        if (p < 2 || h.Length != grid.Count)
        {
            throw new ArgumentException("need at least 2 held-out cycles and one weight per grid sample");
        }

        var y = new double[p];
        for (var k = 0; k < p; k++)
        {
            var s = 0.0;
            for (var i = 0; i < grid.Count; i++)
            {
                s += h[i] * capture.At(heldOut[k], grid.SampleIndex[i]);
            }

            y[k] = s * lsbV;
        }

        var mean = y.Average();
        var variance = y.Sum(v => (v - mean) * (v - mean)) / (p - 1);
        var dof = p - 1.0;
        var tail = (1 - confidence) / 2;
        var lower = Math.Sqrt(variance * dof / ChiSquared.InvCDF(dof, 1 - tail));
        var upper = Math.Sqrt(variance * dof / ChiSquared.InvCDF(dof, tail));
        return new SchemeValidation(label, h, Math.Sqrt(variance), lower, upper, Math.Sqrt(Math.Max(0, modelVarianceV2)), Math.Sqrt(Math.Max(0, captureVarianceV2)));
    }
}
