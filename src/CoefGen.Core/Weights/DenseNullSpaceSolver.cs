using CoefGen.Core.Noise;

namespace CoefGen.Core.Weights;

/// <summary>
/// Dense null-space solver (PHYSICS.md §5): Householder QR of A, h0 = A (A^T A)^-1 b, the reduced
/// matrix Z^T R Z from the reflectors applied on both sides of R, a Cholesky solve for z, h = h0 + Z z.
/// Needs R positive definite only on null(A^T), so a constant removed from every lag is harmless.
/// O(N^2) memory and O(N^3 / 6) time for the Cholesky.
/// </summary>
public sealed class DenseNullSpaceSolver : IOptimalSolver
{
    public OptimalSolution Solve(SampleGrid grid, SampledCovariance r, bool rejectDrift)
    {
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(r);
        var n = grid.Count;
        if (r.Count != n)
        {
            throw new ArgumentException($"covariance has {r.Count} samples, grid {n}");
        }

        var c = new double[n * n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                c[(i * n) + j] = r.FullAt(i, j);
            }
        }

        var h = SolveOnMatrix(grid, c, rejectDrift);
        return new OptimalSolution(h, r.QuadraticForm(h));
    }

    /// <summary>
    /// The null-space step on a symmetric row-major N x N matrix <paramref name="c"/> (overwritten):
    /// Householder basis Q of the constraints, M = Q^T C Q, M22 z = -M21 y by Cholesky, h = Q [y; z].
    /// Shared by the lag-table path and the capture (general matrix) path.
    /// </summary>
    internal static double[] SolveOnMatrix(SampleGrid grid, double[] c, bool rejectDrift) =>
        SolveOnMatrix(ConstraintSystem.FromGrid(grid, rejectDrift), c);

    /// <summary>The null-space step for any constraint set on a symmetric row-major matrix (overwritten).</summary>
    internal static double[] SolveOnMatrix(ConstraintSystem system, double[] c)
    {
        var n = system.Rows;
        var basis = HouseholderBasis.Factor(system);
        var m = basis.Constraints;
        var y = basis.SolveTransposedTriangle(system.Rhs);

        var scale = 0.0;
        for (var i = 0; i < n; i++)
        {
            scale = Math.Max(scale, Math.Abs(c[(i * n) + i]));
        }

        // M = Q^T R Q; with h = Q [y; z], minimising [y; z]^T M [y; z] over z gives M22 z = -M21 y.
        basis.TransformBothSides(c);
        var k = n - m;
        var z = new double[k];
        for (var i = 0; i < k; i++)
        {
            var row = (m + i) * n;
            var s = 0.0;
            for (var j = 0; j < m; j++)
            {
                // Symmetrised: the average of M21 and M12^T.
                s += 0.5 * (c[row + j] + c[(j * n) + m + i]) * y[j];
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
        return h;
    }
}
