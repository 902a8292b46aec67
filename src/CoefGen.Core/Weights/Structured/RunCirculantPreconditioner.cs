namespace CoefGen.Core.Weights.Structured;

/// <summary>
/// Block-diagonal preconditioner: one circulant approximation per contiguous run of samples
/// (reset window, signal window), inverting that run's own Toeplitz block T_n + dI. The coupling
/// between runs is left to CG. The inverse of a symmetric circulant is a symmetric circulant, which is
/// itself a symmetric Toeplitz matrix, so it is applied with the same FFT operator as R; runs of equal
/// length share one operator and go through it in pairs (real and imaginary parts).
/// </summary>
internal sealed class RunCirculantPreconditioner
{
    private readonly List<(SymmetricToeplitzOperator Op, List<int> Starts, double[][] Work)> _groups = [];

    public RunCirculantPreconditioner(double[] lag, double diagonal, IReadOnlyList<(int Start, int Length)> runs, PreconditionerKind kind)
    {
        var byLength = new SortedDictionary<int, List<int>>();
        foreach (var (start, length) in runs)
        {
            if (!byLength.TryGetValue(length, out var list))
            {
                byLength[length] = list = [];
            }

            list.Add(start);
        }

        foreach (var (length, starts) in byLength)
        {
            var inverse = InverseCirculantLags(lag, diagonal, length, kind);
            var positions = new int[length];
            for (var i = 0; i < length; i++)
            {
                positions[i] = i;
            }

            _groups.Add((new SymmetricToeplitzOperator(inverse, positions, 0.0), starts, [new double[length], new double[length], new double[length], new double[length]]));
        }
    }

    /// <summary>result = M^-1 x (block-diagonal over the runs).</summary>
    public void Apply(double[] x, double[] result)
    {
        foreach (var (op, starts, work) in _groups)
        {
            var n = op.Count;
            var (a, b, ya, yb) = (work[0], work[1], work[2], work[3]);
            for (var s = 0; s < starts.Count; s += 2)
            {
                var pair = s + 1 < starts.Count;
                Array.Copy(x, starts[s], a, 0, n);
                if (pair)
                {
                    Array.Copy(x, starts[s + 1], b, 0, n);
                }

                op.Apply(a, ya, pair ? b : null, pair ? yb : null);
                Array.Copy(ya, 0, result, starts[s], n);
                if (pair)
                {
                    Array.Copy(yb, 0, result, starts[s + 1], n);
                }
            }
        }
    }

    /// <summary>Lags (first column) of the inverse of the chosen circulant approximation of T_n + dI.</summary>
    private static double[] InverseCirculantLags(double[] lag, double diagonal, int n, PreconditionerKind kind)
    {
        var c = new double[n];
        c[0] = lag[0];
        for (var k = 1; k < n; k++)
        {
            c[k] = kind == PreconditionerKind.StrangCirculant
                ? lag[Math.Min(k, n - k)]
                : (((n - k) * lag[k]) + (k * lag[n - k])) / n; // T. Chan: wrap-around average, symmetric in k <-> n-k.
        }

        var eigen = BluesteinDft.SymmetricCirculantEigenvalues(c);
        var max = double.NegativeInfinity;
        for (var j = 0; j < n; j++)
        {
            eigen[j] += diagonal;
            if (j > 0)
            {
                max = Math.Max(max, eigen[j]);
            }
        }

        // Non-DC modes sum to zero, where R is positive definite, so T. Chan's values are positive there;
        // the DC value carries any lag-independent constant (possibly removed, so possibly <= 0): it is
        // only a scaling of the constant mode, which the constraints mostly remove, so a safe positive
        // stand-in is used. The floor guards Strang's circulant, which can dip below zero.
        if (n == 1)
        {
            max = Math.Abs(eigen[0]) > 0 ? Math.Abs(eigen[0]) : 1.0;
        }

        var floor = max * 1e-12;
        for (var j = 0; j < n; j++)
        {
            if (!(eigen[j] > floor))
            {
                eigen[j] = j == 0 ? max : floor;
            }

            eigen[j] = 1.0 / eigen[j];
        }

        return BluesteinDft.SymmetricCirculantFromEigenvalues(eigen);
    }
}
