using CoefGen.Core.Weights;

namespace CoefGen.Core.Capture;

/// <summary>
/// Minimum h^T C h under the scheme constraints for a general (non-stationary) symmetric C: the same
/// null-space method as <see cref="DenseNullSpaceSolver"/> (Householder basis of the constraints,
/// reduced matrix Z^T C Z, Cholesky), reusing its <see cref="HouseholderBasis"/> and
/// <see cref="CholeskyInPlace"/>, but on a full matrix instead of a lag table.
/// </summary>
public static class DenseMatrixOptimalSolver
{
    /// <param name="grid">The weighted samples and their step response.</param>
    /// <param name="matrix">C, row-major N x N, positive definite on the constraint null space.</param>
    /// <param name="rejectDrift">Also require sum h t = 0.</param>
    /// <exception cref="CovarianceNotPositiveDefiniteException">C is not positive definite there.</exception>
    public static OptimalSolution Solve(SampleGrid grid, IReadOnlyList<double> matrix, bool rejectDrift)
    {
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(matrix);
        var n = grid.Count;
        if (matrix.Count != n * n)
        {
            throw new ArgumentException($"matrix has {matrix.Count} entries, grid needs {n * n}");
        }

        var basis = HouseholderBasis.Factor(ConstraintSystem.FromGrid(grid, rejectDrift));
        var m = basis.Constraints;
        var y = basis.SolveTransposedTriangle(rejectDrift ? [0.0, 1.0, 0.0] : [0.0, 1.0]);
        var c = new double[n * n];
        var scale = 0.0;
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                // Symmetrised on entry: the transform below assumes a symmetric matrix.
                c[(i * n) + j] = 0.5 * (matrix[(i * n) + j] + matrix[(j * n) + i]);
            }

            scale = Math.Max(scale, Math.Abs(c[(i * n) + i]));
        }

        basis.TransformBothSides(c);
        var k = n - m;
        var z = new double[k];
        for (var i = 0; i < k; i++)
        {
            var s = 0.0;
            for (var j = 0; j < m; j++)
            {
                s += 0.5 * (c[((m + i) * n) + j] + c[(j * n) + m + i]) * y[j];
            }

            z[i] = -s;
        }

        for (var i = 0; i < k; i++)
        {
            for (var j = 0; j < i; j++)
            {
                var lower = ((m + i) * n) + m + j;
                c[lower] = 0.5 * (c[lower] + c[((m + j) * n) + m + i]);
            }
        }

        if (k > 0)
        {
            CholeskyInPlace.Factor(c, n, m, k, scale);
            CholeskyInPlace.Solve(c, n, m, k, z);
        }

        var h = new double[n];
        Array.Copy(y, h, m);
        Array.Copy(z, 0, h, m, k);
        basis.ApplyQ(h);
        var variance = 0.0;
        for (var i = 0; i < n; i++)
        {
            var row = 0.0;
            for (var j = 0; j < n; j++)
            {
                row += 0.5 * (matrix[(i * n) + j] + matrix[(j * n) + i]) * h[j];
            }

            variance += h[i] * row;
        }

        return new OptimalSolution(h, variance);
    }
}
