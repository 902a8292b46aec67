using CoefGen.Core.Noise;

namespace CoefGen.Core.Weights.TwoStage;

/// <summary>
/// R of N identical reads under stationary noise, block by block without storing the blocks: the block between read
/// j+d and read j is T_d[p, q] = lag(|d P + o_p - o_q|) (+ the digital variance on the diagonal of T_0), so it depends on
/// d and on the offset difference o_p - o_q only. The two small matrices of the alternating design come from it:
/// C_g = sum_d c_d (T_d + T_d^T) (T_0 once) entry by entry from one sum per offset difference, O(N * P + m^2), and
/// tau_d = g^T T_d g, O(N m^2); each value is summed in the order of the former dense-block loops, so the designs are
/// the same doubles as before, without the N m^2 doubles of stored blocks (128 MB at 1000 reads of 128 samples).
/// </summary>
internal sealed class ReadBlocks
{
    private readonly double[] _lag;
    private readonly double _digital;
    private readonly int _period;
    private readonly int[] _offsets;

    public ReadBlocks(ReadLayout layout, SampledCovariance r)
    {
        ArgumentNullException.ThrowIfNull(layout);
        ArgumentNullException.ThrowIfNull(r);
        Reads = layout.Reads;
        _period = layout.Period;
        _offsets = [.. layout.Offsets];
        _lag = r.TotalLag;
        _digital = r.DigitalVarianceV2;
    }

    public int Reads { get; }

    public int PerRead => _offsets.Length;

    /// <summary>C_g = sum_d c_d T_d (T_d + T_d^T for d > 0), row-major m x m.</summary>
    /// <param name="c">c_d for d = 0 .. N-1.</param>
    public double[] TableMatrix(double[] c)
    {
        var m = PerRead;
        // Every entry with the same offset difference o_p - o_q (p != q) gets the same sum; the diagonal adds the digital
        // variance to T_0's lag. Offsets lie in [0, P), so differences lie in (-P, P).
        var span = _period - 1;
        var byDifference = new double[(2 * span) + 1];
        var needed = new bool[byDifference.Length];
        for (var p = 0; p < m; p++)
        {
            for (var q = 0; q < m; q++)
            {
                if (p != q)
                {
                    needed[_offsets[p] - _offsets[q] + span] = true;
                }
            }
        }

        for (var k = 0; k < needed.Length; k++)
        {
            if (needed[k])
            {
                byDifference[k] = Sum(c, k - span, diagonal: false);
            }
        }

        var diagonal = Sum(c, 0, diagonal: true);
        var result = new double[m * m];
        for (var p = 0; p < m; p++)
        {
            for (var q = 0; q < m; q++)
            {
                result[(p * m) + q] = p == q ? diagonal : byDifference[_offsets[p] - _offsets[q] + span];
            }
        }

        return result;
    }

    /// <summary>tau_d = g^T T_d g for d = 0 .. N-1.</summary>
    public double[] ReadCovariance(double[] g)
    {
        var m = PerRead;
        var tau = new double[Reads];
        for (var d = 0; d < Reads; d++)
        {
            var shift = d * _period;
            var s = 0.0;
            for (var p = 0; p < m; p++)
            {
                var row = 0.0;
                for (var q = 0; q < m; q++)
                {
                    var t = _lag[Math.Abs(shift + _offsets[p] - _offsets[q])] + (d == 0 && p == q ? _digital : 0.0);
                    row += t * g[q];
                }

                s += g[p] * row;
            }

            tau[d] = s;
        }

        return tau;
    }

    /// <summary>sum_d c_d T_d[p, q] (+ T_d[q, p] for d > 0) for an entry whose offset difference is <paramref name="delta"/>.</summary>
    private double Sum(double[] c, int delta, bool diagonal)
    {
        var total = 0.0;
        for (var d = 0; d < c.Length; d++)
        {
            var shift = d * _period;
            var forward = _lag[Math.Abs(shift + delta)] + (d == 0 && diagonal ? _digital : 0.0);
            total += d == 0 ? c[d] * forward : c[d] * (forward + (_lag[Math.Abs(shift - delta)] + 0.0));
        }

        return total;
    }
}
