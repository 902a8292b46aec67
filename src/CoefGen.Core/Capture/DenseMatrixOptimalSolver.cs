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

        var c = new double[n * n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                // Symmetrised on entry: the transform assumes a symmetric matrix.
                c[(i * n) + j] = 0.5 * (matrix[(i * n) + j] + matrix[(j * n) + i]);
            }
        }

        var h = DenseNullSpaceSolver.SolveOnMatrix(grid, c, rejectDrift);
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
