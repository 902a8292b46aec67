using CoefGen.Core.Noise;

namespace CoefGen.Core.Tests.Weights.Structured;

/// <summary>
/// Dense null-space reference (PHYSICS.md §5, "Preferred"): QR of A by m Householder reflections,
/// Q = H₁…H_m, A = Q[U; 0]. With S = QᵀRQ and y = Qᵀh the constraints fix y₁ = U⁻ᵀb, and the free part
/// solves S₂₂ y₂ = −S₂₁ y₁ (S₂₂ = ZᵀRZ, Cholesky of our own: Math.NET's managed
/// Cholesky took 5.8 s at N = 1024 here, which would make the dense baseline hours long at 2 × 4096); h = Qy. S is built by applying the reflections to
/// both sides of R in O(mN²), so the cost is the N³/3 Cholesky and N² doubles of memory.
/// </summary>
public static class DenseReferenceSolver
{
    public static (double[] Weights, double Variance) Solve(SampledCovariance r, IReadOnlyList<double[]> columns, IReadOnlyList<double> rhs)
    {
        var n = r.Count;
        var m = columns.Count;
        var a = new double[m][];
        for (var j = 0; j < m; j++)
        {
            a[j] = (double[])columns[j].Clone();
        }

        // Householder QR of A: reflector j acts on rows j..n-1.
        var v = new double[m][];
        var u = new double[m, m];
        for (var j = 0; j < m; j++)
        {
            var x = a[j];
            var norm = 0.0;
            for (var i = j; i < n; i++)
            {
                norm += x[i] * x[i];
            }

            norm = Math.Sqrt(norm);
            var alpha = x[j] > 0 ? -norm : norm;
            var vj = new double[n];
            vj[j] = x[j] - alpha;
            for (var i = j + 1; i < n; i++)
            {
                vj[i] = x[i];
            }

            v[j] = vj;
            for (var k = j; k < m; k++)
            {
                Reflect(vj, a[k]);
                for (var i = 0; i <= k; i++)
                {
                    u[i, k] = a[k][i];
                }
            }
        }

        double[,]? s = r.ToDense();
        for (var j = 0; j < m; j++)
        {
            ReflectBothSides(v[j], s, n);
        }

        // y1 = U^-T b by forward substitution.
        var y = new double[n];
        for (var j = 0; j < m; j++)
        {
            var t = rhs[j];
            for (var i = 0; i < j; i++)
            {
                t -= u[i, j] * y[i];
            }

            y[j] = t / u[j, j];
        }

        // Reduced system S22 y2 = -S21 y1, symmetrised before the factorisation (PHYSICS.md §5).
        var k2 = n - m;
        var s22 = new double[k2][];
        var y2 = new double[k2];
        for (var i = 0; i < k2; i++)
        {
            var row = new double[k2];
            for (var k = 0; k < k2; k++)
            {
                row[k] = 0.5 * (s[m + i, m + k] + s[m + k, m + i]);
            }

            s22[i] = row;
            for (var j = 0; j < m; j++)
            {
                y2[i] -= s[m + i, j] * y[j];
            }
        }

        s = null;
        DenseCholesky.FactorInPlace(s22);
        DenseCholesky.Solve(s22, y2);
        for (var i = 0; i < k2; i++)
        {
            y[m + i] = y2[i];
        }

        // h = Q y = H1 (H2 (... Hm y)).
        for (var j = m - 1; j >= 0; j--)
        {
            Reflect(v[j], y);
        }

        return (y, r.QuadraticForm(y));
    }

    private static void Reflect(double[] v, double[] x)
    {
        var vv = 0.0;
        var vx = 0.0;
        for (var i = 0; i < v.Length; i++)
        {
            vv += v[i] * v[i];
            vx += v[i] * x[i];
        }

        if (vv == 0)
        {
            return;
        }

        var f = 2 * vx / vv;
        for (var i = 0; i < v.Length; i++)
        {
            x[i] -= f * v[i];
        }
    }

    /// <summary>S ← H S H with H = I − 2vvᵀ/vᵀv, using w = Sv: HSH = S − βvwᵀ − βwvᵀ + β²(vᵀw) vvᵀ.</summary>
    private static void ReflectBothSides(double[] v, double[,] s, int n)
    {
        var vv = 0.0;
        for (var i = 0; i < n; i++)
        {
            vv += v[i] * v[i];
        }

        var beta = 2 / vv;
        var w = new double[n];
        for (var i = 0; i < n; i++)
        {
            var t = 0.0;
            for (var k = 0; k < n; k++)
            {
                t += s[i, k] * v[k];
            }

            w[i] = t;
        }

        var vw = 0.0;
        for (var i = 0; i < n; i++)
        {
            vw += v[i] * w[i];
        }

        var g = beta * beta * vw;
        for (var i = 0; i < n; i++)
        {
            for (var k = 0; k < n; k++)
            {
                s[i, k] += (-beta * ((v[i] * w[k]) + (w[i] * v[k]))) + (g * v[i] * v[k]);
            }
        }
    }
}
