using CoefGen.Core.Noise;

namespace CoefGen.Core.Tests.Noise;

/// <summary>
/// Every covariance against numerical quadrature of ∫S cos(2πfτ) df (PHYSICS §2 closed forms and quadrature
/// recipe), τ = 0…20 µs, poles 0.3–2 MHz, tolerance 1e-7 of C(0). 1/f is compared as C(τ) - C(0).
/// </summary>
public class ClosedFormCovarianceTests
{
    private const double E2 = 1e-16; // (10 nV/√Hz)²
    private const double Tolerance = 1e-7;

    public static TheoryData<double> Poles => [3e5, 1e6, 2e6];

    private static readonly double[] Taus = [0, 2.5e-8, 1e-7, 4.7e-7, 2e-6, 7.3e-6, 2e-5];

    [Theory]
    [MemberData(nameof(Poles))]
    public void White_through_a_pole_matches_quadrature(double fp)
    {
        // W1, derived in PHYSICS §2.
        var c = ParametricNoiseComponent.White("w", E2, fp, null);
        var c0 = E2 * Math.PI * fp / 2;
        foreach (var tau in Taus)
        {
            var reference = ReferenceQuadrature.CosineTransformToInfinity(
                c.Psd, f => E2 * fp * Math.Atan(fp / f), tau, 0, fp, minusOne: false);
            Assert.True(Math.Abs(c.Covariance(tau) - reference) < Tolerance * c0, $"tau {tau}: {c.Covariance(tau)} vs {reference}");
        }
    }

    [Theory]
    [MemberData(nameof(Poles))]
    public void White_with_brick_wall_matches_quadrature(double fp)
    {
        // W2, derived in PHYSICS §2 (fp reused as the brick-wall frequency).
        var c = ParametricNoiseComponent.White("w", E2, null, fp);
        foreach (var tau in Taus)
        {
            var reference = ReferenceQuadrature.CosineTransform(c.Psd, tau, 0, fp, fp, minusOne: false);
            Assert.True(Math.Abs(c.Covariance(tau) - reference) < Tolerance * E2 * fp, $"tau {tau}");
        }
    }

    [Theory]
    [MemberData(nameof(Poles))]
    public void White_with_pole_and_brick_wall_matches_quadrature(double fp)
    {
        // W3 has no elementary form (PHYSICS §2): production quadrature against the test quadrature.
        var fb = 2.7 * fp;
        var c = ParametricNoiseComponent.White("w", E2, fp, fb);
        var c0 = E2 * fp * Math.Atan(fb / fp);
        var lags = c.LagTable(1 / 2.5e-8, 801);
        foreach (var tau in Taus)
        {
            var reference = ReferenceQuadrature.CosineTransform(c.Psd, tau, 0, fb, fp, minusOne: false);
            Assert.True(Math.Abs(c.Covariance(tau) - reference) < Tolerance * c0, $"tau {tau}");
            var k = (int)Math.Round(tau / 2.5e-8);
            var onGrid = ReferenceQuadrature.CosineTransform(c.Psd, k * 2.5e-8, 0, fb, fp, minusOne: false);
            Assert.True(Math.Abs(lags[k] - onGrid) < Tolerance * c0, $"lag {k}");
        }
    }

    [Theory]
    [MemberData(nameof(Poles))]
    public void Flicker_with_brick_wall_matches_quadrature_as_differences(double fb)
    {
        // F1 with Ci, derived in PHYSICS §2; C(0) = K ln(f_b/f_low).
        const double fLow = 1.0;
        var k = E2 * 1e4;
        var c = ParametricNoiseComponent.Flicker("f", k, fLow, null, fb);
        var c0 = k * Math.Log(fb / fLow);
        Assert.Equal(c0, c.RemovedConstantV2, c0 * 1e-14);
        Assert.Equal(c0, ReferenceQuadrature.CosineTransform(c.Psd, 0, fLow, fb, fb, minusOne: false), c0 * 1e-10);
        foreach (var tau in Taus)
        {
            var reference = ReferenceQuadrature.CosineTransform(c.Psd, tau, fLow, fb, fb, minusOne: true);
            Assert.True(Math.Abs(c.Covariance(tau) - reference) < Tolerance * c0, $"tau {tau}");
        }
    }

    [Theory]
    [MemberData(nameof(Poles))]
    public void Flicker_through_a_pole_matches_quadrature_as_differences(double fp)
    {
        // F3 via φ, derived in PHYSICS §2; C(0) = (K/2) ln(1 + f_p²/f_low²).
        const double fLow = 0.5;
        var k = E2 * 1e4;
        var c = ParametricNoiseComponent.Flicker("f", k, fLow, fp, null);
        var c0 = 0.5 * k * Math.Log(1 + fp * fp / (fLow * fLow));
        Assert.Equal(c0, c.RemovedConstantV2, c0 * 1e-14);
        double Above(double f) => 0.5 * k * Math.Log(1 + fp * fp / (f * f));
        Assert.Equal(c0, ReferenceQuadrature.CosineTransformToInfinity(c.Psd, Above, 0, fLow, fp, minusOne: false), c0 * 1e-10);
        foreach (var tau in Taus)
        {
            var reference = ReferenceQuadrature.CosineTransformToInfinity(c.Psd, Above, tau, fLow, fp, minusOne: true);
            Assert.True(Math.Abs(c.Covariance(tau) - reference) < Tolerance * c0, $"tau {tau}: {c.Covariance(tau)} vs {reference}");
        }
    }

    [Theory]
    [MemberData(nameof(Poles))]
    public void Flicker_with_pole_and_brick_wall_matches_quadrature_as_differences(double fp)
    {
        // No elementary form: production quadrature (log f, quarter-period panels) against the test one.
        const double fLow = 2.0;
        var fb = 1.9 * fp;
        var k = E2 * 1e4;
        var c = ParametricNoiseComponent.Flicker("f", k, fLow, fp, fb);
        var c0 = 0.5 * k * (Math.Log(1 + fp * fp / (fLow * fLow)) - Math.Log(1 + fp * fp / (fb * fb)));
        Assert.Equal(c0, c.RemovedConstantV2, c0 * 1e-13);
        var lags = c.LagTable(1 / 2.5e-8, 801);
        foreach (var tau in Taus)
        {
            var reference = ReferenceQuadrature.CosineTransform(c.Psd, tau, fLow, fb, fp, minusOne: true);
            Assert.True(Math.Abs(c.Covariance(tau) - reference) < Tolerance * c0, $"tau {tau}");
            var n = (int)Math.Round(tau / 2.5e-8);
            var onGrid = ReferenceQuadrature.CosineTransform(c.Psd, n * 2.5e-8, fLow, fb, fp, minusOne: true);
            Assert.True(Math.Abs(lags[n] - onGrid) < Tolerance * c0, $"lag {n}");
        }
    }

    [Fact]
    public void Measured_table_matches_quadrature_of_its_interpolated_spectrum()
    {
        // Exact piecewise transform against quadrature of the same interpolated S (PsdTable convention):
        // a 1/f-like rise, a plateau and a pole-like fall, flat below 1 kHz and f^-2 above 5 MHz.
        double[] f = [1e3, 1e4, 1e5, 3e5, 1e6, 2e6, 5e6];
        double[] s = [4e-15, 8e-16, 2e-16, 1.9e-16, 1.2e-16, 5e-17, 1e-17];
        var c = new MeasuredPsdComponent("t", f, s);
        var c0 = c.Covariance(0);
        var last = f[^1];
        double Above(double x) => s[^1] * last * last / x;
        foreach (var tau in Taus)
        {
            // Integrate each interval separately so the kinks sit on panel edges.
            var reference = ReferenceQuadrature.CosineTransform(c.Psd, tau, 0, f[0], f[0], minusOne: false);
            for (var i = 0; i + 1 < f.Length; i++)
            {
                reference += ReferenceQuadrature.CosineTransform(c.Psd, tau, f[i], f[i + 1], f[i + 1] - f[i], minusOne: false);
            }

            reference += ReferenceQuadrature.CosineTransformToInfinity(c.Psd, Above, tau, last, last, minusOne: false);
            Assert.True(Math.Abs(c.Covariance(tau) - reference) < Tolerance * c0, $"tau {tau}: {c.Covariance(tau)} vs {reference}");
        }
    }
}
