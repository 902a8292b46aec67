namespace CoefGen.Core.Weights;

/// <summary>
/// Householder QR of the N x m constraint matrix A = Q [R1; 0], Q = H_0 H_1 ... H_{m-1}, with
/// H_k = I - tau_k v_k v_k^T (v_k zero before entry k, v_k[k] = 1). The last N - m columns of Q are
/// an orthonormal basis Z of null(A^T). Q is never formed: it is applied reflector by reflector.
/// </summary>
internal sealed class HouseholderBasis
{
    // Columns whose QR pivot falls below this fraction of their norm are treated as dependent.
    private const double RankTolerance = 1e-10;

    private readonly double[][] _v;
    private readonly double[] _tau;
    private readonly double[,] _r;

    private HouseholderBasis(double[][] v, double[] tau, double[,] r, int rows)
    {
        _v = v;
        _tau = tau;
        _r = r;
        Rows = rows;
    }

    public int Rows { get; }

    public int Constraints => _tau.Length;

    /// <summary>Factorises A; throws <see cref="ArgumentException"/> when its columns are (nearly) dependent.</summary>
    public static HouseholderBasis Factor(ConstraintSystem a)
    {
        ArgumentNullException.ThrowIfNull(a);
        var n = a.Rows;
        var m = a.Constraints;
        if (n < m)
        {
            throw new ArgumentException($"{m} constraints need at least {m} samples, the grid has {n}");
        }

        var work = new double[m][];
        var norms = new double[m];
        for (var c = 0; c < m; c++)
        {
            work[c] = (double[])a.Columns[c].Clone();
            norms[c] = Norm(work[c], 0);
        }

        var v = new double[m][];
        var tau = new double[m];
        var r = new double[m, m];
        for (var k = 0; k < m; k++)
        {
            var x = work[k];
            var alpha = Norm(x, k);
            if (!(alpha > RankTolerance * norms[k]))
            {
                throw new ArgumentException(
                    $"constraint column {k} (1, step, time) is linearly dependent on the earlier ones: the step or drift cannot be separated on this grid");
            }

            var beta = x[k] >= 0 ? -alpha : alpha;
            var vk = new double[n];
            vk[k] = 1.0;
            var scale = 1.0 / (x[k] - beta);
            for (var i = k + 1; i < n; i++)
            {
                vk[i] = x[i] * scale;
            }

            v[k] = vk;
            tau[k] = (beta - x[k]) / beta;
            for (var c = k; c < m; c++)
            {
                ApplyReflector(vk, tau[k], k, work[c]);
                r[k, c] = work[c][k];
            }

            r[k, k] = beta;
        }

        return new HouseholderBasis(v, tau, r, n);
    }

    /// <summary>y with R1^T y = b, so that the minimum-norm solution of A^T h = b is h0 = Q [y; 0].</summary>
    public double[] SolveTransposedTriangle(IReadOnlyList<double> b)
    {
        var m = Constraints;
        var y = new double[m];
        for (var i = 0; i < m; i++)
        {
            var s = b[i];
            for (var k = 0; k < i; k++)
            {
                s -= _r[k, i] * y[k];
            }

            y[i] = s / _r[i, i];
        }

        return y;
    }

    /// <summary>Overwrites x (length N) with Q x.</summary>
    public void ApplyQ(double[] x)
    {
        for (var k = Constraints - 1; k >= 0; k--)
        {
            ApplyReflector(_v[k], _tau[k], k, x);
        }
    }

    /// <summary>Minimum-norm solution h0 = A (A^T A)^-1 b = Q [R1^-T b; 0].</summary>
    public double[] MinimumNormSolution(IReadOnlyList<double> b)
    {
        var y = SolveTransposedTriangle(b);
        var h = new double[Rows];
        Array.Copy(y, h, y.Length);
        ApplyQ(h);
        return h;
    }

    /// <summary>
    /// Overwrites the symmetric row-major N x N matrix c with Q^T c Q, one reflector at a time on both
    /// sides: H c H = c - v w^T - w v^T with p = tau c v, w = p - (tau/2)(p^T v) v. O(N^2 m).
    /// </summary>
    public void TransformBothSides(double[] c)
    {
        var n = Rows;
        var p = new double[n];
        for (var k = 0; k < Constraints; k++)
        {
            var v = _v[k];
            var tau = _tau[k];
            for (var i = 0; i < n; i++)
            {
                var row = i * n;
                var s = 0.0;
                for (var j = k; j < n; j++)
                {
                    s += c[row + j] * v[j];
                }

                p[i] = tau * s;
            }

            var pv = 0.0;
            for (var j = k; j < n; j++)
            {
                pv += p[j] * v[j];
            }

            var half = 0.5 * tau * pv;
            for (var i = 0; i < n; i++)
            {
                p[i] -= half * v[i];
            }

            for (var i = 0; i < n; i++)
            {
                var row = i * n;
                var vi = v[i];
                var wi = p[i];
                for (var j = 0; j < n; j++)
                {
                    c[row + j] -= (vi * p[j]) + (wi * v[j]);
                }
            }
        }
    }

    private static void ApplyReflector(double[] v, double tau, int start, double[] x)
    {
        var s = 0.0;
        for (var i = start; i < x.Length; i++)
        {
            s += v[i] * x[i];
        }

        s *= tau;
        for (var i = start; i < x.Length; i++)
        {
            x[i] -= s * v[i];
        }
    }

    private static double Norm(double[] x, int start)
    {
        // Scaled to avoid overflow is unnecessary here: entries are O(1) (ones, step, unit-rms time).
        var s = 0.0;
        for (var i = start; i < x.Length; i++)
        {
            s += x[i] * x[i];
        }

        return Math.Sqrt(s);
    }
}
