using System.Runtime.Intrinsics;

namespace CoefGen.Core.Weights;

/// <summary>
/// Cholesky factorisation L L^T of a symmetric block stored inside a row-major array (stride, offset),
/// overwriting its lower triangle. Row-oriented so every inner product runs over contiguous memory;
/// four fixed lanes keep the summation order (and so the bits) identical on every machine.
/// </summary>
internal static class CholeskyInPlace
{
    private const double MachineEpsilon = 2.220446049250313e-16;

    // 64 x 64 doubles = 32 KiB per tile.
    private const int Tile = 64;

    /// <summary>
    /// Factors the size x size block at (offset, offset); throws when a pivot is not clearly positive.
    /// <paramref name="referenceScale"/> is the size of the entries the block was computed from (the
    /// largest diagonal of R): roundoff in the block is of order eps times that, so a pivot below
    /// size * eps * scale carries no information.
    /// </summary>
    public static void Factor(double[] a, int stride, int offset, int size, double referenceScale)
    {
        var maxDiag = 0.0;
        for (var i = 0; i < size; i++)
        {
            maxDiag = Math.Max(maxDiag, a[Index(stride, offset, i, i)]);
        }

        var floor = size * MachineEpsilon * Math.Max(maxDiag, referenceScale);

        // Tiled left-looking Banachiewicz: entry (i, j) of tile (I, J) first subtracts the products over
        // every earlier tile column K (tiles of both rows stay in cache), then the in-tile part.
        for (var i0 = 0; i0 < size; i0 += Tile)
        {
            var i1 = Math.Min(size, i0 + Tile);
            for (var j0 = 0; j0 <= i0; j0 += Tile)
            {
                var j1 = Math.Min(size, j0 + Tile);
                for (var k0 = 0; k0 < j0; k0 += Tile)
                {
                    var width = Math.Min(Tile, j0 - k0);
                    for (var i = i0; i < i1; i++)
                    {
                        var rowI = Index(stride, offset, i, 0);
                        var segI = a.AsSpan(rowI + k0, width);
                        var jEnd = Math.Min(j1, i + 1);
                        for (var j = j0; j < jEnd; j++)
                        {
                            a[rowI + j] -= Dot(segI, a.AsSpan(Index(stride, offset, j, k0), width));
                        }
                    }
                }

                for (var i = i0; i < i1; i++)
                {
                    var rowI = Index(stride, offset, i, 0);
                    var jEnd = Math.Min(j1, i + 1);
                    for (var j = j0; j < jEnd; j++)
                    {
                        var rowJ = Index(stride, offset, j, 0);
                        var s = a[rowI + j] - Dot(a.AsSpan(rowI + j0, j - j0), a.AsSpan(rowJ + j0, j - j0));
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

    private static double Dot(ReadOnlySpan<double> x, ReadOnlySpan<double> y)
    {
        // Four lanes, each a plain multiply then add (no fused multiply-add), reduced as (0+1)+(2+3):
        // the same bits as four scalar accumulators, with or without hardware vector support.
        unchecked
        {
            y = y[..x.Length];
            var acc = Vector256<double>.Zero;
            var k = 0;
            for (; k <= x.Length - 4; k += 4)
            {
                acc += Vector256.Create(x.Slice(k, 4)) * Vector256.Create(y.Slice(k, 4));
            }

            var s0 = acc.GetElement(0);
            for (; k < x.Length; k++)
            {
                s0 += x[k] * y[k];
            }

            return (s0 + acc.GetElement(1)) + (acc.GetElement(2) + acc.GetElement(3));
        }
    }
}
