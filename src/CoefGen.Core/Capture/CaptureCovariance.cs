using CoefGen.Core.Weights;

namespace CoefGen.Core.Capture;

/// <summary>
/// The covariance of the grid samples estimated from pixel cycles, shrunk towards a stationary model:
/// C = (1 - lambda) S + lambda T. S is the sample covariance (mean waveform removed per position), T the
/// model at the same instants. Both are first projected onto sum h = 0 (every weight set has sum h = 0,
/// so nothing is lost, and the arbitrary constant the 1/f model leaves in T cannot inflate the distance
/// S - T). lambda is the Ledoit-Wolf-type intensity for a fixed target (Schafer and Strimmer 2005, eq. for
/// target F): sum Var(s_ij) / sum (s_ij - t_ij)², clipped to [<see cref="MinimumShrinkage"/>, 1].
/// </summary>
/// <param name="Count">Grid samples N.</param>
/// <param name="Matrix">C, row-major N x N, V².</param>
/// <param name="SampleMatrix">S (projected), row-major N x N, V².</param>
/// <param name="Shrinkage">lambda.</param>
/// <param name="Pixels">Cycles the estimate used.</param>
public sealed record CaptureCovariance(int Count, double[] Matrix, double[] SampleMatrix, double Shrinkage, int Pixels)
{
    /// <summary>
    /// Floor on lambda: a share of the model this small changes the variance of any weights by at most
    /// about 1 %, yet keeps C positive definite on sum h = 0 however few cycles there are (T is, through
    /// its digital diagonal).
    /// </summary>
    public const double MinimumShrinkage = 0.01;

    /// <summary>h^T C h.</summary>
    public double QuadraticForm(IReadOnlyList<double> h) => Quadratic(Matrix, h);

    /// <summary>h^T S h: the unshrunk estimate.</summary>
    public double SampleQuadraticForm(IReadOnlyList<double> h) => Quadratic(SampleMatrix, h);

    /// <summary>Builds C from the given cycles of a pixel-synchronous capture.</summary>
    /// <param name="capture">A pixel-synchronous capture.</param>
    /// <param name="grid">The weighted samples (their cycle indices select the capture columns).</param>
    /// <param name="rowsUsed">Cycles to use.</param>
    /// <param name="lsbV">Volts per code.</param>
    /// <param name="target">T at the grid instants, row-major N x N, V² (e.g. the fitted model).</param>
    public static CaptureCovariance Estimate(SampleCapture capture, IReadOnlyList<int> rowsUsed, SampleGrid grid, double lsbV, double[] target)
    {
        ArgumentNullException.ThrowIfNull(capture);
        ArgumentNullException.ThrowIfNull(rowsUsed);
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(target);
        var n = grid.Count;
        var p = rowsUsed.Count;
        if (capture.Layout != CaptureLayout.PixelSynchronous || grid.SampleIndex[^1] >= capture.CycleLength)
        {
            throw new ArgumentException("need pixel cycles that contain every grid sample");
        }

        if (p < 2 || target.Length != n * n)
        {
            throw new ArgumentException("need at least 2 cycles and an N x N target");
        }

        var mean = CaptureSamples.MeanWaveform(capture, rowsUsed);
        var x = new double[p * n];
        for (var k = 0; k < p; k++)
        {
            var rowMean = 0.0;
            for (var i = 0; i < n; i++)
            {
                var c = grid.SampleIndex[i];
                x[(k * n) + i] = (capture.At(rowsUsed[k], c) - mean[c]) * lsbV;
                rowMean += x[(k * n) + i];
            }

            rowMean /= n;
            for (var i = 0; i < n; i++)
            {
                x[(k * n) + i] -= rowMean;
            }
        }

        var t = Project(target, n);
        var sum = new double[n * n];
        var sumSq = new double[n * n];
        for (var k = 0; k < p; k++)
        {
            var row = k * n;
            for (var i = 0; i < n; i++)
            {
                var xi = x[row + i];
                for (var j = 0; j < n; j++)
                {
                    var w = xi * x[row + j];
                    sum[(i * n) + j] += w;
                    sumSq[(i * n) + j] += w * w;
                }
            }
        }

        var s = new double[n * n];
        double varianceSum = 0, distanceSum = 0;
        for (var e = 0; e < n * n; e++)
        {
            var wBar = sum[e] / p;
            s[e] = sum[e] / (p - 1);

            // Var(s_ij) = n / (n - 1)^3 * sum_k (w_kij - mean w_ij)^2 (Schafer and Strimmer 2005).
            varianceSum += p / Math.Pow(p - 1, 3) * Math.Max(0, sumSq[e] - (p * wBar * wBar));
            distanceSum += (s[e] - t[e]) * (s[e] - t[e]);
        }

        var lambda = distanceSum > 0 ? Math.Clamp(varianceSum / distanceSum, MinimumShrinkage, 1) : 1;
        var c2 = new double[n * n];
        for (var e = 0; e < n * n; e++)
        {
            c2[e] = ((1 - lambda) * s[e]) + (lambda * t[e]);
        }

        return new CaptureCovariance(n, c2, s, lambda, p);
    }

    /// <summary>P T P with P = I - 1 1^T / N.</summary>
    private static double[] Project(double[] m, int n)
    {
        var rowMean = new double[n];
        var colMean = new double[n];
        var all = 0.0;
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                rowMean[i] += m[(i * n) + j] / n;
                colMean[j] += m[(i * n) + j] / n;
                all += m[(i * n) + j] / ((double)n * n);
            }
        }

        var r = new double[n * n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                r[(i * n) + j] = m[(i * n) + j] - rowMean[i] - colMean[j] + all;
            }
        }

        return r;
    }

    private static double Quadratic(double[] m, IReadOnlyList<double> h)
    {
        ArgumentNullException.ThrowIfNull(h);
        var n = h.Count;
        var total = 0.0;
        for (var i = 0; i < n; i++)
        {
            var row = 0.0;
            for (var j = 0; j < n; j++)
            {
                row += m[(i * n) + j] * h[j];
            }

            total += h[i] * row;
        }

        return total;
    }
}
