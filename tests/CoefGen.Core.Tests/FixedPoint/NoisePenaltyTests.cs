using System.Globalization;
using CoefGen.Core.Noise;
using CoefGen.Core.Weights;
using MathNet.Numerics.LinearAlgebra;

namespace CoefGen.Core.Tests.FixedPoint;

public class NoisePenaltyTests(ITestOutputHelper output)
{
    [Fact]
    public void Integer_weights_at_18_bits_cost_under_a_tenth_of_a_percent_of_noise_on_a_realistic_case()
    {
        // 2 x 160 samples, AR(1) analog noise (rho 0.98) plus a white diagonal; weights from a dense MathNet
        // solve of min h^T R h subject to sum_reset h = -1, sum_signal h = 1 (Lagrange: h = R^-1 A (A^T R^-1 A)^-1 b).
        var g = FixedPointFixtures.Grid(160, 160);
        var r = FixedPointFixtures.Ar1(g, 0.98, 4e-8, 2e-9);
        var h = OptimalWeights(g, r);
        foreach (var bits in new[] { 18, 12, 8 })
        {
            var d = FixedPointFixtures.Design(g, h, r, FixedPointFixtures.Settings(coefBits: bits));
            output.WriteLine(string.Create(CultureInfo.InvariantCulture,
                $"{bits}-bit coefficients: P = {d.P}, noise penalty {d.NoisePenaltyPercent:G4} %, gain error {d.GainErrorPpm} ppm, F = {d.OutputFracBits}, safe = {d.Proof.Safe}"));
            Assert.Equal(0, d.Coefficients.Sum());
            // The real weights are the optimum over the same constraints, which c / 2^P meets exactly: no gain below 0
            // beyond rounding of the double arithmetic (1e-9 %).
            Assert.True(d.NoisePenaltyPercent > -1e-9, $"{bits} bits: {d.NoisePenaltyPercent}");
            if (bits == 18)
            {
                Assert.True(d.NoisePenaltyPercent < 0.1, $"penalty {d.NoisePenaltyPercent} %");
                Assert.True(d.Proof.Safe);
            }
        }
    }

    [Fact]
    public void Recommended_output_fraction_keeps_output_rounding_under_one_percent_of_the_noise()
    {
        // sqrt(1 + 2^(-2F) / (12 sigma^2)) - 1 < 1 %: for sigma = 1 ADU, F = 1 gives 1.04 %, F = 2 gives 0.26 %.
        Assert.Equal(2, CoefGen.Core.FixedPoint.FixedPointDesigner.RecommendedFracBits(1.0));
        Assert.Equal(0, CoefGen.Core.FixedPoint.FixedPointDesigner.RecommendedFracBits(10.0));
    }

    private static double[] OptimalWeights(SampleGrid g, SampledCovariance r)
    {
        var m = Matrix<double>.Build.DenseOfArray(r.ToDense());
        var a = Matrix<double>.Build.Dense(g.Count, 2, (i, j) => (j == 1) == (g.WindowOf(i) == 1) ? 1.0 : 0.0);
        var b = Vector<double>.Build.DenseOfArray([-1.0, 1.0]);
        var ria = m.Solve(a);
        var lambda = (a.TransposeThisAndMultiply(ria)).Solve(b);
        return [.. ria * lambda];
    }
}
