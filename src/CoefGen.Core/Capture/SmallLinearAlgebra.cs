namespace CoefGen.Core.Capture;

/// <summary>Dense solves for the few-parameter normal equations of the spectrum fit.</summary>
internal static class SmallLinearAlgebra
{
    /// <summary>Inverse of a small matrix by Gauss-Jordan with partial pivoting; null when singular.</summary>
    public static double[,]? Inverse(double[,] a)
    {
        var n = a.GetLength(0);
        var m = new double[n, 2 * n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                m[i, j] = a[i, j];
            }

            m[i, n + i] = 1;
        }

        for (var c = 0; c < n; c++)
        {
            var pivot = c;
            for (var r = c + 1; r < n; r++)
            {
                if (Math.Abs(m[r, c]) > Math.Abs(m[pivot, c]))
                {
                    pivot = r;
                }
            }

            if (!(Math.Abs(m[pivot, c]) > 1e-300))
            {
                return null;
            }

            for (var j = 0; j < 2 * n; j++)
            {
                (m[c, j], m[pivot, j]) = (m[pivot, j], m[c, j]);
            }

            var d = m[c, c];
            for (var j = 0; j < 2 * n; j++)
            {
                m[c, j] /= d;
            }

            for (var r = 0; r < n; r++)
            {
                if (r != c && m[r, c] != 0)
                {
                    var f = m[r, c];
                    for (var j = 0; j < 2 * n; j++)
                    {
                        m[r, j] -= f * m[c, j];
                    }
                }
            }
        }

        var inv = new double[n, n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                inv[i, j] = m[i, n + j];
            }
        }

        return inv;
    }

    /// <summary>Trigamma psi'(x) for x > 0: recurrence up to x >= 8, then the asymptotic series (Abramowitz and Stegun 6.4.12).</summary>
    public static double Trigamma(double x)
    {
        var s = 0.0;
        while (x < 8)
        {
            s += 1 / (x * x);
            x += 1;
        }

        var x2 = 1 / (x * x);
        return s + (1 / x) + (x2 / 2) + ((1 / (x * x * x)) * ((1.0 / 6) - (x2 * ((1.0 / 30) - (x2 * ((1.0 / 42) - (x2 / 30)))))));
    }
}
