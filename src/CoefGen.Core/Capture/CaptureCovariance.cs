using CoefGen.Core.Weights;

namespace CoefGen.Core.Capture;

/// <summary>
/// The covariance of the grid samples estimated from pixel cycles, shrunk towards a stationary model:
/// C = (1 - lambda) S + lambda T. S is the sample covariance (mean waveform removed per position), T the
/// model at the same instants. Both are first projected onto sum h = 0 over each reset group (every weight set
/// has that, so nothing is lost; a classic grid is one group): each cycle's own reset levels (kTC) and the
/// arbitrary constant the 1/f model leaves in T then cannot inflate S or the distance S - T. lambda is the Ledoit-Wolf-type intensity for a fixed target (Schafer and Strimmer 2005, eq. for
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
        var groups = grid.GroupMembers();
        var x = new double[p * n];
        for (var k = 0; k < p; k++)
        {
            for (var i = 0; i < n; i++)
            {
                var c = grid.SampleIndex[i];
                x[(k * n) + i] = (capture.At(rowsUsed[k], c) - mean[c]) * lsbV;
            }

            foreach (var members in groups)
            {
                var groupMean = 0.0;
                foreach (var i in members)
                {
                    groupMean += x[(k * n) + i];
                }

                groupMean /= members.Length;
                foreach (var i in members)
                {
                    x[(k * n) + i] -= groupMean;
                }
            }
        }

        var t = Project(target, n, grid.Group, groups);
        var sum = new double[n * n];
        var sumSq = new double[n * n];
        for (var k = 0; k < p; k++)
        {
            var row = k * n;
            for (var i = 0; i < n; i++)
            {
                var xi = x[row + i];
                for (var j = i; j < n; j++)
                {
                    var w = xi * x[row + j];
                    sum[(i * n) + j] += w;
                    sumSq[(i * n) + j] += w * w;
                }
            }
        }

        // The upper triangle mirrored: x_i x_j = x_j x_i exactly, summed in the same order of cycles.
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < i; j++)
            {
                sum[(i * n) + j] = sum[(j * n) + i];
                sumSq[(i * n) + j] = sumSq[(j * n) + i];
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

    /// <summary>
    /// P T P with P = I - sum over groups g of 1_g 1_g^T / N_g: each entry less the mean of its row over the column's
    /// group and of its column over the row's group, plus the mean of the block (one group: I - 1 1^T / N).
    /// </summary>
    private static double[] Project(double[] m, int n, IReadOnlyList<int> group, int[][] groups)
    {
        // rowMean[i, g]: mean of row i over the columns of group g; colMean[g, j] likewise; block[g, h] the block's mean.
        var g = groups.Length;
        var rowMean = new double[n * g];
        var colMean = new double[g * n];
        var block = new double[g * g];
        for (var i = 0; i < n; i++)
        {
            var gi = group[i];
            for (var j = 0; j < n; j++)
            {
                var gj = group[j];
                rowMean[(i * g) + gj] += m[(i * n) + j] / groups[gj].Length;
                colMean[(gi * n) + j] += m[(i * n) + j] / groups[gi].Length;
                block[(gi * g) + gj] += m[(i * n) + j] / ((double)groups[gi].Length * groups[gj].Length);
            }
        }

        var r = new double[n * n];
        for (var i = 0; i < n; i++)
        {
            var gi = group[i];
            for (var j = 0; j < n; j++)
            {
                var gj = group[j];
                r[(i * n) + j] = m[(i * n) + j] - rowMean[(i * g) + gj] - colMean[(gi * n) + j] + block[(gi * g) + gj];
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
