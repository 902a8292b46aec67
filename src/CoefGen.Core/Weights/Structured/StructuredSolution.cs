namespace CoefGen.Core.Weights.Structured;

/// <summary>
/// Result of a <see cref="StructuredOptimalSolver"/> solve. Unconverged weights are never handed out as
/// if they were the optimum: <see cref="Weights"/> throws unless <see cref="Converged"/>; the last
/// iterate stays available for diagnosis as <see cref="LastIterate"/>.
/// </summary>
public sealed class StructuredSolution
{
    private readonly double[] _weights;

    internal StructuredSolution(double[] weights, double varianceV2, int iterations, double relativeResidual, string? failure, PreconditionerKind preconditioner)
    {
        _weights = weights;
        VarianceV2 = varianceV2;
        Iterations = iterations;
        RelativeResidual = relativeResidual;
        Failure = failure;
        Preconditioner = preconditioner;
    }

    /// <summary>True when the relative residual met the tolerance and hᵀRh is positive.</summary>
    public bool Converged => Failure is null;

    /// <summary>Why the solve did not converge (null when it did).</summary>
    public string? Failure { get; }

    /// <summary>The optimal weights h (sample order of the covariance). Throws when not converged.</summary>
    public IReadOnlyList<double> Weights => Converged
        ? _weights
        : throw new InvalidOperationException($"structured optimal solve did not converge: {Failure}");

    /// <summary>The final iterate whether or not it converged (it always meets the constraints).</summary>
    public IReadOnlyList<double> LastIterate => _weights;

    /// <summary>hᵀRh of the last iterate in V², digital diagonal included.</summary>
    public double VarianceV2 { get; }

    /// <summary>Conjugate-gradient iterations used (all restarts together).</summary>
    public int Iterations { get; }

    /// <summary>‖P R h‖₂ / ‖R h‖₂ recomputed from the returned h: the part of the gradient not balanced by the constraints.</summary>
    public double RelativeResidual { get; }

    public PreconditionerKind Preconditioner { get; }
}
