using System.Numerics;

namespace CoefGen.Core.Noise;

/// <summary>
/// Exponential and trigonometric integrals needed by the closed-form covariances (PHYSICS §2, §5).
/// Real arguments only; every function is accurate to a few ulp times its condition number.
/// </summary>
public static class SpecialFunctions
{
    /// <summary>Euler–Mascheroni constant.</summary>
    public const double EulerGamma = 0.57721566490153286060651209;

    private const double Epsilon = 1e-17;
    private const double TinyLentz = 1e-300;
    private const int MaxIterations = 10000;

    /// <summary>E1(x) = ∫_x^∞ e^{-t}/t dt for x &gt; 0.</summary>
    public static double E1(double x)
    {
        RequirePositive(x);
        return x <= 1 ? E1Series(x) : Math.Exp(-x) * ScaledE1(x);
    }

    /// <summary>e^x E1(x) for x &gt; 0, without overflow.</summary>
    public static double ScaledE1(double x)
    {
        RequirePositive(x);
        if (x <= 1)
        {
            return Math.Exp(x) * E1Series(x);
        }

        // Continued fraction for E1 (modified Lentz), converges fast for x > 1.
        var b = x + 1;
        var c = 1 / TinyLentz;
        var d = 1 / b;
        var h = d;
        for (var i = 1; i < MaxIterations; i++)
        {
            var an = -(double)i * i;
            b += 2;
            d = 1 / (an * d + b);
            c = b + an / c;
            var del = c * d;
            h *= del;
            if (Math.Abs(del - 1) < Epsilon)
            {
                break;
            }
        }

        return h;
    }

    /// <summary>Ei(x) = PV ∫_{-∞}^x e^t/t dt for x ≠ 0; Ei(-x) = -E1(x).</summary>
    public static double Ei(double x)
    {
        if (x < 0)
        {
            return -E1(-x);
        }

        RequirePositive(x);
        return x <= 36 ? EiSeries(x) : Math.Exp(x) * ScaledEi(x);
    }

    /// <summary>e^{-x} Ei(x) for x &gt; 0, without overflow.</summary>
    public static double ScaledEi(double x)
    {
        RequirePositive(x);
        if (x <= 36)
        {
            return Math.Exp(-x) * EiSeries(x);
        }

        // Asymptotic series Σ k!/x^k, truncated at its smallest term (relative error < 4e-15 here).
        double sum = 1, term = 1;
        for (var k = 1; k < MaxIterations; k++)
        {
            var previous = term;
            term *= k / x;
            if (term < Epsilon)
            {
                break;
            }

            if (term >= previous)
            {
                sum -= previous;
                break;
            }

            sum += term;
        }

        return sum / x;
    }

    /// <summary>Cosine integral Ci(x) = -∫_x^∞ cos t / t dt, x &gt; 0.</summary>
    public static double Ci(double x)
    {
        RequirePositive(x);
        if (x <= 2)
        {
            return EulerGamma + Math.Log(x) - Cin(x);
        }

        var (f, g) = AuxiliaryFG(x);
        var (s, c) = Math.SinCos(x);
        return f * s - g * c;
    }

    /// <summary>Sine integral Si(x) = ∫_0^x sin t / t dt (odd in x).</summary>
    public static double Si(double x)
    {
        if (x < 0)
        {
            return -Si(-x);
        }

        if (x <= 2)
        {
            double sum = 0, term = x;
            for (var k = 0; k < MaxIterations; k++)
            {
                var add = term / (2 * k + 1);
                sum += add;
                if (Math.Abs(add) < Epsilon * Math.Abs(sum))
                {
                    break;
                }

                term *= -x * x / ((2 * k + 2) * (2 * k + 3));
            }

            return sum;
        }

        var (f, g) = AuxiliaryFG(x);
        var (s, c) = Math.SinCos(x);
        return Math.PI / 2 - f * c - g * s;
    }

    /// <summary>
    /// Cin(x) = ∫_0^x (1 - cos t)/t dt = γ + ln x - Ci(x): the cosine integral without its logarithm.
    /// The series Σ_{k≥1} (-1)^{k+1} x^{2k}/(2k (2k)!) is O(x²) and cancellation-free (PHYSICS §5).
    /// </summary>
    public static double Cin(double x)
    {
        x = Math.Abs(x);
        if (x > 2)
        {
            return EulerGamma + Math.Log(x) - Ci(x);
        }

        double sum = 0, term = 1;
        for (var k = 1; k < MaxIterations; k++)
        {
            term *= -x * x / ((2 * k - 1) * (2 * k));
            var add = -term / (2 * k);
            sum += add;
            if (Math.Abs(add) <= Epsilon * Math.Abs(sum))
            {
                break;
            }
        }

        return sum;
    }

    /// <summary>
    /// φ(z) = ∫_0^∞ x cos(zx)/(1+x²) dx = -½[e^{-z}Ei(z) + e^{z}Ei(-z)] for z &gt; 0
    /// (Gradshteyn &amp; Ryzhik 3.723.5); asymptotic series -Σ (2j+1)!/z^{2j+2} above z = 40.
    /// </summary>
    public static double Phi(double z)
    {
        RequirePositive(z);
        if (z <= 40)
        {
            return -0.5 * (ScaledEi(z) - ScaledE1(z));
        }

        var inv2 = 1 / (z * z);
        double term = inv2, sum = 0;
        for (var j = 0; j < MaxIterations; j++)
        {
            sum += term;
            var next = term * (2 * j + 2) * (2 * j + 3) * inv2;
            if (next < Epsilon * sum || next >= term)
            {
                break;
            }

            term = next;
        }

        return -sum;
    }

    /// <summary>
    /// ψ(z) = -γ - ln z - φ(z), the 1/f-through-a-pole shape with its logarithm removed: ψ(0) = 0,
    /// ψ(z) = O(z² ln z) near 0. Below z = 1 a cancellation-free series is used.
    /// </summary>
    public static double PsiPole(double z)
    {
        z = Math.Abs(z);
        if (z == 0)
        {
            return 0;
        }

        if (z > 1)
        {
            return -EulerGamma - Math.Log(z) - Phi(z);
        }

        // ψ = (cosh z - 1)(γ + ln z) + cosh z Σ_{k even} z^k/(k k!) - sinh z Σ_{k odd} z^k/(k k!).
        double even = 0, odd = 0, power = 1, factorial = 1;
        for (var k = 1; k < 60; k++)
        {
            power *= z;
            factorial *= k;
            var add = power / (k * factorial);
            if (k % 2 == 0)
            {
                even += add;
            }
            else
            {
                odd += add;
            }

            if (add < Epsilon * odd)
            {
                break;
            }
        }

        var coshM1 = 2 * Math.Sinh(z / 2) * Math.Sinh(z / 2);
        return coshM1 * (EulerGamma + Math.Log(z)) + Math.Cosh(z) * even - Math.Sinh(z) * odd;
    }

    /// <summary>Auxiliary functions of Ci/Si for x &gt; 2: e^{ix}E1(ix) = g - i f (continued fraction).</summary>
    internal static (double F, double G) AuxiliaryFG(double x)
    {
        var b = new Complex(1, x);
        var c = new Complex(1 / TinyLentz, 0);
        var d = 1 / b;
        var h = d;
        for (var i = 2; i < MaxIterations; i++)
        {
            var a = -(double)(i - 1) * (i - 1);
            b += 2;
            d = 1 / (a * d + b);
            c = b + a / c;
            var del = c * d;
            h *= del;
            if (Math.Abs(del.Real - 1) + Math.Abs(del.Imaginary) < Epsilon)
            {
                break;
            }
        }

        return (-h.Imaginary, h.Real);
    }

    private static double E1Series(double x)
    {
        double sum = 0, term = 1;
        for (var k = 1; k < MaxIterations; k++)
        {
            term *= -x / k;
            var add = term / k;
            sum += add;
            if (Math.Abs(add) < Epsilon * Math.Abs(sum))
            {
                break;
            }
        }

        return -EulerGamma - Math.Log(x) - sum;
    }

    private static double EiSeries(double x)
    {
        double sum = 0, term = 1;
        for (var k = 1; k < MaxIterations; k++)
        {
            term *= x / k;
            var add = term / k;
            sum += add;
            if (add < Epsilon * sum)
            {
                break;
            }
        }

        return EulerGamma + Math.Log(x) + sum;
    }

    private static void RequirePositive(double x)
    {
        if (!(x > 0) || double.IsInfinity(x))
        {
            throw new ArgumentOutOfRangeException(nameof(x), "argument must be positive and finite");
        }
    }
}
