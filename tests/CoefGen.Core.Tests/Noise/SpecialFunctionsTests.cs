using CoefGen.Core.Noise;
using SpecialFunctions = CoefGen.Core.Noise.SpecialFunctions;

namespace CoefGen.Core.Tests.Noise;

/// <summary>Special functions against MathNet, independent quadrature and values from memory, ~1e-12 relative.</summary>
public class SpecialFunctionsTests
{
    private const double Gamma = 0.57721566490153286061;

    public static TheoryData<double> Arguments => [1e-6, 0.01, 0.3, 0.99, 1.0, 1.7, 2.0, 2.01, 3.3, 7.5, 19.0, 35.9, 36.1, 55.0];

    [Theory]
    [MemberData(nameof(Arguments))]
    public void E1_matches_MathNet(double x)
    {
        // Reference: MathNet.Numerics.SpecialFunctions.ExponentialIntegral (E_n with n = 1).
        var reference = MathNet.Numerics.SpecialFunctions.ExponentialIntegral(x, 1);
        Assert.Equal(reference, SpecialFunctions.E1(x), Math.Abs(reference) * 1e-12);
        Assert.Equal(Math.Exp(x) * reference, SpecialFunctions.ScaledE1(x), Math.Exp(x) * Math.Abs(reference) * 1e-12);
    }

    [Theory]
    [MemberData(nameof(Arguments))]
    public void Ei_matches_its_integral_definition(double x)
    {
        // Ei(x) = γ + ln x + ∫_0^x (e^t - 1)/t dt (standard identity), integrand smooth: composite Gauss–Legendre.
        var panels = Math.Max(4, (int)(2 * x));
        var reference = Gamma + Math.Log(x) + ReferenceQuadrature.Composite(t => t == 0 ? 1 : double.ExpM1(t) / t, 0, x, panels);
        Assert.Equal(reference, SpecialFunctions.Ei(x), Math.Abs(reference) * 1e-12);
        Assert.Equal(-MathNet.Numerics.SpecialFunctions.ExponentialIntegral(x, 1), SpecialFunctions.Ei(-x), SpecialFunctions.E1(x) * 1e-12);
    }

    [Fact]
    public void Known_values_are_reproduced()
    {
        // Values from memory (Abramowitz & Stegun tables).
        Assert.Equal(1.8951178163559367555, SpecialFunctions.Ei(1), 1e-15);
        Assert.Equal(0.21938393439552027368, SpecialFunctions.E1(1), 1e-15);
        Assert.Equal(0.33740392290096813466, SpecialFunctions.Ci(1), 1e-15);
        Assert.Equal(0.94608307036718301494, SpecialFunctions.Si(1), 1e-15);
        Assert.Equal(1.8519370519824661703, SpecialFunctions.Si(Math.PI), 1e-15);
    }

    [Theory]
    [MemberData(nameof(Arguments))]
    public void Ci_Si_and_Cin_match_their_integral_definitions(double x)
    {
        // Si(x) = ∫_0^x sin t/t dt, Cin(x) = ∫_0^x (1 - cos t)/t dt, Ci = γ + ln x - Cin (standard identities).
        var panels = Math.Max(4, (int)(4 * x));
        var si = ReferenceQuadrature.Composite(t => t == 0 ? 1 : Math.Sin(t) / t, 0, x, panels);
        var cin = ReferenceQuadrature.Composite(t => { var s = Math.Sin(t / 2); return t == 0 ? 0 : 2 * s * s / t; }, 0, x, panels);
        Assert.Equal(si, SpecialFunctions.Si(x), Math.Abs(si) * 1e-12);
        Assert.Equal(cin, SpecialFunctions.Cin(x), Math.Abs(cin) * 1e-12);
        var ci = Gamma + Math.Log(x) - cin;
        Assert.Equal(ci, SpecialFunctions.Ci(x), Math.Max(1, Math.Abs(ci)) * 1e-13);
    }

    [Fact]
    public void Phi_asymptotic_series_agrees_with_the_exponential_integral_form_near_the_switch()
    {
        // PHYSICS §2: 12+ terms agree with direct evaluation to ~3e-15 at z = 50. Direct form loses ~z/2 digits-worth.
        foreach (var z in new[] { 40.0, 45.0, 50.0, 60.0 })
        {
            var direct = -0.5 * (SpecialFunctions.ScaledEi(z) - SpecialFunctions.ScaledE1(z));
            Assert.Equal(direct, SpecialFunctions.Phi(z), Math.Abs(direct) * 1e-12);
        }

        Assert.Equal(-0.5 * (SpecialFunctions.ScaledEi(40) - SpecialFunctions.ScaledE1(40)), SpecialFunctions.Phi(40));
    }

    [Fact]
    public void Phi_satisfies_its_differential_equation()
    {
        // From the integral definition, φ'' - φ = -∫_0^∞ x cos(zx) dx = 1/z² (Abel sense): derived here.
        foreach (var z in new[] { 0.3, 1.0, 3.0, 10.0, 39.0, 41.0, 80.0 })
        {
            var h = 1e-3 * z;
            var second = (SpecialFunctions.Phi(z + h) - 2 * SpecialFunctions.Phi(z) + SpecialFunctions.Phi(z - h)) / (h * h);
            var residual = second - SpecialFunctions.Phi(z) - 1 / (z * z);
            Assert.True(Math.Abs(residual) < 1e-5 * (Math.Abs(SpecialFunctions.Phi(z)) + 1 / (z * z)), $"z {z}: {residual}");
        }
    }

    [Fact]
    public void Phi_small_z_limit_is_minus_gamma_minus_log()
    {
        // PHYSICS §2: φ ≈ -γ - ln z for small z; ψ = -γ - ln z - φ is O(z² ln z).
        Assert.Equal(-Gamma - Math.Log(1e-4), SpecialFunctions.Phi(1e-4), 1e-7);
        Assert.True(Math.Abs(SpecialFunctions.PsiPole(1e-4)) < 1e-7);
        Assert.Equal(0.0, SpecialFunctions.PsiPole(0));
    }

    [Fact]
    public void Psi_series_joins_the_direct_form()
    {
        // The cancellation-free series (z ≤ 1) against -γ - ln z - φ(z) evaluated directly.
        foreach (var z in new[] { 0.05, 0.2, 0.5, 0.8, 1.0 })
        {
            var direct = -Gamma - Math.Log(z) - SpecialFunctions.Phi(z);
            Assert.Equal(direct, SpecialFunctions.PsiPole(z), 2e-15 * Math.Max(1, Math.Abs(Math.Log(z))));
        }

        // Across the switch (series at 1, direct form just above), the values join to rounding.
        Assert.Equal(SpecialFunctions.PsiPole(1.0), SpecialFunctions.PsiPole(Math.BitIncrement(1.0)), 1e-14);
    }
}
