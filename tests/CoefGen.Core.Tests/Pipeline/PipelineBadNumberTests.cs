using CoefGen.Core.Diagnostics;
using CoefGen.Core.FixedPoint;
using CoefGen.Core.Pipeline;
using CoefGen.Core.Tests.FixedPoint;
using static CoefGen.Core.Tests.Readout.ReadoutFixture;

namespace CoefGen.Core.Tests.Pipeline;

/// <summary>Numbers the loader accepts but the design cannot realise: located CG2xxx errors, never another exception.</summary>
public class PipelineBadNumberTests
{
    [Fact]
    public void Weights_that_no_coefficient_scale_fits_are_a_located_error()
    {
        // A one-sample signal window one sample after the transfer: the step has reached 47 % through the 2 MHz
        // pole, so the signal weight is about 2.1 per unit gain, beyond +-1 of 2-bit coefficients at any 2^P >= 1.
        var toml = With("start = 220\ncount = 160", "start = 201\ncount = 1")
            .Replace("start = 20\ncount = 160", "start = 20\ncount = 2", StringComparison.Ordinal)
            + "\n[fixed_point]\ncoef_bits = 2\n";
        var load = Load(toml);
        Assert.True(load.Succeeded, string.Join("\n", load.Diagnostics));
        var ex = Assert.Throws<InputException>(() => DesignPipeline.Run(load.Description!, ShippedExamples.Catalog));
        var d = Assert.Single(ex.Diagnostics);
        Assert.Equal("CG2032", d.Code);
        Assert.Equal("fixed_point.coef_bits", d.Key);
        Assert.Equal(LineOf(toml, "coef_bits = 2"), d.Location.Line);
    }

    [Fact]
    public void The_quantiser_refuses_an_unrepresentable_case_with_its_own_exception()
    {
        var dc = new DesignCase(2, 1, [1.0, 1.0, 1.0], 2, 0.999, Settled: false);
        Assert.False(dc.Representable);
        var g = dc.Grid;
        Assert.Throws<CoefficientWidthException>(() => Quantiser.Quantise(dc.Weights, g, dc.Covariance(g), dc.CoefBits, g.IsSettled));
    }

    [Fact]
    public void A_non_finite_prediction_is_a_located_error_not_a_result()
    {
        var result = DesignPipeline.Run(Load(Minimal).Description!, ShippedExamples.Catalog);
        DesignFiniteness.ThrowIfNotFinite(result);
        var broken = result with { Predictions = [.. result.Predictions.Select((p, i) => i == 1 ? p with { SigmaV = double.PositiveInfinity } : p)] };
        var ex = Assert.Throws<InputException>(() => DesignFiniteness.ThrowIfNotFinite(broken));
        var d = Assert.Single(ex.Diagnostics);
        Assert.Equal("CG2030", d.Code);
        Assert.True(d.Location.Line > 0);
        Assert.Contains("noise in V", d.Message, StringComparison.Ordinal);
        Assert.Throws<InputException>(() => DesignFiniteness.ThrowIfNotFinite(result with { Datapath = result.Datapath with { GainErrorPpm = double.NaN } }));
    }
}
