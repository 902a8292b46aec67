using CoefGen.Core.Weights;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace CoefGen.Core.Tests.Weights;

public class WeightPropertyTests
{
    // Relative roundoff allowance; the constraints are linear and solved by orthogonal transformations.
    private const double ConstraintTolerance = 1e-12;

    private static bool MeetsConstraints(RandomCase c, WeightSet w)
    {
        var res = ConstraintResiduals.Of(c.Grid, w.H);
        return res.Offset < ConstraintTolerance && res.Gain < ConstraintTolerance && (!c.RejectDrift || res.Drift < ConstraintTolerance);
    }

    [Property(MaxTest = 300)]
    public Property Every_scheme_meets_its_constraints() =>
        Prop.ForAll(RandomCase.Arbitrary(), c =>
            WeightSchemes.ComputeAll(c.Grid, c.Covariance, c.Spec).All(w => MeetsConstraints(c, w)));

    [Property(MaxTest = 300)]
    public Property Optimal_variance_is_never_above_boxcar_or_weighted() =>
        Prop.ForAll(RandomCase.Arbitrary(), c =>
        {
            var r = c.Covariance;
            var all = WeightSchemes.ComputeAll(c.Grid, r, c.Spec);
            var optimal = r.QuadraticForm(all[2].H);
            // Tolerance 1e-12 relative for roundoff in the quadratic forms.
            return optimal <= r.QuadraticForm(all[0].H) * (1 + 1e-12) && optimal <= r.QuadraticForm(all[1].H) * (1 + 1e-12);
        });

    [Property(MaxTest = 100)]
    public Property Drift_rejection_never_lowers_the_optimal_variance() =>
        Prop.ForAll(RandomCase.Arbitrary(), c =>
        {
            // An extra constraint can only raise the minimum (common practice, no source). Tolerance 1e-12 relative.
            if (c.Grid.Windows[0].Count < 2 || c.Grid.Windows[1].Count < 2)
            {
                return true;
            }

            var free = OptimalWeights.Compute(c.Grid, c.Covariance, false).VarianceV2;
            var constrained = OptimalWeights.Compute(c.Grid, c.Covariance, true).VarianceV2;
            return free <= constrained * (1 + 1e-12);
        });
}
