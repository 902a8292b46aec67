namespace CoefGen.Core.Noise;

/// <summary>
/// The noise covariance at the weighted sample instants, stored as one value per lag (the noise is
/// stationary and the samples sit on the ADC clock grid): R_ij = Lag[|n_i - n_j|] + delta_ij * Digital,
/// with n_i the cycle index of sample i. Each analog component is kept separately for the budget.
/// Analog lag values may have a lag-independent constant removed (1/f): any weights with sum h = 0
/// see exactly the same variance.
/// </summary>
public sealed class SampledCovariance
{
    private readonly int[] _index;
    private Weights.Structured.Fft? _fft;

    public SampledCovariance(IReadOnlyList<int> sampleIndex, IReadOnlyList<CovarianceComponent> components, double digitalVarianceV2)
    {
        ArgumentNullException.ThrowIfNull(sampleIndex);
        ArgumentNullException.ThrowIfNull(components);
        _index = [.. sampleIndex];
        Components = components;
        DigitalVarianceV2 = digitalVarianceV2;
        var maxLag = _index.Length == 0 ? 0 : _index[^1] - _index[0];
        TotalLag = new double[maxLag + 1];
        foreach (var c in components)
        {
            if (c.Lag.Count < maxLag + 1)
            {
                throw new ArgumentException($"component '{c.Name}' has {c.Lag.Count} lags, need {maxLag + 1}");
            }

            for (var k = 0; k <= maxLag; k++)
            {
                TotalLag[k] += c.Lag[k];
            }
        }
    }

    public IReadOnlyList<CovarianceComponent> Components { get; }

    /// <summary>
    /// Shot noise of an integrating charge (ramp windows), or null. It is not stationary, so it is not in the lag
    /// tables, <see cref="At"/> or the components: <see cref="QuadraticForm(IReadOnlyList{double})"/> and
    /// <see cref="FullAt"/> include it; the stationary-only consumers (structured solver, vector sampler) must not
    /// be used when it is present.
    /// </summary>
    public ShotNoiseCovariance? Shot { get; private init; }

    /// <summary>The same covariance with a shot-noise term (replacing any).</summary>
    public SampledCovariance WithShot(ShotNoiseCovariance? shot) => new(_index, Components, DigitalVarianceV2) { Shot = shot };

    /// <summary>Entry R_ij including the digital diagonal and the shot term.</summary>
    public double FullAt(int i, int j) => At(i, j) + (Shot?.At(i, j) ?? 0.0);

    /// <summary>White digital variance per sample in V^2 (quantisation + ADC noise).</summary>
    public double DigitalVarianceV2 { get; }

    /// <summary>Sum of the analog components' lag values.</summary>
    public double[] TotalLag { get; }

    public int Count => _index.Length;

    public IReadOnlyList<int> SampleIndex => _index;

    /// <summary>Entry R_ij including the digital diagonal.</summary>
    public double At(int i, int j) => TotalLag[Math.Abs(_index[i] - _index[j])] + (i == j ? DigitalVarianceV2 : 0.0);

    /// <summary>The dense matrix (reference path; O(N^2) memory).</summary>
    public double[,] ToDense()
    {
        var n = Count;
        var m = new double[n, n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                m[i, j] = At(i, j);
            }
        }

        return m;
    }

    /// <summary>h^T R h with the digital diagonal.</summary>
    public double QuadraticForm(IReadOnlyList<double> h) => QuadraticForm(h, TotalLag) + DigitalPart(h) + (Shot?.QuadraticForm(h) ?? 0.0);

    /// <summary>h^T C_c h for every analog component, in order, from one pass over the weights.</summary>
    public double[] ComponentQuadraticForms(IReadOnlyList<double> h)
    {
        var a = LagProducts(h);
        var result = new double[Components.Count];
        for (var c = 0; c < result.Length; c++)
        {
            var lag = Components[c].Lag;
            var total = 0.0;
            for (var k = 0; k < a.Length; k++)
            {
                total += lag[k] * a[k];
            }

            result[c] = total;
        }

        return result;
    }

    /// <summary>h^T C_c h for one analog component.</summary>
    public double ComponentQuadraticForm(IReadOnlyList<double> h, int component) => QuadraticForm(h, Components[component].Lag);

    /// <summary>Digital part sigma_d^2 * sum h^2.</summary>
    public double DigitalPart(IReadOnlyList<double> h)
    {
        ArgumentNullException.ThrowIfNull(h);
        var s = 0.0;
        for (var i = 0; i < h.Count; i++)
        {
            s += h[i] * h[i];
        }

        return s * DigitalVarianceV2;
    }

    private double QuadraticForm(IReadOnlyList<double> h, IReadOnlyList<double> lag)
    {
        var a = LagProducts(h);
        var total = 0.0;
        for (var k = 0; k < a.Length; k++)
        {
            total += lag[k] * a[k];
        }

        return total;
    }

    /// <summary>
    /// a[k] = sum of h_i h_j over ordered pairs with |n_i - n_j| = k (a[0] = sum h^2), so that
    /// h^T C h = sum_k Lag[k] a[k]: one O(N^2) pass over plain arrays per weight vector, then O(span) per component.
    /// </summary>
    private double[] LagProducts(IReadOnlyList<double> h)
    {
        ArgumentNullException.ThrowIfNull(h);
        if (h.Count != Count)
        {
            throw new ArgumentException($"weight vector has {h.Count} entries, covariance {Count}");
        }

        if (h.Count > ExactLagProductLimit)
        {
            return LagProductsByFft(h);
        }

        ReadOnlySpan<double> w = h as double[] ?? [.. h];
        ReadOnlySpan<int> index = _index;
        var a = new double[TotalLag.Length];
        unchecked
        {
            for (var i = 0; i < w.Length; i++)
            {
                var hi2 = 2 * w[i];
                var ni = index[i];
                a[0] += w[i] * w[i];
                for (var j = i + 1; j < w.Length; j++)
                {
                    a[index[j] - ni] += hi2 * w[j];
                }
            }
        }

        return a;
    }

    /// <summary>
    /// Above this many weights the lag products come from an FFT autocorrelation (O(span log span)) instead of
    /// the exact O(N^2) pair loop; the roundoff is ~1e-16 * span / N relative to the variance.
    /// </summary>
    public const int ExactLagProductLimit = 4096;

    private double[] LagProductsByFft(IReadOnlyList<double> h)
    {
        var span = TotalLag.Length;
        var length = 1;
        while (length < 2 * span)
        {
            length *= 2;
        }

        var re = new double[length];
        var im = new double[length];
        for (var i = 0; i < h.Count; i++)
        {
            re[_index[i] - _index[0]] = h[i];
        }

        // The transform's tables depend on the length only; they are made once per covariance and only read after.
        var fft = _fft is { } made && made.Length == length ? made : _fft = new Weights.Structured.Fft(length);
        fft.Forward(re, im);
        for (var k = 0; k < length; k++)
        {
            re[k] = (re[k] * re[k]) + (im[k] * im[k]);
            im[k] = 0;
        }

        fft.Inverse(re, im);
        var a = new double[span];
        a[0] = re[0];
        for (var k = 1; k < span; k++)
        {
            a[k] = 2 * re[k];
        }

        return a;
    }
}
