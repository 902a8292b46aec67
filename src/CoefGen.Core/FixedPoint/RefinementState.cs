using CoefGen.Core.Noise;

namespace CoefGen.Core.FixedPoint;

/// <summary>
/// Integer weights with their gradient g = R c, noise q = c^T R c and gain G = sum c s, kept up to date in O(N)
/// per pairwise move (c_i + 1, c_j - 1): dq = 2 (g_i - g_j) + R_ii + R_jj - 2 R_ij, dG = s_i - s_j.
/// </summary>
internal sealed class RefinementState
{
    private readonly SampledCovariance _r;
    private readonly IReadOnlyList<double> _step;
    private double _q;
    private double _gain;

    public RefinementState(long[] c, IReadOnlyList<double> step, SampledCovariance r)
    {
        C = c;
        _r = r;
        _step = step;
        var n = c.Length;
        G = new double[n];
        var lag = r.TotalLag;
        var index = r.SampleIndex;
        for (var i = 0; i < n; i++)
        {
            // Exact O(N^2) product over the lag table (no FFT: the moves compare changes of order 1e-12 of q).
            var acc = r.DigitalVarianceV2 * c[i];
            var ni = index[i];
            for (var j = 0; j < n; j++)
            {
                acc += lag[Math.Abs(index[j] - ni)] * c[j];
            }

            G[i] = acc;
            _q += c[i] * acc;
            _gain += c[i] * step[i];
        }
    }

    public long[] C { get; }

    public double[] G { get; }

    /// <summary>Noise variance at unit gain, q / G^2 (the quantity the refinement lowers).</summary>
    public double Objective => _q / (_gain * _gain);

    public double ObjectiveAfter(int up, int down)
    {
        var dq = (2 * (G[up] - G[down])) + _r.At(up, up) + _r.At(down, down) - (2 * _r.At(up, down));
        var gain = _gain + _step[up] - _step[down];
        return gain > 0 ? (_q + dq) / (gain * gain) : double.PositiveInfinity;
    }

    public void Apply(int up, int down)
    {
        _q += (2 * (G[up] - G[down])) + _r.At(up, up) + _r.At(down, down) - (2 * _r.At(up, down));
        _gain += _step[up] - _step[down];
        C[up]++;
        C[down]--;
        var lag = _r.TotalLag;
        var index = _r.SampleIndex;
        var nu = index[up];
        var nd = index[down];
        for (var k = 0; k < C.Length; k++)
        {
            G[k] += lag[Math.Abs(index[k] - nu)] - lag[Math.Abs(index[k] - nd)];
        }

        G[up] += _r.DigitalVarianceV2;
        G[down] -= _r.DigitalVarianceV2;
    }
}
