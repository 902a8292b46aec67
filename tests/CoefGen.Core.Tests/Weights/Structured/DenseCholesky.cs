using System.Numerics;

namespace CoefGen.Core.Tests.Weights.Structured;

/// <summary>
/// Row-oriented (left-looking) Cholesky on jagged rows: every inner product runs over two contiguous
/// row prefixes, vectorised with <see cref="Vector{T}"/>, rows taken in blocks of 16. N³/6 multiply-adds:
/// a reference, not a production path.
/// </summary>
public static class DenseCholesky
{
    private const int Block = 16;

    /// <summary>Overwrites the lower triangle of a with L (a = LLᵀ); throws if a is not positive definite.</summary>
    public static void FactorInPlace(double[][] a)
    {
        ArgumentNullException.ThrowIfNull(a);
        var n = a.Length;
        for (var i0 = 0; i0 < n; i0 += Block)
        {
            var i1 = Math.Min(n, i0 + Block);
            // Columns left of the block: each finished row j is read once for all rows of the block
            // (cuts memory traffic by the block height; the arithmetic per entry is unchanged).
            for (var j = 0; j < i0; j++)
            {
                var lj = a[j];
                for (var i = i0; i < i1; i++)
                {
                    a[i][j] = (a[i][j] - Dot(a[i], lj, j)) / lj[j];
                }
            }

            for (var i = i0; i < i1; i++)
            {
                var li = a[i];
                for (var j = i0; j <= i; j++)
                {
                    var sum = li[j] - Dot(li, a[j], j);
                    if (j < i)
                    {
                        li[j] = sum / a[j][j];
                    }
                    else
                    {
                        if (!(sum > 0))
                        {
                            throw new InvalidOperationException($"matrix is not positive definite (pivot {i} = {sum})");
                        }

                        li[i] = Math.Sqrt(sum);
                    }
                }
            }
        }
    }

    /// <summary>Solves LLᵀx = b in place with the factor from <see cref="FactorInPlace"/>.</summary>
    public static void Solve(double[][] l, double[] b)
    {
        ArgumentNullException.ThrowIfNull(l);
        ArgumentNullException.ThrowIfNull(b);
        var n = l.Length;
        for (var i = 0; i < n; i++)
        {
            b[i] = (b[i] - Dot(l[i], b, i)) / l[i][i];
        }

        for (var i = n - 1; i >= 0; i--)
        {
            var t = b[i];
            for (var k = i + 1; k < n; k++)
            {
                t -= l[k][i] * b[k];
            }

            b[i] = t / l[i][i];
        }
    }

    private static double Dot(double[] x, double[] y, int length)
    {
        var width = Vector<double>.Count;
        var acc = Vector<double>.Zero;
        var k = 0;
        for (; k + width <= length; k += width)
        {
            acc += new Vector<double>(x, k) * new Vector<double>(y, k);
        }

        var s = Vector.Sum(acc);
        for (; k < length; k++)
        {
            s += x[k] * y[k];
        }

        return s;
    }
}
