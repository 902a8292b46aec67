namespace CoefGen.Core.Study;

/// <summary>
/// Read noise against read count (<see cref="ReadCountStudy"/>): one design per read count, and the white-noise law of
/// the plain average through its first valid point, to show where correlated (1/f) noise makes more reads stop paying.
/// </summary>
public sealed record ReadCountCurve(ReadCountAxis Axis, IReadOnlyList<ReadCountPoint> Points, ReadCountLaw Law)
{
    /// <summary>The law's value at <paramref name="reads"/>, through the plain average (boxcar) of the first valid point; null without one.</summary>
    public double? Reference(int reads)
    {
        var first = Points.FirstOrDefault(p => p.Valid && (Law == ReadCountLaw.InverseSqrt || p.Reads >= 2));
        if (first is null)
        {
            return null;
        }

        var sigma = first.Schemes.First(s => s.Scheme == Readout.WeightScheme.Boxcar).NoiseElectrons;
        return Law == ReadCountLaw.InverseSqrt
            ? sigma * Math.Sqrt((double)first.Reads / reads)
            : reads < 2 ? null : sigma * Math.Sqrt(RampFactor(first.Reads) / RampFactor(reads));
    }

    /// <summary>n (n^2 - 1): the unweighted slope's variance is 12 sigma^2 dt^-2 over it.</summary>
    private static double RampFactor(int n) => (double)n * (((double)n * n) - 1);
}
