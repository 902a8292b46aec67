using CoefGen.Core.Prediction;
using CoefGen.Core.Tests.Weights;
using CoefGen.Core.Weights;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;

namespace CoefGen.Core.Tests.Prediction;

public class BudgetPropertyTests
{
    [Property(MaxTest = 200)]
    public Property Budget_shares_sum_to_one_and_the_budget_adds_up_to_the_variance() =>
        Prop.ForAll(RandomCase.Arbitrary(), c =>
        {
            var r = c.Covariance;
            return WeightSchemes.ComputeAll(c.Grid, r, c.Spec).All(w =>
            {
                var p = NoisePredictor.Predict(w, r, c.Adc, c.Sensor, null);
                // Tolerance 1e-12: for the shares (pure division) and for the total relative to the largest budget term.
                var largest = p.Budget.Max(b => Math.Abs(b.VarianceV2));
                return Math.Abs(p.Budget.Sum(b => b.Share) - 1) < 1e-12
                    && Math.Abs(p.Budget.Sum(b => b.VarianceV2) - p.VarianceV2) <= 1e-12 * largest
                    && p.SigmaElectrons > 0;
            });
        });
}
