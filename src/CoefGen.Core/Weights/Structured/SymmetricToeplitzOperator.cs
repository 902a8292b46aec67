namespace CoefGen.Core.Weights.Structured;

/// <summary>
/// y = (T + d I) x restricted to a set of positions of a span, where T is the span's symmetric
/// Toeplitz matrix T_pq = lag[|p - q|]. The span matrix is embedded in a circulant of power-of-two
/// length L ≥ 2·span; its eigenvalues are real because the embedding is symmetric, so one complex
/// transform carries two real vectors at once (real and imaginary parts). O(L) memory, O(L log L) work.
/// Not thread-safe: it owns its work arrays.
/// </summary>
internal sealed class SymmetricToeplitzOperator
{
    private readonly int[] _positions;
    private readonly double[] _eigen;
    private readonly double[] _re;
    private readonly double[] _im;
    private readonly Fft _fft;

    /// <param name="lag">lag[k] for k = 0 .. span-1.</param>
    /// <param name="positions">Strictly increasing positions in [0, span).</param>
    /// <param name="diagonal">Added on the diagonal of the restricted matrix (digital variance).</param>
    public SymmetricToeplitzOperator(IReadOnlyList<double> lag, int[] positions, double diagonal)
    {
        var span = lag.Count;
        _positions = positions;
        Diagonal = diagonal;
        var length = 1;
        while (length < 2 * span)
        {
            length = checked(length * 2);
        }

        _fft = new Fft(length);
        _re = new double[length];
        _im = new double[length];
        _eigen = new double[length];
        _eigen[0] = lag[0];
        for (var k = 1; k < span; k++)
        {
            _eigen[k] = lag[k];
            _eigen[length - k] = lag[k];
        }

        var im = new double[length];
        _fft.Forward(_eigen, im);
    }

    public double Diagonal { get; }

    public int Count => _positions.Length;

    /// <summary>Circulant embedding length (power of two).</summary>
    public int EmbeddingLength => _fft.Length;

    public void Apply(double[] x, double[] result) => Apply(x, result, null, null);

    /// <summary>Applies the operator to x and, when given, to a second vector y in the same transforms.</summary>
    public void Apply(double[] x, double[] resultX, double[]? y, double[]? resultY)
    {
        Array.Clear(_re);
        Array.Clear(_im);
        for (var i = 0; i < _positions.Length; i++)
        {
            _re[_positions[i]] = x[i];
            if (y is not null)
            {
                _im[_positions[i]] = y[i];
            }
        }

        _fft.Forward(_re, _im);
        for (var k = 0; k < _re.Length; k++)
        {
            _re[k] *= _eigen[k];
            _im[k] *= _eigen[k];
        }

        _fft.Inverse(_re, _im);
        for (var i = 0; i < _positions.Length; i++)
        {
            resultX[i] = _re[_positions[i]] + (Diagonal * x[i]);
            if (y is not null)
            {
                resultY![i] = _im[_positions[i]] + (Diagonal * y[i]);
            }
        }
    }
}
