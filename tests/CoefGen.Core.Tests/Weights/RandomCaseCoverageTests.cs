using CoefGen.Core.Readout;
using FsCheck.Fluent;

namespace CoefGen.Core.Tests.Weights;

public class RandomCaseCoverageTests
{
    [Fact]
    public void Random_cases_reach_small_windows_unequal_windows_partial_settling_and_both_drift_settings()
    {
        var cases = RandomCase.Arbitrary().Generator.Sample(400);
        Assert.Contains(cases, c => c.ResetCount == 1 || c.SignalCount == 1);
        Assert.Contains(cases, c => c.ResetCount != c.SignalCount);
        Assert.Contains(cases, c => c.Gap == 0);
        Assert.Contains(cases, c => c.Grid.Step.Any(s => s > 0 && s < 1));
        Assert.Contains(cases, c => c.RejectDrift);
        Assert.Contains(cases, c => !c.RejectDrift);
        Assert.Contains(cases, c => c.Shape == WindowShape.Explicit && c.Spec.ExplicitReset!.Contains(0.0));
        Assert.Contains(cases, c => c.ConstantKind == 1);
        Assert.All(cases.Where(c => c.RejectDrift), c => Assert.True(c.ResetCount >= 2 && c.SignalCount >= 2));
    }
}
