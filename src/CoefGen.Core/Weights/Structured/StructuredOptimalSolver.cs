using System.Globalization;
using CoefGen.Core.Noise;

namespace CoefGen.Core.Weights.Structured;

/// <summary>
/// Minimum-variance weights min hᵀRh subject to Aᵀh = b for many samples, without ever forming R.
/// The samples sit on a uniform grid, so R is a principal submatrix of the symmetric Toeplitz matrix of
/// the whole span (gap included): R·v costs two FFTs of length ≥ 2·span (circulant embedding). The
/// minimiser is found by projected preconditioned conjugate gradients on null(Aᵀ) starting from
/// h₀ = A(AᵀA)⁻¹b, which needs R positive definite only on that null space (PHYSICS.md §5).
/// Memory O(span) per vector; work O(iterations · span · log span).
/// </summary>
public static class StructuredOptimalSolver
{
    /// <summary>Default iteration cap (all restarts together); measured needs are far below it.</summary>
    public const int DefaultMaxIterations = 5000;

    private const int MaxRestarts = 4;

    /// <summary>Solves with the preconditioner measured to be fastest (T. Chan circulant per run).</summary>
    /// <param name="r">Covariance at the weighted samples (stationary, uniform grid).</param>
    /// <param name="constraintColumns">Columns of A (each r.Count long): ones, step response, optionally centred times.</param>
    /// <param name="rhs">b: 0 for offset and drift rejection, 1 for unit gain.</param>
    /// <param name="relativeTolerance">Stop when ‖P R h‖ ≤ tol · ‖R h‖.</param>
    /// <param name="maxIterations">Cap on CG iterations.</param>
    public static StructuredSolution Solve(
        SampledCovariance r,
        IReadOnlyList<double[]> constraintColumns,
        IReadOnlyList<double> rhs,
        double relativeTolerance = 1e-13,
        int maxIterations = DefaultMaxIterations) =>
        Solve(r, constraintColumns, rhs, PreconditionerKind.TChanCirculant, relativeTolerance, maxIterations);

    /// <summary>As <see cref="Solve(SampledCovariance, IReadOnlyList{double[]}, IReadOnlyList{double}, double, int)"/> with a chosen preconditioner (for measurement).</summary>
    public static StructuredSolution Solve(
        SampledCovariance r,
        IReadOnlyList<double[]> constraintColumns,
        IReadOnlyList<double> rhs,
        PreconditionerKind preconditioner,
        double relativeTolerance = 1e-13,
        int maxIterations = DefaultMaxIterations)
    {
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(constraintColumns);
        ArgumentNullException.ThrowIfNull(rhs);
        if (r.Count < 1)
        {
            throw new ArgumentException("covariance has no samples", nameof(r));
        }

        return Solve(r, new ConstraintProjector(constraintColumns, rhs, r.Count), preconditioner, relativeTolerance, maxIterations);
    }

    /// <summary>As the public solve, with the constraints of a <see cref="ConstraintSystem"/> (group indicators kept implicit).</summary>
    internal static StructuredSolution Solve(SampledCovariance r, ConstraintSystem system, double relativeTolerance = 1e-13, int maxIterations = DefaultMaxIterations)
    {
        ArgumentNullException.ThrowIfNull(r);
        ArgumentNullException.ThrowIfNull(system);
        if (r.Count < 1)
        {
            throw new ArgumentException("covariance has no samples", nameof(r));
        }

        var projector = new ConstraintProjector(system.Group, system.GroupCount, system.DenseColumns, system.Rhs, r.Count);
        return Solve(r, projector, PreconditionerKind.TChanCirculant, relativeTolerance, maxIterations);
    }

    private static StructuredSolution Solve(SampledCovariance r, ConstraintProjector projector, PreconditionerKind preconditioner, double relativeTolerance, int maxIterations)
    {
        if (!(relativeTolerance > 0) || maxIterations < 0)
        {
            throw new ArgumentException("tolerance must be > 0 and the iteration cap >= 0");
        }

        var positions = Positions(r.SampleIndex);
        var lag = SpanLags(r.TotalLag, positions[^1] + 1, projector.ContainsOnes());
        var op = new SymmetricToeplitzOperator(lag, positions, r.DigitalVarianceV2);
        var m = preconditioner == PreconditionerKind.None
            ? null
            : new RunCirculantPreconditioner(lag, r.DigitalVarianceV2, Runs(positions), preconditioner);

        var x = projector.ParticularSolution();
        var pcg = new ProjectedConjugateGradient(op, projector, m);
        string? failure = null;
        var iterations = 0;
        for (var restart = 0; restart <= MaxRestarts; restart++)
        {
            var outcome = pcg.Run(x, relativeTolerance, maxIterations - iterations, out var used);
            iterations += used;
            if (outcome != ProjectedConjugateGradient.Outcome.Converged)
            {
                failure = outcome == ProjectedConjugateGradient.Outcome.NotPositiveDefinite
                    ? "the covariance is not positive definite on the null space of the constraints (pᵀRp <= 0)"
                    : string.Create(CultureInfo.InvariantCulture, $"reached the iteration cap ({maxIterations}) before the relative residual met {relativeTolerance:G3}");
                break;
            }

            projector.Restore(x);
            if (pcg.TrueResidual(x) <= relativeTolerance)
            {
                break;
            }

            if (restart == MaxRestarts)
            {
                failure = string.Create(CultureInfo.InvariantCulture, $"the recomputed residual stalled above {relativeTolerance:G3} after {MaxRestarts} restarts");
            }
        }

        projector.Restore(x);
        var residual = pcg.TrueResidual(x);
        var variance = ConstraintProjector.Dot(x, pcg.LastProduct); // R x of the residual just computed
        if (failure is null && residual > relativeTolerance)
        {
            failure = string.Create(CultureInfo.InvariantCulture, $"relative residual {residual:G3} above {relativeTolerance:G3}");
        }

        if (failure is null && !(variance > 0))
        {
            failure = string.Create(CultureInfo.InvariantCulture, $"variance hᵀRh = {variance:G3} is not positive");
        }

        return new StructuredSolution(x, variance, iterations, residual, failure, preconditioner);
    }

    private static int[] Positions(IReadOnlyList<int> index)
    {
        var p = new int[index.Count];
        for (var i = 0; i < p.Length; i++)
        {
            p[i] = index[i] - index[0];
            if (i > 0 && p[i] <= p[i - 1])
            {
                throw new ArgumentException("sample indices must be strictly increasing");
            }
        }

        return p;
    }

    /// <summary>
    /// The lags of the span. When Σh = 0 is a constraint, a lag-independent constant c changes neither
    /// hᵀRh nor the gradient on the feasible set (PHYSICS.md §5), so the smallest lag is taken out when
    /// all are positive: this keeps a large 1/f constant from swamping the FFT products' round-off.
    /// </summary>
    private static double[] SpanLags(double[] totalLag, int span, bool sumIsZero)
    {
        var lag = new double[span];
        Array.Copy(totalLag, lag, span);
        if (sumIsZero)
        {
            var min = lag.Min();
            if (min > 0)
            {
                for (var k = 0; k < span; k++)
                {
                    lag[k] -= min;
                }
            }
        }

        return lag;
    }

    private static List<(int Start, int Length)> Runs(int[] positions)
    {
        var runs = new List<(int, int)>();
        var start = 0;
        for (var i = 1; i <= positions.Length; i++)
        {
            if (i == positions.Length || positions[i] != positions[i - 1] + 1)
            {
                runs.Add((start, i - start));
                start = i;
            }
        }

        return runs;
    }
}
