namespace CoefGen.Core.Weights.Structured;

/// <summary>
/// Projected preconditioned CG for min hᵀRh on an affine set h₀ + null(Aᵀ): the search directions are
/// P M⁻¹ r with P = I − QQᵀ, which is symmetric positive definite on the null space whenever M⁻¹ is.
/// The residual is recomputed as −P(Rh) from a running R·h, so it cannot drift away from the gradient.
/// </summary>
internal sealed class ProjectedConjugateGradient
{
    private readonly SymmetricToeplitzOperator _op;
    private readonly ConstraintProjector _projector;
    private readonly RunCirculantPreconditioner? _preconditioner;
    private readonly double[] _rx;
    private readonly double[] _r;
    private readonly double[] _y;
    private readonly double[] _p;
    private readonly double[] _q;

    public ProjectedConjugateGradient(SymmetricToeplitzOperator op, ConstraintProjector projector, RunCirculantPreconditioner? preconditioner)
    {
        _op = op;
        _projector = projector;
        _preconditioner = preconditioner;
        var n = op.Count;
        _rx = new double[n];
        _r = new double[n];
        _y = new double[n];
        _p = new double[n];
        _q = new double[n];
    }

    public enum Outcome
    {
        Converged,
        IterationCap,
        NotPositiveDefinite,
    }

    /// <summary>Iterates from x (updated in place) until ‖P R x‖ ≤ tol ‖R x‖ or the cap.</summary>
    public Outcome Run(double[] x, double tolerance, int cap, out int iterations)
    {
        iterations = 0;
        _op.Apply(x, _rx);
        if (Residual() <= tolerance)
        {
            return Outcome.Converged;
        }

        Precondition();
        Array.Copy(_y, _p, _p.Length);
        var rho = ConstraintProjector.Dot(_r, _y);
        while (iterations < cap)
        {
            _op.Apply(_p, _q);
            var curvature = ConstraintProjector.Dot(_p, _q);
            if (!(curvature > 0))
            {
                return Outcome.NotPositiveDefinite;
            }

            var alpha = rho / curvature;
            ConstraintProjector.Axpy(alpha, _p, x);
            ConstraintProjector.Axpy(alpha, _q, _rx);
            iterations++;
            if (Residual() <= tolerance)
            {
                return Outcome.Converged;
            }

            Precondition();
            var rhoNew = ConstraintProjector.Dot(_r, _y);
            var beta = rhoNew / rho;
            rho = rhoNew;
            for (var i = 0; i < _p.Length; i++)
            {
                _p[i] = _y[i] + (beta * _p[i]);
            }
        }

        return Outcome.IterationCap;
    }

    /// <summary>R x of the last <see cref="TrueResidual"/> (or the running product of the last <see cref="Run"/>).</summary>
    public double[] LastProduct => _rx;

    /// <summary>‖P R x‖ / ‖R x‖ with R x recomputed from scratch.</summary>
    public double TrueResidual(double[] x)
    {
        _op.Apply(x, _rx);
        return Residual();
    }

    /// <summary>r = −P(Rx); returns ‖r‖/‖Rx‖ (0 when Rx = 0).</summary>
    private double Residual()
    {
        for (var i = 0; i < _r.Length; i++)
        {
            _r[i] = -_rx[i];
        }

        _projector.Project(_r);
        var scale = ConstraintProjector.Norm(_rx);
        return scale > 0 ? ConstraintProjector.Norm(_r) / scale : 0.0;
    }

    /// <summary>y = P M⁻¹ r.</summary>
    private void Precondition()
    {
        if (_preconditioner is null)
        {
            Array.Copy(_r, _y, _y.Length);
        }
        else
        {
            _preconditioner.Apply(_r, _y);
        }

        _projector.Project(_y);
    }
}
