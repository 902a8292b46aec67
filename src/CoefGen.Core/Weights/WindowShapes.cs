namespace CoefGen.Core.Weights;

/// <summary>
/// Window shapes w_k (k = 0..N-1) for the weighted scheme. Every shape is positive at both ends (no
/// sample is wasted) and is built by computing the first ceil(N/2) values and mirroring them, so
/// w_k == w_{N-1-k} holds bit for bit.
/// </summary>
public static class WindowShapes
{
    /// <summary>Triangle: w_k = min(k + 1, N - k) / ceil(N/2); 1 at the centre, 1/ceil(N/2) at the ends.</summary>
    public static double[] Triangle(int count)
    {
        var peak = (count + 1) / 2;
        return Mirrored(count, k => (k + 1) / (double)peak);
    }

    /// <summary>Hann without zero ends: w_k = sin^2(pi (k + 1) / (N + 1)).</summary>
    public static double[] Hann(int count)
    {
        return Mirrored(count, k =>
        {
            var s = Math.Sin(Math.PI * (k + 1) / (count + 1));
            return s * s;
        });
    }

    /// <summary>
    /// Trapezoid: linear ramps of <paramref name="rampSamples"/> samples at each end, w_k = (k + 1)/(R + 1)
    /// for k &lt; R, then a flat top of 1: w_k = min(1, (k + 1)/(R + 1), (N - k)/(R + 1)). A ramp of 0
    /// means automatic, R = max(1, N/8). Ramps longer than half the window meet in a clipped triangle.
    /// </summary>
    public static double[] Trapezoid(int count, int rampSamples)
    {
        var ramp = EffectiveRamp(count, rampSamples);
        return Mirrored(count, k => Math.Min(1.0, (k + 1) / (double)(ramp + 1)));
    }

    /// <summary>The ramp length the trapezoid uses: <paramref name="rampSamples"/>, or max(1, N/8) when it is 0.</summary>
    public static int EffectiveRamp(int count, int rampSamples)
    {
        if (rampSamples < 0)
        {
            throw new ArgumentOutOfRangeException(nameof(rampSamples), rampSamples, "ramp length must be >= 0 (0 = automatic)");
        }

        return rampSamples == 0 ? Math.Max(1, count / 8) : rampSamples;
    }

    private static double[] Mirrored(int count, Func<int, double> firstHalf)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(count, 1);
        var w = new double[count];
        for (var k = 0; k < (count + 1) / 2; k++)
        {
            w[k] = firstHalf(k);
            w[count - 1 - k] = w[k];
        }

        return w;
    }
}
