namespace CoefGen.Core.Weights.Structured;

/// <summary>
/// Discrete Fourier transform of any length n by Bluestein's chirp-z identity
/// (jk = (j² + k² − (j−k)²)/2), carried out with a radix-2 FFT of length ≥ 2n − 1.
/// Used once per solve to build preconditioners, so it favours clarity over speed.
/// </summary>
internal static class BluesteinDft
{
    /// <summary>Forward DFT X_j = sum_k x_k exp(-2 pi i j k / n), in place.</summary>
    public static void Forward(double[] re, double[] im)
    {
        var n = re.Length;
        if (n == 1)
        {
            return;
        }

        var m = 1;
        while (m < (2 * n) - 1)
        {
            m = checked(m * 2);
        }

        var fft = new Fft(m);
        // Chirp w_k = exp(-i pi k^2 / n); k^2 reduced mod 2n so the angle stays exact for large k.
        var wr = new double[n];
        var wi = new double[n];
        for (var k = 0; k < n; k++)
        {
            var k2 = (long)k * k % (2L * n);
            var angle = -Math.PI * k2 / n;
            wr[k] = Math.Cos(angle);
            wi[k] = Math.Sin(angle);
        }

        var ar = new double[m];
        var ai = new double[m];
        for (var k = 0; k < n; k++)
        {
            ar[k] = (re[k] * wr[k]) - (im[k] * wi[k]);
            ai[k] = (re[k] * wi[k]) + (im[k] * wr[k]);
        }

        // b_k = conj(w_k) for |k| < n, wrapped.
        var br = new double[m];
        var bi = new double[m];
        br[0] = wr[0];
        bi[0] = -wi[0];
        for (var k = 1; k < n; k++)
        {
            br[k] = br[m - k] = wr[k];
            bi[k] = bi[m - k] = -wi[k];
        }

        fft.Forward(ar, ai);
        fft.Forward(br, bi);
        for (var k = 0; k < m; k++)
        {
            var r = (ar[k] * br[k]) - (ai[k] * bi[k]);
            ai[k] = (ar[k] * bi[k]) + (ai[k] * br[k]);
            ar[k] = r;
        }

        fft.Inverse(ar, ai);
        for (var j = 0; j < n; j++)
        {
            re[j] = (ar[j] * wr[j]) - (ai[j] * wi[j]);
            im[j] = (ar[j] * wi[j]) + (ai[j] * wr[j]);
        }
    }

    /// <summary>Eigenvalues of the real symmetric circulant with first column c (c_k = c_{n-k}).</summary>
    public static double[] SymmetricCirculantEigenvalues(double[] c)
    {
        var re = (double[])c.Clone();
        var im = new double[c.Length];
        Forward(re, im);
        return re;
    }

    /// <summary>First column of the real symmetric circulant whose eigenvalues are given (inverse DFT).</summary>
    public static double[] SymmetricCirculantFromEigenvalues(double[] eigen)
    {
        // For real symmetric spectra the inverse DFT equals the forward DFT divided by n.
        var re = (double[])eigen.Clone();
        var im = new double[eigen.Length];
        Forward(re, im);
        for (var k = 0; k < re.Length; k++)
        {
            re[k] /= eigen.Length;
        }

        return re;
    }
}
