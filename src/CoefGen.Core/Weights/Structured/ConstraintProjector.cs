namespace CoefGen.Core.Weights.Structured;

/// <summary>
/// The affine constraint set {h : Aᵀh = b} through an orthonormal basis Q of range(A) (modified
/// Gram–Schmidt, applied twice for orthogonality to round-off), A = QU. Aᵀh = b ⇔ Qᵀh = U⁻ᵀb, so the
/// minimum-norm point is h₀ = QU⁻ᵀb = A(AᵀA)⁻¹b and the projector onto null(Aᵀ) is I − QQᵀ, both O(Nm).
/// Orthonormalising first avoids forming AᵀA, whose condition number squares that of A.
/// </summary>
internal sealed class ConstraintProjector
{
    // Implicit group-indicator columns (first in A): Q's column for group g is 1_g / sqrt(n_g) (disjoint supports,
    // so already orthonormal). Each Gram–Schmidt step against them is a per-group sum over the group's members in
    // index order, the same operations as a dot product with the explicit column (its zeros add nothing), in O(N)
    // for all groups together instead of O(N · groups).
    private readonly int[]? _group;
    private readonly double[] _groupQ;
    private readonly double[] _groupTarget;
    private readonly double[] _groupDot;
    private readonly double[][] _q;
    private readonly double[] _target;
    private readonly int _count;

    public ConstraintProjector(IReadOnlyList<double[]> columns, IReadOnlyList<double> rhs, int count)
        : this(null, 0, columns, rhs, count)
    {
    }

    /// <param name="group">Group of each row for <paramref name="groupCount"/> implicit indicator columns (before the
    /// dense ones; their right-hand sides come first in <paramref name="rhs"/>), or null.</param>
    /// <param name="groupCount">Number of implicit indicator columns (0 for none).</param>
    /// <param name="columns">The dense columns of A, each <paramref name="count"/> long.</param>
    /// <param name="rhs">b: the indicators' values, then the dense columns'.</param>
    /// <param name="count">N, the number of weights.</param>
    public ConstraintProjector(int[]? group, int groupCount, IReadOnlyList<double[]> columns, IReadOnlyList<double> rhs, int count)
    {
        var m = groupCount + columns.Count;
        if (m < 1 || rhs.Count != m)
        {
            throw new ArgumentException($"need at least one constraint column and as many right-hand sides ({m} columns, {rhs.Count} values)");
        }

        _count = count;
        _group = groupCount > 0 ? group ?? throw new ArgumentException("group indicators need the group of each row") : null;
        _groupQ = new double[groupCount];
        _groupTarget = new double[groupCount];
        _groupDot = new double[groupCount];
        if (_group is not null)
        {
            if (_group.Length != count)
            {
                throw new ArgumentException($"group list has {_group.Length} entries, expected {count}");
            }

            var members = new int[groupCount];
            foreach (var g in _group)
            {
                members[g]++;
            }

            for (var g = 0; g < groupCount; g++)
            {
                if (members[g] == 0)
                {
                    throw new ArgumentException($"constraint column {g} is (numerically) a combination of the previous ones");
                }

                // As the explicit path: the norm of the column, 1/norm per entry, target b_g / norm (the earlier
                // indicator columns are orthogonal to it, so nothing is subtracted).
                var norm = Math.Sqrt(members[g]);
                _groupQ[g] = 1.0 / norm;
                _groupTarget[g] = rhs[g] / norm;
            }
        }

        var dense = columns.Count;
        _q = new double[dense][];
        _target = new double[dense];
        var u = new double[dense][];
        for (var j = 0; j < dense; j++)
        {
            var a = columns[j] ?? throw new ArgumentException($"constraint column {groupCount + j} is null");
            if (a.Length != count)
            {
                throw new ArgumentException($"constraint column {groupCount + j} has {a.Length} entries, expected {count}");
            }

            var v = (double[])a.Clone();
            var norm0 = Norm(v);
            u[j] = new double[groupCount + j + 1];
            for (var pass = 0; pass < 2; pass++)
            {
                GroupDots(v);
                for (var g = 0; g < groupCount; g++)
                {
                    u[j][g] += _groupDot[g];
                }

                GroupUpdate(v, -1.0);
                for (var i = 0; i < j; i++)
                {
                    var d = Dot(_q[i], v);
                    u[j][groupCount + i] += d;
                    Axpy(-d, _q[i], v);
                }
            }

            var norm = Norm(v);
            if (!(norm > 1e-10 * norm0))
            {
                throw new ArgumentException($"constraint column {groupCount + j} is (numerically) a combination of the previous ones");
            }

            u[j][groupCount + j] = norm;
            for (var i = 0; i < count; i++)
            {
                v[i] /= norm;
            }

            _q[j] = v;
        }

        // Forward substitution for Uᵀ c = b (Uᵀ is lower triangular); the indicators' targets are set above.
        for (var j = 0; j < dense; j++)
        {
            var s = rhs[groupCount + j];
            for (var i = 0; i < groupCount; i++)
            {
                s -= u[j][i] * _groupTarget[i];
            }

            for (var i = 0; i < j; i++)
            {
                s -= u[j][groupCount + i] * _target[i];
            }

            _target[j] = s / u[j][groupCount + j];
        }
    }

    public int ConstraintCount => _groupQ.Length + _q.Length;

    /// <summary>h₀ = A(AᵀA)⁻¹b, the smallest-norm weights meeting the constraints.</summary>
    public double[] ParticularSolution()
    {
        var h = new double[_count];
        if (_group is not null)
        {
            for (var i = 0; i < h.Length; i++)
            {
                var g = _group[i];
                h[i] += _groupTarget[g] * _groupQ[g];
            }
        }

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
            GroupDots(v);
            GroupUpdate(v, -1.0);
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
            GroupDots(h);
            for (var g = 0; g < _groupDot.Length; g++)
            {
                _groupDot[g] = _groupTarget[g] - _groupDot[g];
            }

            GroupUpdate(h, 1.0);
            for (var j = 0; j < _q.Length; j++)
            {
                Axpy(_target[j] - Dot(_q[j], h), _q[j], h);
            }
        }
    }

    /// <summary>True when the all-ones vector lies in range(A), i.e. the weights must sum to zero.</summary>
    public bool ContainsOnes()
    {
        var ones = new double[_count];
        Array.Fill(ones, 1.0);
        Project(ones);
        return Norm(ones) <= 1e-9 * Math.Sqrt(_count);
    }

    /// <summary>_groupDot[g] = Σ over the members of g, in index order, of q_g · v_i.</summary>
    private void GroupDots(double[] v)
    {
        if (_group is null)
        {
            return;
        }

        Array.Clear(_groupDot);
        for (var i = 0; i < v.Length; i++)
        {
            var g = _group[i];
            _groupDot[g] += _groupQ[g] * v[i];
        }
    }

    /// <summary>v_i += (sign · _groupDot[g]) · q_g for every member i of each group g, as Axpy with the explicit column.</summary>
    private void GroupUpdate(double[] v, double sign)
    {
        if (_group is null)
        {
            return;
        }

        for (var i = 0; i < v.Length; i++)
        {
            var g = _group[i];
            v[i] += (sign * _groupDot[g]) * _groupQ[g];
        }
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
