namespace CoefGen.Core.Weights;

/// <summary>
/// The noise covariance restricted to the constraint null space (Z^T R Z) is not numerically
/// positive definite, so the minimum-variance weights are not unique. Physically this means the noise
/// model has no white floor (add ADC noise or quantisation) or the sampled noise is degenerate.
/// </summary>
public sealed class CovarianceNotPositiveDefiniteException : Exception
{
    public CovarianceNotPositiveDefiniteException(int pivotIndex, double pivot, double largestDiagonal)
        : base(string.Create(
            System.Globalization.CultureInfo.InvariantCulture,
            $"noise covariance on the constraint null space is not positive definite: Cholesky pivot {pivotIndex} is {pivot:R} against a largest diagonal of {largestDiagonal:R}; add a white noise floor (ADC noise) to the model"))
    {
        PivotIndex = pivotIndex;
        Pivot = pivot;
        LargestDiagonal = largestDiagonal;
    }

    public CovarianceNotPositiveDefiniteException()
        : this("noise covariance on the constraint null space is not positive definite")
    {
    }

    public CovarianceNotPositiveDefiniteException(string message)
        : base(message)
    {
    }

    public CovarianceNotPositiveDefiniteException(string message, Exception innerException)
        : base(message, innerException)
    {
    }

    /// <summary>Index (within the reduced matrix) of the first failing pivot, or -1.</summary>
    public int PivotIndex { get; } = -1;

    /// <summary>The failing pivot value (before the square root).</summary>
    public double Pivot { get; } = double.NaN;

    /// <summary>Largest diagonal entry of the reduced matrix, for scale.</summary>
    public double LargestDiagonal { get; } = double.NaN;
}
