namespace CoefGen.Core.Weights;

/// <summary>
/// Cholesky factorisation L L^T of a symmetric block stored inside a row-major array (stride, offset),
/// overwriting its lower triangle. Row-oriented so every inner product runs over contiguous memory;
/// four fixed accumulators keep the summation order (and so the bits) identical on every machine.
/// </summary>
internal static class CholeskyInPlace
{
    private const double MachineEpsilon = 2.220446049250313e-16;

    /// <summary>Factors the size x size block at (offset, offset); throws when a pivot is not clearly positive.</summary>
    public static void Factor(double[] a, int stride, int offset, int size)
    {
        var maxDiag = 0.0;
        for (var i = 0; i < size; i++)
        {
            maxDiag = Math.Max(maxDiag, a[Index(stride, offset, i, i)]);
        }

        // A pivot below size * eps * max diagonal is indistinguishable from zero after roundoff.
        var floor = size * MachineEpsilon * maxDiag;
        for (var i = 0; i < size; i++)
        {
            var rowI = Index(stride, offset, i, 0);
            for (var j = 0; j <= i; j++)
            {
                var rowJ = Index(stride, offset, j, 0);
                var s = a[rowI + j] - Dot(a, rowI, rowJ, j);
                if (i == j)
                {
                    if (!(s > floor) || !double.IsFinite(s))
                    {
                        throw new CovarianceNotPositiveDefiniteException(i, s, maxDiag);
                    }

                    a[rowI + i] = Math.Sqrt(s);
                }
                else
                {
                    a[rowI + j] = s / a[rowJ + j];
                }
            }
        }
    }

    /// <summary>Solves L L^T x = rhs in place using the factored block.</summary>
    public static void Solve(double[] a, int stride, int offset, int size, double[] x)
    {
        for (var i = 0; i < size; i++)
        {
            var row = Index(stride, offset, i, 0);
            var s = x[i];
            for (var k = 0; k < i; k++)
            {
                s -= a[row + k] * x[k];
            }

            x[i] = s / a[row + i];
        }

        for (var i = size - 1; i >= 0; i--)
        {
            var s = x[i];
            for (var k = i + 1; k < size; k++)
            {
                s -= a[Index(stride, offset, k, i)] * x[k];
            }

            x[i] = s / a[Index(stride, offset, i, i)];
        }
    }

    private static int Index(int stride, int offset, int i, int j) => ((offset + i) * stride) + offset + j;

    private static double Dot(double[] a, int rowI, int rowJ, int count)
    {
        double s0 = 0, s1 = 0, s2 = 0, s3 = 0;
        var k = 0;
        for (; k + 3 < count; k += 4)
        {
            s0 += a[rowI + k] * a[rowJ + k];
            s1 += a[rowI + k + 1] * a[rowJ + k + 1];
            s2 += a[rowI + k + 2] * a[rowJ + k + 2];
            s3 += a[rowI + k + 3] * a[rowJ + k + 3];
        }

        for (; k < count; k++)
        {
            s0 += a[rowI + k] * a[rowJ + k];
        }

        return (s0 + s1) + (s2 + s3);
    }
}
