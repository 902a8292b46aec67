namespace CoefGen.Core.Weights.Structured;

/// <summary>
/// The affine constraint set {h : Aᵀh = b} through an orthonormal basis Q of range(A) (modified
/// Gram–Schmidt, applied twice for orthogonality to round-off), A = QU. Aᵀh = b ⇔ Qᵀh = U⁻ᵀb, so the
/// minimum-norm point is h₀ = QU⁻ᵀb = A(AᵀA)⁻¹b and the projector onto null(Aᵀ) is I − QQᵀ, both O(Nm).
/// Orthonormalising first avoids forming AᵀA, whose condition number squares that of A.
/// </summary>
internal sealed class ConstraintProjector
{
    private readonly double[][] _q;
    private readonly double[] _target;

    public ConstraintProjector(IReadOnlyList<double[]> columns, IReadOnlyList<double> rhs, int count)
    {
        var m = columns.Count;
        if (m < 1 || rhs.Count != m)
        {
            throw new ArgumentException($"need at least one constraint column and as many right-hand sides ({m} columns, {rhs.Count} values)");
        }

        _q = new double[m][];
        var u = new double[m, m];
        for (var j = 0; j < m; j++)
        {
            var a = columns[j] ?? throw new ArgumentException($"constraint column {j} is null");
            if (a.Length != count)
            {
                throw new ArgumentException($"constraint column {j} has {a.Length} entries, expected {count}");
            }

            var v = (double[])a.Clone();
            var norm0 = Norm(v);
            for (var pass = 0; pass < 2; pass++)
            {
                for (var i = 0; i < j; i++)
                {
                    var d = Dot(_q[i], v);
                    u[i, j] += d;
                    Axpy(-d, _q[i], v);
                }
            }

            var norm = Norm(v);
            if (!(norm > 1e-10 * norm0))
            {
                throw new ArgumentException($"constraint column {j} is (numerically) a combination of the previous ones");
            }

            u[j, j] = norm;
            for (var i = 0; i < count; i++)
            {
                v[i] /= norm;
            }

            _q[j] = v;
        }

        // Forward substitution for Uᵀ c = b (Uᵀ is lower triangular).
        _target = new double[m];
        for (var j = 0; j < m; j++)
        {
            var s = rhs[j];
            for (var i = 0; i < j; i++)
            {
                s -= u[i, j] * _target[i];
            }

            _target[j] = s / u[j, j];
        }
    }

    public int ConstraintCount => _q.Length;

    /// <summary>h₀ = A(AᵀA)⁻¹b, the smallest-norm weights meeting the constraints.</summary>
    public double[] ParticularSolution()
    {
        var h = new double[_q[0].Length];
        for (var j = 0; j < _q.Length; j++)
        {
            Axpy(_target[j], _q[j], h);
        }

        return h;
    }

    /// <summary>v ← (I − QQᵀ) v, twice for round-off (the second pass costs O(Nm) and removes the drift of the first).</summary>
    public void Project(double[] v)
    {
        for (var pass = 0; pass < 2; pass++)
        {
            foreach (var q in _q)
            {
                Axpy(-Dot(q, v), q, v);
            }
        }
    }

    /// <summary>Moves h back onto the constraint set along range(A): h ← h − Q(Qᵀh − c).</summary>
    public void Restore(double[] h)
    {
        for (var pass = 0; pass < 2; pass++)
        {
            for (var j = 0; j < _q.Length; j++)
            {
                Axpy(_target[j] - Dot(_q[j], h), _q[j], h);
            }
        }
    }

    /// <summary>True when the all-ones vector lies in range(A), i.e. the weights must sum to zero.</summary>
    public bool ContainsOnes()
    {
        var n = _q[0].Length;
        var ones = new double[n];
        Array.Fill(ones, 1.0);
        Project(ones);
        return Norm(ones) <= 1e-9 * Math.Sqrt(n);
    }

    internal static double Dot(double[] a, double[] b)
    {
        var s = 0.0;
        for (var i = 0; i < a.Length; i++)
        {
            s += a[i] * b[i];
        }

        return s;
    }

    internal static double Norm(double[] a) => Math.Sqrt(Dot(a, a));

    internal static void Axpy(double alpha, double[] x, double[] y)
    {
        for (var i = 0; i < y.Length; i++)
        {
            y[i] += alpha * x[i];
        }
    }
}
